import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Threads between buyers and sellers (per listing and asking member, and per order), their sides and messages. */
export class Conversations1766000000000 implements MigrationInterface {
  name = 'Conversations1766000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE conversations (
      id int unsigned NOT NULL AUTO_INCREMENT,
      kind enum('listing','order') NOT NULL,
      thread_key varchar(40) NOT NULL,
      listing_id int unsigned NOT NULL,
      order_id int unsigned NULL,
      buyer_id int unsigned NOT NULL,
      seller_id int unsigned NOT NULL,
      last_message_at datetime(3) NULL,
      flagged_at datetime(3) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_conversations_key (thread_key),
      INDEX ix_conversations_buyer_created (buyer_id, created_at),
      INDEX ix_conversations_flagged (flagged_at),
      CONSTRAINT fk_conversations_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_conversations_order FOREIGN KEY (order_id) REFERENCES orders (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_conversations_buyer FOREIGN KEY (buyer_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_conversations_seller FOREIGN KEY (seller_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE conversation_participants (
      conversation_id int unsigned NOT NULL,
      user_id int unsigned NOT NULL,
      last_read_message_id int unsigned NULL,
      unread_count int unsigned NOT NULL DEFAULT 0,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (conversation_id, user_id),
      INDEX ix_conversation_participants_user_unread (user_id, unread_count),
      CONSTRAINT fk_conversation_participants_conversation FOREIGN KEY (conversation_id) REFERENCES conversations (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_conversation_participants_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE conversation_messages (
      id int unsigned NOT NULL AUTO_INCREMENT,
      conversation_id int unsigned NOT NULL,
      sender_id int unsigned NOT NULL,
      body varchar(2000) NOT NULL,
      contact_details json NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_conversation_messages_thread (conversation_id, id),
      INDEX ix_conversation_messages_sender_created (sender_id, created_at),
      CONSTRAINT fk_conversation_messages_conversation FOREIGN KEY (conversation_id) REFERENCES conversations (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_conversation_messages_sender FOREIGN KEY (sender_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE conversation_messages');
    await q.query('DROP TABLE conversation_participants');
    await q.query('DROP TABLE conversations');
  }
}
