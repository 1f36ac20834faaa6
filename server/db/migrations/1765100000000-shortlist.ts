import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Members' shortlists of listings. */
export class Shortlist1765100000000 implements MigrationInterface {
  name = 'Shortlist1765100000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE shortlist_entries (
      id int unsigned NOT NULL AUTO_INCREMENT,
      user_id int unsigned NOT NULL,
      listing_id int unsigned NOT NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_shortlist_entries_user_listing (user_id, listing_id),
      INDEX ix_shortlist_entries_user_created (user_id, created_at),
      CONSTRAINT fk_shortlist_entries_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_shortlist_entries_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE shortlist_entries');
  }
}
