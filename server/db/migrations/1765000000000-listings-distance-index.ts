import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The distance search reads one index instead of the listings: modules by state, kind and a latitude/longitude box,
 * services by state and kind with their service area, and the seller for the suspended check. It replaces the
 * (state, latitude, longitude) index, which the search could not use once services were part of the same query.
 */
export class ListingsDistanceIndex1765000000000 implements MigrationInterface {
  name = 'ListingsDistanceIndex1765000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      'CREATE INDEX ix_listings_state_kind_position ON listings (state, kind, latitude, longitude, service_area_km, owner_id)',
    );
    await q.query('DROP INDEX ix_listings_state_position ON listings');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('CREATE INDEX ix_listings_state_position ON listings (state, latitude, longitude)');
    await q.query('DROP INDEX ix_listings_state_kind_position ON listings');
  }
}
