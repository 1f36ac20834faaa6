import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { ROLES, type Role } from '../../../shared/roles';

/** A Benchwright account. Every account can buy and sell; `role` adds builder, moderator or admin rights. */
@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('uq_users_email', { unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ name: 'display_name', type: 'varchar', length: 60 })
  displayName: string;

  @Column({ name: 'password_hash', type: 'varchar', length: 255 })
  passwordHash: string;

  @Column({ type: 'enum', enum: ROLES, default: 'member' })
  role: Role;

  @Column({ name: 'email_verified_at', type: 'datetime', precision: 3, nullable: true })
  emailVerifiedAt: Date | null;

  /** Raised to end every session of this account (password change, suspension). */
  @Column({ name: 'session_epoch', type: 'int', unsigned: true, default: 0 })
  sessionEpoch: number;

  @Column({ name: 'suspended_at', type: 'datetime', precision: 3, nullable: true })
  suspendedAt: Date | null;

  @Column({ name: 'suspended_reason', type: 'varchar', length: 500, nullable: true })
  suspendedReason: string | null;

  @Column({ name: 'last_sign_in_at', type: 'datetime', precision: 3, nullable: true })
  lastSignInAt: Date | null;

  /** How many shown reviews rate this member; kept with each review added, hidden or shown again. */
  @Column({ name: 'rating_count', type: 'int', unsigned: true, default: 0 })
  ratingCount: number;

  /** The stars of those reviews added up; the average is rating_sum / rating_count. */
  @Column({ name: 'rating_sum', type: 'int', unsigned: true, default: 0 })
  ratingSum: number;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
