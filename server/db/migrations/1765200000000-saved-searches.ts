import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Members' saved searches, and which listings each has already announced. */
export class SavedSearches1765200000000 implements MigrationInterface {
  name = 'SavedSearches1765200000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE saved_searches (
      id int unsigned NOT NULL AUTO_INCREMENT,
      owner_id int unsigned NOT NULL,
      name varchar(80) NOT NULL,
      query json NOT NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      last_notified_at datetime(3) NULL,
      PRIMARY KEY (id),
      INDEX ix_saved_searches_owner (owner_id, created_at),
      CONSTRAINT fk_saved_searches_owner FOREIGN KEY (owner_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE saved_search_hits (
      saved_search_id int unsigned NOT NULL,
      listing_id int unsigned NOT NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (saved_search_id, listing_id),
      CONSTRAINT fk_saved_search_hits_search FOREIGN KEY (saved_search_id) REFERENCES saved_searches (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_saved_search_hits_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE saved_search_hits');
    await q.query('DROP TABLE saved_searches');
  }
}
