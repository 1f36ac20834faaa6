import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';

/** A verified provider event already acted on; a repeat delivery of the same id changes nothing. */
@Entity({ name: 'handled_payment_events' })
export class HandledPaymentEvent {
  @PrimaryColumn({ name: 'event_id', type: 'varchar', length: 64 })
  eventId: string;

  @Column({ type: 'varchar', length: 64 })
  type: string;

  @CreatedAtColumn()
  createdAt: Date;
}
