import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { REPORT_REASONS, type ReportReason } from '../../../shared/listings/moderation';
import { User } from '../users/user.entity';
import { ListingDecision } from './listing-decision.entity';
import { Listing } from './listing.entity';

/** A member's report that a listing breaks the rules. Open reports put the listing in the moderation queue. */
@Entity({ name: 'listing_reports' })
@Index('ix_listing_reports_open', ['listingId', 'resolvedAt'])
@Index('ix_listing_reports_reporter', ['reporterId', 'listingId'])
export class ListingReport {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_listing_reports_listing' })
  listing?: Listing;

  @Column({ name: 'reporter_id', type: 'int', unsigned: true })
  reporterId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'reporter_id', foreignKeyConstraintName: 'fk_listing_reports_reporter' })
  reporter?: User;

  @Column({ type: 'enum', enum: REPORT_REASONS })
  reason: ReportReason;

  @Column({ type: 'varchar', length: 1000, default: '' })
  details: string;

  /** Set when a moderator's decision on the listing dealt with the report. */
  @Column({ name: 'resolved_at', type: 'datetime', precision: 3, nullable: true })
  resolvedAt: Date | null;

  @Column({ name: 'resolved_by_decision_id', type: 'int', unsigned: true, nullable: true })
  resolvedByDecisionId: number | null;

  @ManyToOne(() => ListingDecision, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'resolved_by_decision_id', foreignKeyConstraintName: 'fk_listing_reports_decision' })
  resolvedBy?: ListingDecision | null;

  @CreatedAtColumn()
  createdAt: Date;
}
