import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { User } from '../users/user.entity';

/** A seller's connected payout account at the payment provider; money can be sent once `ready`. */
@Entity({ name: 'payout_accounts' })
@Index('uq_payout_accounts_user', ['userId'], { unique: true })
@Index('uq_payout_accounts_account', ['accountId'], { unique: true })
export class PayoutAccount {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'user_id', type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'fk_payout_accounts_user' })
  user?: User;

  /** The provider's account id (acct_…). */
  @Column({ name: 'account_id', type: 'varchar', length: 64 })
  accountId: string;

  /** Onboarding finished and transfers enabled, as last reported by the provider. */
  @Column({ type: 'boolean', default: false })
  ready: boolean;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
