import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Module and build-service listings, their moderation decisions and reports, and builder profiles. */
export class Listings1764800000000 implements MigrationInterface {
  name = 'Listings1764800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE listings (
      id int unsigned NOT NULL AUTO_INCREMENT,
      kind enum('module','service') NOT NULL,
      state enum('draft','awaiting_review','listed','sent_back','reserved','sold','withdrawn') NOT NULL DEFAULT 'draft',
      owner_id int unsigned NOT NULL,
      title varchar(100) NOT NULL,
      description text NOT NULL,
      currency char(3) NOT NULL DEFAULT 'GBP',
      town_id int unsigned NOT NULL,
      latitude decimal(5,2) NOT NULL,
      longitude decimal(6,2) NOT NULL,
      scale_id varchar(16) NULL,
      length_mm smallint unsigned NULL,
      width_mm smallint unsigned NULL,
      height_mm smallint unsigned NULL,
      board_count tinyint unsigned NULL,
      join_method enum('bolts','dowels','pattern-makers-dowels','clamps','other') NULL,
      finish enum('bare-frame','topped','track-laid','wired-running','part-sceniced','fully-sceniced') NULL,
      item_condition enum('as-new','sound','worn','needs-repair') NULL,
      control enum('dc','dcc') NULL,
      price_minor int unsigned NULL,
      weight_g int unsigned NULL,
      offers_collection tinyint NULL,
      delivery_km smallint unsigned NULL,
      delivery_price_minor int unsigned NULL,
      courier enum('parcel','pallet') NULL,
      end_profiles json NULL,
      service_area_km smallint unsigned NULL,
      lead_time_weeks tinyint unsigned NULL,
      details json NOT NULL,
      submitted_at datetime(3) NULL,
      published_at datetime(3) NULL,
      state_changed_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      FULLTEXT INDEX ft_listings_text (title, description),
      INDEX ix_listings_state_published (state, published_at),
      INDEX ix_listings_state_price (state, price_minor),
      INDEX ix_listings_state_scale (state, scale_id),
      INDEX ix_listings_state_position (state, latitude, longitude),
      INDEX ix_listings_state_submitted (state, submitted_at),
      INDEX ix_listings_owner_state (owner_id, state),
      CONSTRAINT fk_listings_owner FOREIGN KEY (owner_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);

    await q.query(`CREATE TABLE listing_decisions (
      id int unsigned NOT NULL AUTO_INCREMENT,
      listing_id int unsigned NOT NULL,
      moderator_id int unsigned NULL,
      decision enum('approved','sent_back','taken_down','reports_dismissed') NOT NULL,
      reasons json NOT NULL,
      note varchar(500) NOT NULL DEFAULT '',
      checklist json NULL,
      seller_action enum('none','warn','suspend') NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_listing_decisions_listing (listing_id, created_at),
      CONSTRAINT fk_listing_decisions_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_listing_decisions_moderator FOREIGN KEY (moderator_id) REFERENCES users (id) ON DELETE SET NULL ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);

    await q.query(`CREATE TABLE listing_reports (
      id int unsigned NOT NULL AUTO_INCREMENT,
      listing_id int unsigned NOT NULL,
      reporter_id int unsigned NOT NULL,
      reason enum('misdescribed','prohibited','contact-details','suspected-fraud','duplicate','other') NOT NULL,
      details varchar(1000) NOT NULL DEFAULT '',
      resolved_at datetime(3) NULL,
      resolved_by_decision_id int unsigned NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_listing_reports_open (listing_id, resolved_at),
      INDEX ix_listing_reports_reporter (reporter_id, listing_id),
      CONSTRAINT fk_listing_reports_listing FOREIGN KEY (listing_id) REFERENCES listings (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_listing_reports_reporter FOREIGN KEY (reporter_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_listing_reports_decision FOREIGN KEY (resolved_by_decision_id) REFERENCES listing_decisions (id) ON DELETE SET NULL ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);

    await q.query(`CREATE TABLE builder_profiles (
      id int unsigned NOT NULL AUTO_INCREMENT,
      user_id int unsigned NOT NULL,
      business_name varchar(80) NOT NULL,
      about text NOT NULL,
      town_id int unsigned NOT NULL,
      builds json NOT NULL,
      state enum('applied','approved','declined') NOT NULL DEFAULT 'applied',
      decided_by int unsigned NULL,
      decided_at datetime(3) NULL,
      decision_note varchar(500) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_builder_profiles_user (user_id),
      INDEX ix_builder_profiles_state (state, created_at),
      CONSTRAINT fk_builder_profiles_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT fk_builder_profiles_decided_by FOREIGN KEY (decided_by) REFERENCES users (id) ON DELETE SET NULL ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['builder_profiles', 'listing_reports', 'listing_decisions', 'listings']) {
      await q.query(`DROP TABLE ${table}`);
    }
  }
}
