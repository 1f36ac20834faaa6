import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';
const FK = 'ON UPDATE NO ACTION';

/**
 * Reviews after a paid-out order, and each member's running rating (count and sum of shown stars) kept on the
 * users row, so search cards show it without aggregating reviews.
 */
export class Reviews1766200000000 implements MigrationInterface {
  name = 'Reviews1766200000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE reviews (
      id int unsigned NOT NULL AUTO_INCREMENT,
      order_id int unsigned NOT NULL,
      author_id int unsigned NOT NULL,
      subject_id int unsigned NOT NULL,
      author_role enum('buyer','seller') NOT NULL,
      stars tinyint unsigned NOT NULL,
      text varchar(500) NOT NULL,
      hidden_at datetime(3) NULL,
      hidden_by int unsigned NULL,
      hidden_reason varchar(500) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_reviews_order_author (order_id, author_id),
      INDEX ix_reviews_subject_shown (subject_id, hidden_at, created_at),
      INDEX ix_reviews_hidden (hidden_at, id),
      CONSTRAINT fk_reviews_order FOREIGN KEY (order_id) REFERENCES orders (id) ON DELETE CASCADE ${FK},
      CONSTRAINT fk_reviews_author FOREIGN KEY (author_id) REFERENCES users (id) ON DELETE RESTRICT ${FK},
      CONSTRAINT fk_reviews_subject FOREIGN KEY (subject_id) REFERENCES users (id) ON DELETE RESTRICT ${FK},
      CONSTRAINT fk_reviews_hidden_by FOREIGN KEY (hidden_by) REFERENCES users (id) ON DELETE SET NULL ${FK}
    ) ${TABLE}`);
    await q.query(`ALTER TABLE users
      ADD COLUMN rating_count int unsigned NOT NULL DEFAULT 0,
      ADD COLUMN rating_sum int unsigned NOT NULL DEFAULT 0`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE users DROP COLUMN rating_sum, DROP COLUMN rating_count');
    await q.query('DROP TABLE reviews');
  }
}
