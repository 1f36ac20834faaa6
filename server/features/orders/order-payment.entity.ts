import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { Order } from './order.entity';

export const PAYMENT_PURPOSES = ['full', 'deposit', 'balance'] as const;
export type PaymentPurpose = (typeof PAYMENT_PURPOSES)[number];

export const PAYMENT_STATUSES = ['started', 'needs_authentication', 'succeeded', 'failed', 'cancelled'] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];

/**
 * One card payment asked of the buyer: the full price, or a build order's deposit or balance. Its provider
 * intent is created with an idempotency key made from the order, purpose and attempt, so a retried request can
 * never charge twice; a new attempt (after a decline) gets a new key.
 */
@Entity({ name: 'order_payments' })
@Index('uq_order_payments_attempt', ['orderId', 'purpose', 'attempt'], { unique: true })
@Index('uq_order_payments_intent', ['intentId'], { unique: true })
export class OrderPayment {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'order_id', type: 'int', unsigned: true })
  orderId: number;

  @ManyToOne(() => Order, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'order_id', foreignKeyConstraintName: 'fk_order_payments_order' })
  order?: Order;

  @Column({ type: 'enum', enum: PAYMENT_PURPOSES })
  purpose: PaymentPurpose;

  @Column({ type: 'smallint', unsigned: true })
  attempt: number;

  @Column({ name: 'amount_minor', type: 'int', unsigned: true })
  amountMinor: number;

  @Column({ type: 'char', length: 3 })
  currency: string;

  @Column({ name: 'intent_id', type: 'varchar', length: 64, nullable: true })
  intentId: string | null;

  @Column({ type: 'enum', enum: PAYMENT_STATUSES, default: 'started' })
  status: PaymentStatus;

  @Column({ name: 'failure_code', type: 'varchar', length: 64, nullable: true })
  failureCode: string | null;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
