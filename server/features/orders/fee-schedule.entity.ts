import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { User } from '../users/user.entity';

/** The platform's rates from a moment on; the newest row applies to new orders. Rows are never changed. */
@Entity({ name: 'fee_schedules' })
export class FeeSchedule {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'commission_bps', type: 'smallint', unsigned: true })
  commissionBps: number;

  @Column({ name: 'buyer_fee_bps', type: 'smallint', unsigned: true })
  buyerFeeBps: number;

  /** The administrator who set it; null for the rates the platform starts with. */
  @Column({ name: 'set_by_id', type: 'int', unsigned: true, nullable: true })
  setById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'set_by_id', foreignKeyConstraintName: 'fk_fee_schedules_set_by' })
  setBy?: User | null;

  @CreatedAtColumn()
  createdAt: Date;
}
