import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import type { RecipientState } from '../../../shared/types/quotes';
import { Listing } from '../listings/listing.entity';
import { User } from '../users/user.entity';
import { QuoteRequest } from './quote-request.entity';

export const RECIPIENT_STATES = ['waiting', 'quoted'] as const;

/** One builder a quote request was sent to, through their service listing. Only they can see the request. */
@Entity({ name: 'quote_recipients' })
@Index('uq_quote_recipients_request_builder', ['requestId', 'builderId'], { unique: true })
@Index('ix_quote_recipients_builder_created', ['builderId', 'createdAt'])
export class QuoteRecipient {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'request_id', type: 'int', unsigned: true })
  requestId: number;

  @ManyToOne(() => QuoteRequest, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'request_id', foreignKeyConstraintName: 'fk_quote_recipients_request' })
  request?: QuoteRequest;

  @Column({ name: 'builder_id', type: 'int', unsigned: true })
  builderId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'builder_id', foreignKeyConstraintName: 'fk_quote_recipients_builder' })
  builder?: User;

  @Column({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_quote_recipients_listing' })
  listing?: Listing;

  /** Whole km from the builder's listing to the buyer's town, rounded up. */
  @Column({ name: 'distance_km', type: 'smallint', unsigned: true })
  distanceKm: number;

  @Column({ type: 'enum', enum: RECIPIENT_STATES, default: 'waiting' })
  state: RecipientState;

  @CreatedAtColumn()
  createdAt: Date;
}
