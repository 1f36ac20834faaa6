import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import {
  HANDOVER_METHODS,
  ORDER_KINDS,
  ORDER_STATES,
  type HandoverMethod,
  type OrderKind,
  type OrderState,
} from '../../../shared/orders/states';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { Listing } from '../listings/listing.entity';
import { User } from '../users/user.entity';

/**
 * One purchase: a module bought from a listing, or a build job from an accepted quote. The amounts are fixed when
 * the order is made (rates included) so later fee changes never alter it. Only the order lifecycle changes `state`.
 */
@Entity({ name: 'orders' })
@Index('ix_orders_buyer_created', ['buyerId', 'createdAt'])
@Index('ix_orders_seller_created', ['sellerId', 'createdAt'])
@Index('ix_orders_state_payable', ['state', 'payableUntil'])
@Index('ix_orders_state_confirm', ['state', 'confirmBy'])
export class Order {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'enum', enum: ORDER_KINDS })
  kind: OrderKind;

  @Column({ type: 'enum', enum: ORDER_STATES })
  state: OrderState;

  @Column({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_orders_listing' })
  listing?: Listing;

  /** The accepted quote a build order came from. */
  @Column({ name: 'quote_id', type: 'int', unsigned: true, nullable: true })
  quoteId: number | null;

  @Column({ name: 'buyer_id', type: 'int', unsigned: true })
  buyerId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'buyer_id', foreignKeyConstraintName: 'fk_orders_buyer' })
  buyer?: User;

  @Column({ name: 'seller_id', type: 'int', unsigned: true })
  sellerId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'seller_id', foreignKeyConstraintName: 'fk_orders_seller' })
  seller?: User;

  @Column({ type: 'char', length: 3 })
  currency: string;

  @Column({ type: 'enum', enum: HANDOVER_METHODS })
  handover: HandoverMethod;

  /** Where to deliver; shown to the seller only once the order is paid. Null for collection. */
  @Column({ name: 'delivery_address', type: 'varchar', length: 500, nullable: true })
  deliveryAddress: string | null;

  @Column({ name: 'item_minor', type: 'int', unsigned: true })
  itemMinor: number;

  @Column({ name: 'delivery_minor', type: 'int', unsigned: true })
  deliveryMinor: number;

  @Column({ name: 'buyer_fee_minor', type: 'int', unsigned: true })
  buyerFeeMinor: number;

  @Column({ name: 'total_minor', type: 'int', unsigned: true })
  totalMinor: number;

  @Column({ name: 'commission_bps', type: 'smallint', unsigned: true })
  commissionBps: number;

  @Column({ name: 'buyer_fee_bps', type: 'smallint', unsigned: true })
  buyerFeeBps: number;

  @Column({ name: 'commission_minor', type: 'int', unsigned: true })
  commissionMinor: number;

  /** What the seller is due; lowered when a moderator settles with a part refund. */
  @Column({ name: 'payout_minor', type: 'int', unsigned: true })
  payoutMinor: number;

  /** A build order's deposit (0 for a module). */
  @Column({ name: 'deposit_minor', type: 'int', unsigned: true, default: 0 })
  depositMinor: number;

  @Column({ name: 'refunded_minor', type: 'int', unsigned: true, default: 0 })
  refundedMinor: number;

  @Column({ name: 'transferred_minor', type: 'int', unsigned: true, default: 0 })
  transferredMinor: number;

  /** Until when the listing is held for an unpaid order. */
  @Column({ name: 'payable_until', type: 'datetime', precision: 3, nullable: true })
  payableUntil: Date | null;

  @Column({ name: 'handed_over_at', type: 'datetime', precision: 3, nullable: true })
  handedOverAt: Date | null;

  /** When receipt is confirmed automatically unless a problem is raised. */
  @Column({ name: 'confirm_by', type: 'datetime', precision: 3, nullable: true })
  confirmBy: Date | null;

  @Column({ name: 'problem_raised_at', type: 'datetime', precision: 3, nullable: true })
  problemRaisedAt: Date | null;

  @Column({ name: 'state_changed_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  stateChangedAt: Date;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
