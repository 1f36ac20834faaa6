import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { DECISIONS, SELLER_ACTIONS, type Decision, type SellerAction } from '../../../shared/listings/moderation';
import type { ChecklistAnswers } from '../../../shared/schemas/listing-moderation';
import { User } from '../users/user.entity';
import { Listing } from './listing.entity';

/** A moderator's decision on a listing: who, when, what, why, and how they answered the checklist. */
@Entity({ name: 'listing_decisions' })
@Index('ix_listing_decisions_listing', ['listingId', 'createdAt'])
export class ListingDecision {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_listing_decisions_listing' })
  listing?: Listing;

  @Column({ name: 'moderator_id', type: 'int', unsigned: true, nullable: true })
  moderatorId: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'moderator_id', foreignKeyConstraintName: 'fk_listing_decisions_moderator' })
  moderator?: User | null;

  @Column({ type: 'enum', enum: DECISIONS })
  decision: Decision;

  /** Reason codes (send back) or nothing; the words are in `note`. */
  @Column({ type: 'json' })
  reasons: string[];

  @Column({ type: 'varchar', length: 500, default: '' })
  note: string;

  @Column({ type: 'json', nullable: true })
  checklist: ChecklistAnswers | null;

  @Column({ name: 'seller_action', type: 'enum', enum: SELLER_ACTIONS, nullable: true })
  sellerAction: SellerAction | null;

  @CreatedAtColumn()
  createdAt: Date;
}
