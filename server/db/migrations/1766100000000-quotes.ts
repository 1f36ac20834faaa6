import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Quote requests from buyers, the builders each went to, the builders' quotes, and builders' quoting settings. */
export class Quotes1766100000000 implements MigrationInterface {
  name = 'Quotes1766100000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE quote_requests (
      id int unsigned NOT NULL AUTO_INCREMENT,
      buyer_id int unsigned NOT NULL,
      plan_id int unsigned NULL,
      plan_name varchar(120) NOT NULL,
      plan_input json NOT NULL,
      town_id int unsigned NOT NULL,
      notes varchar(2000) NOT NULL,
      needed_by date NULL,
      state enum('open','accepted') NOT NULL DEFAULT 'open',
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_quote_requests_buyer_created (buyer_id, created_at),
      CONSTRAINT fk_quote_requests_buyer FOREIGN KEY (buyer_id) REFERENCES users (id) ON DELETE RESTRICT ON UPDATE NO ACTION,
      CONSTRAINT fk_quote_requests_plan FOREIGN KEY (plan_id) REFERENCES saved_plans (id) ON DELETE SET NULL ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE quote_recipients (
      id int unsigned NOT NULL AUTO_INCREMENT,
      request_id int unsigned NOT NULL,
      builder_id int unsigned NOT NULL,
      listing_id int unsigned NOT NULL,
      distance_km smallint unsigned NOT NULL,
      state enum('waiting','quoted') NOT NULL DEFAULT 'waiting',
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_quote_recipients_request_builder (request_id, builder_id),
      INDEX ix_quote_recipients_builder_created (builder_id, created_at),
      CONSTRAINT fk_quote_recipients_request FOREIGN KEY (request_id) REFERENCES quote_requests (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_quote_recipients_builder FOREIGN KEY (builder_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_quote_recipients_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE quotes (
      id int unsigned NOT NULL AUTO_INCREMENT,
      request_id int unsigned NOT NULL,
      recipient_id int unsigned NOT NULL,
      currency char(3) NOT NULL,
      price_lines json NOT NULL,
      item_minor int unsigned NOT NULL,
      delivery_km smallint unsigned NOT NULL,
      delivery_minor int unsigned NOT NULL,
      deposit_bps smallint unsigned NOT NULL,
      lead_time_weeks tinyint unsigned NOT NULL,
      valid_until date NOT NULL,
      note varchar(1000) NOT NULL,
      adjusted tinyint NOT NULL DEFAULT 0,
      state enum('sent','accepted','not_chosen') NOT NULL DEFAULT 'sent',
      order_id int unsigned NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_quotes_recipient (recipient_id),
      UNIQUE INDEX uq_quotes_order (order_id),
      INDEX ix_quotes_request (request_id, created_at),
      CONSTRAINT fk_quotes_request FOREIGN KEY (request_id) REFERENCES quote_requests (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_quotes_recipient FOREIGN KEY (recipient_id) REFERENCES quote_recipients (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_quotes_order FOREIGN KEY (order_id) REFERENCES orders (id) ON DELETE RESTRICT ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE builder_quote_settings (
      user_id int unsigned NOT NULL,
      deposit_bps smallint unsigned NOT NULL,
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (user_id),
      CONSTRAINT fk_builder_quote_settings_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE builder_quote_settings');
    await q.query('DROP TABLE quotes');
    await q.query('DROP TABLE quote_recipients');
    await q.query('DROP TABLE quote_requests');
  }
}
