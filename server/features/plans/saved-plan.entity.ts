import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { User } from '../users/user.entity';

/** A frame plan saved to a member's account; shareable read-only through an unguessable token. */
@Entity({ name: 'saved_plans' })
@Index('ix_saved_plans_owner', ['ownerId', 'updatedAt'])
export class SavedPlan {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'owner_id', type: 'int', unsigned: true })
  ownerId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id', foreignKeyConstraintName: 'fk_saved_plans_owner' })
  owner?: User;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** The planner input exactly as the planner's schema accepts it; the plan is recomputed from it. */
  @Column({ type: 'json' })
  input: Record<string, unknown>;

  @Index('uq_saved_plans_share_token', { unique: true })
  @Column({ name: 'share_token', type: 'char', length: 43, nullable: true })
  shareToken: string | null;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
