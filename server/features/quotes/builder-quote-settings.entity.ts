import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { UpdatedAtColumn } from '../../db/columns';
import { User } from '../users/user.entity';

/** A builder's own quoting terms; a builder without a row asks the default deposit. */
@Entity({ name: 'builder_quote_settings' })
export class BuilderQuoteSettings {
  @PrimaryColumn({ name: 'user_id', type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'fk_builder_quote_settings_user' })
  user?: User;

  /** Deposit asked when a quote is accepted, basis points of the order total. */
  @Column({ name: 'deposit_bps', type: 'smallint', unsigned: true })
  depositBps: number;

  @UpdatedAtColumn()
  updatedAt: Date;
}
