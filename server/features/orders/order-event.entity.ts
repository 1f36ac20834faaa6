import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { ORDER_STATES, type OrderMover, type OrderState } from '../../../shared/orders/states';
import { CreatedAtColumn } from '../../db/columns';
import { Order } from './order.entity';

export const ORDER_MOVERS = ['buyer', 'seller', 'moderator', 'payments', 'system'] as const;

/** One move in an order's history: what, who and when. Written only by the order lifecycle. */
@Entity({ name: 'order_events' })
@Index('ix_order_events_order', ['orderId', 'id'])
export class OrderEvent {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'order_id', type: 'int', unsigned: true })
  orderId: number;

  @ManyToOne(() => Order, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'order_id', foreignKeyConstraintName: 'fk_order_events_order' })
  order?: Order;

  /** The move's name from ORDER_MOVES, or 'create' and 'stage' for entries that do not change the state. */
  @Column({ type: 'varchar', length: 32 })
  move: string;

  @Column({ name: 'from_state', type: 'enum', enum: ORDER_STATES, nullable: true })
  fromState: OrderState | null;

  @Column({ name: 'to_state', type: 'enum', enum: ORDER_STATES })
  toState: OrderState;

  @Column({ name: 'actor_kind', type: 'enum', enum: ORDER_MOVERS })
  actorKind: OrderMover;

  /** The person who made the move; null for payment events and timers. */
  @Column({ name: 'actor_id', type: 'int', unsigned: true, nullable: true })
  actorId: number | null;

  @Column({ type: 'varchar', length: 2000, nullable: true })
  note: string | null;

  @CreatedAtColumn()
  createdAt: Date;
}
