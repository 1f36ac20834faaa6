import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { BUILDER_PROFILE_STATES, type BuilderProfileState } from '../../../shared/listings/builders';
import type { BuildKind } from '../../../shared/listings/vocabulary';
import { User } from '../users/user.entity';

/** A member's application to offer build services; approved by a moderator, it makes them a builder. */
@Entity({ name: 'builder_profiles' })
@Index('ix_builder_profiles_state', ['state', 'createdAt'])
export class BuilderProfile {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('uq_builder_profiles_user', { unique: true })
  @Column({ name: 'user_id', type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'fk_builder_profiles_user' })
  user?: User;

  @Column({ name: 'business_name', type: 'varchar', length: 80 })
  businessName: string;

  @Column({ type: 'text' })
  about: string;

  @Column({ name: 'town_id', type: 'int', unsigned: true })
  townId: number;

  @Column({ type: 'json' })
  builds: BuildKind[];

  @Column({ type: 'enum', enum: BUILDER_PROFILE_STATES, default: 'applied' })
  state: BuilderProfileState;

  @Column({ name: 'decided_by', type: 'int', unsigned: true, nullable: true })
  decidedBy: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'decided_by', foreignKeyConstraintName: 'fk_builder_profiles_decided_by' })
  decider?: User | null;

  @Column({ name: 'decided_at', type: 'datetime', precision: 3, nullable: true })
  decidedAt: Date | null;

  @Column({ name: 'decision_note', type: 'varchar', length: 500, nullable: true })
  decisionNote: string | null;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
