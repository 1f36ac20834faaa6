import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Listing photos: where each photo's two re-encoded sizes are stored, its order, and which one is the cover. */
export class ListingPhotos1764900000000 implements MigrationInterface {
  name = 'ListingPhotos1764900000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE listing_photos (
      id int unsigned NOT NULL AUTO_INCREMENT,
      listing_id int unsigned NOT NULL,
      position tinyint unsigned NOT NULL,
      is_cover tinyint NOT NULL,
      storage_key char(43) CHARACTER SET ascii COLLATE ascii_bin NOT NULL,
      width smallint unsigned NOT NULL,
      height smallint unsigned NOT NULL,
      thumb_bytes int unsigned NOT NULL,
      display_bytes int unsigned NOT NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_listing_photos_listing (listing_id, position),
      UNIQUE INDEX uq_listing_photos_key (storage_key),
      CONSTRAINT fk_listing_photos_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE listing_photos');
  }
}
