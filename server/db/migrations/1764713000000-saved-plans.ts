import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Frame plans saved to members' accounts. */
export class SavedPlans1764713000000 implements MigrationInterface {
  name = 'SavedPlans1764713000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE saved_plans (
      id int unsigned NOT NULL AUTO_INCREMENT,
      owner_id int unsigned NOT NULL,
      name varchar(120) NOT NULL,
      input json NOT NULL,
      share_token char(43) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_saved_plans_share_token (share_token),
      INDEX ix_saved_plans_owner (owner_id, updated_at),
      CONSTRAINT fk_saved_plans_owner FOREIGN KEY (owner_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE saved_plans');
  }
}
