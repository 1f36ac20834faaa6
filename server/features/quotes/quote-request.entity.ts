import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import type { QuoteRequestState } from '../../../shared/types/quotes';
import { SavedPlan } from '../plans/saved-plan.entity';
import { User } from '../users/user.entity';

export const QUOTE_REQUEST_STATES = ['open', 'accepted'] as const;

/**
 * A buyer's request to builders to price a saved plan. The plan's input is copied when the request is sent, so the
 * quotes price what the builders were shown even if the buyer edits or deletes the plan later.
 */
@Entity({ name: 'quote_requests' })
@Index('ix_quote_requests_buyer_created', ['buyerId', 'createdAt'])
export class QuoteRequest {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'buyer_id', type: 'int', unsigned: true })
  buyerId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'buyer_id', foreignKeyConstraintName: 'fk_quote_requests_buyer' })
  buyer?: User;

  @Column({ name: 'plan_id', type: 'int', unsigned: true, nullable: true })
  planId: number | null;

  @ManyToOne(() => SavedPlan, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'plan_id', foreignKeyConstraintName: 'fk_quote_requests_plan' })
  plan?: SavedPlan | null;

  @Column({ name: 'plan_name', type: 'varchar', length: 120 })
  planName: string;

  @Column({ name: 'plan_input', type: 'json' })
  planInput: Record<string, unknown>;

  /** The town the boards are for: distances and delivery are worked out from it. */
  @Column({ name: 'town_id', type: 'int', unsigned: true })
  townId: number;

  @Column({ type: 'varchar', length: 2000 })
  notes: string;

  /** YYYY-MM-DD */
  @Column({ name: 'needed_by', type: 'date', nullable: true })
  neededBy: string | null;

  @Column({ type: 'enum', enum: QUOTE_REQUEST_STATES, default: 'open' })
  state: QuoteRequestState;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
