import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import type { QuoteLine } from '../../../shared/quotes/quote-pricing';
import type { QuoteState } from '../../../shared/types/quotes';
import { Order } from '../orders/order.entity';
import { QuoteRecipient } from './quote-recipient.entity';
import { QuoteRequest } from './quote-request.entity';

export const QUOTE_STATES = ['sent', 'accepted', 'not_chosen'] as const;

/**
 * A builder's priced answer to a request: one per builder and request. Its money is fixed when sent; accepting it
 * makes a build order (`orderId`).
 */
@Entity({ name: 'quotes' })
@Index('ix_quotes_request', ['requestId', 'createdAt'])
export class Quote {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'request_id', type: 'int', unsigned: true })
  requestId: number;

  @ManyToOne(() => QuoteRequest, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'request_id', foreignKeyConstraintName: 'fk_quotes_request' })
  request?: QuoteRequest;

  @Index('uq_quotes_recipient', { unique: true })
  @Column({ name: 'recipient_id', type: 'int', unsigned: true })
  recipientId: number;

  @ManyToOne(() => QuoteRecipient, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'recipient_id', foreignKeyConstraintName: 'fk_quotes_recipient' })
  recipient?: QuoteRecipient;

  @Column({ type: 'char', length: 3 })
  currency: string;

  /** `lines` is a reserved word in MariaDB, hence the column's name. */
  @Column({ name: 'price_lines', type: 'json' })
  lines: QuoteLine[];

  /** Sum of the lines. */
  @Column({ name: 'item_minor', type: 'int', unsigned: true })
  itemMinor: number;

  @Column({ name: 'delivery_km', type: 'smallint', unsigned: true })
  deliveryKm: number;

  @Column({ name: 'delivery_minor', type: 'int', unsigned: true })
  deliveryMinor: number;

  /** The builder's deposit when the quote was sent, basis points of the order total. */
  @Column({ name: 'deposit_bps', type: 'smallint', unsigned: true })
  depositBps: number;

  @Column({ name: 'lead_time_weeks', type: 'tinyint', unsigned: true })
  leadTimeWeeks: number;

  /** YYYY-MM-DD: the last day the quote can be accepted. */
  @Column({ name: 'valid_until', type: 'date' })
  validUntil: string;

  @Column({ type: 'varchar', length: 1000 })
  note: string;

  /** Whether the lines or delivery differ from the rate card's pricing. */
  @Column({ type: 'boolean', default: false })
  adjusted: boolean;

  @Column({ type: 'enum', enum: QUOTE_STATES, default: 'sent' })
  state: QuoteState;

  @Index('uq_quotes_order', { unique: true })
  @Column({ name: 'order_id', type: 'int', unsigned: true, nullable: true })
  orderId: number | null;

  @ManyToOne(() => Order, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'order_id', foreignKeyConstraintName: 'fk_quotes_order' })
  order?: Order | null;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
