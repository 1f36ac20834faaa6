import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { User } from '../users/user.entity';

export const TOKEN_PURPOSES = ['verify_email', 'reset_password', 'change_email'] as const;
export type TokenPurpose = (typeof TOKEN_PURPOSES)[number];

/** A single-use token sent by e-mail. Only its SHA-256 hash is stored. */
@Entity({ name: 'one_time_tokens' })
export class OneTimeToken {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('uq_one_time_tokens_hash', { unique: true })
  @Column({ name: 'token_hash', type: 'char', length: 64 })
  tokenHash: string;

  @Column({ type: 'enum', enum: TOKEN_PURPOSES })
  purpose: TokenPurpose;

  @Column({ name: 'user_id', type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'fk_one_time_tokens_user' })
  user?: User;

  /** For an e-mail change: the address that becomes the account's when the link is opened. */
  @Column({ name: 'new_email', type: 'varchar', length: 254, nullable: true })
  newEmail: string | null;

  @Column({ name: 'expires_at', type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'datetime', precision: 3, nullable: true })
  usedAt: Date | null;

  @CreatedAtColumn()
  createdAt: Date;
}
