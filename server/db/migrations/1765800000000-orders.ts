import type { MigrationInterface, QueryRunner } from 'typeorm';
import { DEFAULT_BUYER_FEE_BPS, DEFAULT_COMMISSION_BPS } from '../../../shared/orders/timing';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';
const STATES = `'awaiting_payment','awaiting_deposit','in_build','awaiting_balance','paid_held','sent',
  'ready_to_collect','received','paid_out','problem_raised','cancelled','refunded','lapsed'`;
const FK = 'ON UPDATE NO ACTION';

/** Orders, their history, payments, money movements, payout accounts, handled provider events and fee rates. */
export class Orders1765800000000 implements MigrationInterface {
  name = 'Orders1765800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE orders (
      id int unsigned NOT NULL AUTO_INCREMENT,
      kind enum('module','build') NOT NULL,
      state enum(${STATES}) NOT NULL,
      listing_id int unsigned NOT NULL,
      quote_id int unsigned NULL,
      buyer_id int unsigned NOT NULL,
      seller_id int unsigned NOT NULL,
      currency char(3) NOT NULL,
      handover enum('collection','seller_delivery','parcel','pallet') NOT NULL,
      delivery_address varchar(500) NULL,
      item_minor int unsigned NOT NULL,
      delivery_minor int unsigned NOT NULL,
      buyer_fee_minor int unsigned NOT NULL,
      total_minor int unsigned NOT NULL,
      commission_bps smallint unsigned NOT NULL,
      buyer_fee_bps smallint unsigned NOT NULL,
      commission_minor int unsigned NOT NULL,
      payout_minor int unsigned NOT NULL,
      deposit_minor int unsigned NOT NULL DEFAULT 0,
      refunded_minor int unsigned NOT NULL DEFAULT 0,
      transferred_minor int unsigned NOT NULL DEFAULT 0,
      payable_until datetime(3) NULL,
      handed_over_at datetime(3) NULL,
      confirm_by datetime(3) NULL,
      problem_raised_at datetime(3) NULL,
      state_changed_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_orders_buyer_created (buyer_id, created_at),
      INDEX ix_orders_seller_created (seller_id, created_at),
      INDEX ix_orders_state_payable (state, payable_until),
      INDEX ix_orders_state_confirm (state, confirm_by),
      CONSTRAINT fk_orders_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE RESTRICT ${FK},
      CONSTRAINT fk_orders_buyer FOREIGN KEY (buyer_id) REFERENCES users (id) ON DELETE RESTRICT ${FK},
      CONSTRAINT fk_orders_seller FOREIGN KEY (seller_id) REFERENCES users (id) ON DELETE RESTRICT ${FK}
    ) ${TABLE}`);
    await q.query(`CREATE TABLE order_events (
      id int unsigned NOT NULL AUTO_INCREMENT,
      order_id int unsigned NOT NULL,
      move varchar(32) NOT NULL,
      from_state enum(${STATES}) NULL,
      to_state enum(${STATES}) NOT NULL,
      actor_kind enum('buyer','seller','moderator','payments','system') NOT NULL,
      actor_id int unsigned NULL,
      note varchar(2000) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_order_events_order (order_id, id),
      CONSTRAINT fk_order_events_order FOREIGN KEY (order_id) REFERENCES orders (id) ON DELETE CASCADE ${FK}
    ) ${TABLE}`);
    await q.query(`CREATE TABLE order_payments (
      id int unsigned NOT NULL AUTO_INCREMENT,
      order_id int unsigned NOT NULL,
      purpose enum('full','deposit','balance') NOT NULL,
      attempt smallint unsigned NOT NULL,
      amount_minor int unsigned NOT NULL,
      currency char(3) NOT NULL,
      intent_id varchar(64) NULL,
      status enum('started','needs_authentication','succeeded','failed','cancelled') NOT NULL DEFAULT 'started',
      failure_code varchar(64) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_order_payments_attempt (order_id, purpose, attempt),
      UNIQUE INDEX uq_order_payments_intent (intent_id),
      CONSTRAINT fk_order_payments_order FOREIGN KEY (order_id) REFERENCES orders (id) ON DELETE CASCADE ${FK}
    ) ${TABLE}`);
    await q.query(`CREATE TABLE money_movements (
      id int unsigned NOT NULL AUTO_INCREMENT,
      order_id int unsigned NOT NULL,
      kind enum('charge','refund','transfer','transfer_reversal') NOT NULL,
      provider_id varchar(64) NOT NULL,
      amount_minor int unsigned NOT NULL,
      currency char(3) NOT NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_money_movements_provider (provider_id),
      INDEX ix_money_movements_order (order_id, kind),
      CONSTRAINT fk_money_movements_order FOREIGN KEY (order_id) REFERENCES orders (id) ON DELETE RESTRICT ${FK}
    ) ${TABLE}`);
    await q.query(`CREATE TABLE payout_accounts (
      id int unsigned NOT NULL AUTO_INCREMENT,
      user_id int unsigned NOT NULL,
      account_id varchar(64) NOT NULL,
      ready tinyint NOT NULL DEFAULT 0,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_payout_accounts_user (user_id),
      UNIQUE INDEX uq_payout_accounts_account (account_id),
      CONSTRAINT fk_payout_accounts_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE RESTRICT ${FK}
    ) ${TABLE}`);
    await q.query(`CREATE TABLE handled_payment_events (
      event_id varchar(64) NOT NULL,
      type varchar(64) NOT NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (event_id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE fee_schedules (
      id int unsigned NOT NULL AUTO_INCREMENT,
      commission_bps smallint unsigned NOT NULL,
      buyer_fee_bps smallint unsigned NOT NULL,
      set_by_id int unsigned NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      CONSTRAINT fk_fee_schedules_set_by FOREIGN KEY (set_by_id) REFERENCES users (id) ON DELETE SET NULL ${FK}
    ) ${TABLE}`);
    await q.query('INSERT INTO fee_schedules (commission_bps, buyer_fee_bps) VALUES (?, ?)', [
      DEFAULT_COMMISSION_BPS,
      DEFAULT_BUYER_FEE_BPS,
    ]);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of [
      'fee_schedules',
      'handled_payment_events',
      'payout_accounts',
      'money_movements',
      'order_payments',
      'order_events',
      'orders',
    ]) {
      await q.query(`DROP TABLE ${table}`);
    }
  }
}
