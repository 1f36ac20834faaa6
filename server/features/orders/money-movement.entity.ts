import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { Order } from './order.entity';

export const MOVEMENT_KINDS = ['charge', 'refund', 'transfer', 'transfer_reversal'] as const;
export type MovementKind = (typeof MOVEMENT_KINDS)[number];

/**
 * Money that actually moved at the payment provider for an order: a card charge, a refund to the card, a
 * transfer to the seller, or the reversal of one. Each provider object is recorded once (unique provider id),
 * so a repeated event or retried request cannot count it twice. Balances are sums over this table.
 */
@Entity({ name: 'money_movements' })
@Index('uq_money_movements_provider', ['providerId'], { unique: true })
@Index('ix_money_movements_order', ['orderId', 'kind'])
export class MoneyMovement {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'order_id', type: 'int', unsigned: true })
  orderId: number;

  @ManyToOne(() => Order, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'order_id', foreignKeyConstraintName: 'fk_money_movements_order' })
  order?: Order;

  @Column({ type: 'enum', enum: MOVEMENT_KINDS })
  kind: MovementKind;

  /** The provider's id for it (ch_…, re_…, tr_…, trr_…). */
  @Column({ name: 'provider_id', type: 'varchar', length: 64 })
  providerId: string;

  @Column({ name: 'amount_minor', type: 'int', unsigned: true })
  amountMinor: number;

  @Column({ type: 'char', length: 3 })
  currency: string;

  @CreatedAtColumn()
  createdAt: Date;
}
