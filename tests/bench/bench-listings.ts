import { randomBytes } from 'node:crypto';
import type { Pool, ResultSetHeader, RowDataPacket } from 'mysql2/promise';
import type { DataSource } from 'typeorm';
import { hashPassword } from '../../server/features/auth/password-hash';
import { resolveLocation } from '../../server/features/listings/listing-location';
import { applyListingInput } from '../../server/features/listings/listing-mapping';
import { Listing } from '../../server/features/listings/listing.entity';
import { gazetteer, type Town } from '../../server/features/towns/gazetteer';
import { randomFrom } from '../../server/db/seeds/random';
import type { ListingState } from '../../shared/listings/states';
import { listingInputSchema } from '../../shared/schemas/listings';
import { benchModule, benchService, type Random } from './bench-listing-bodies';

/** Listed listings the search benchmark runs against. */
export const BENCH_LISTED = 20_000;
const SELLERS = 400;
const BUILDERS = 40;
const BATCH = 1000;

const count = async (pool: Pool, sql: string) =>
  Number(((await pool.query<RowDataPacket[]>(sql))[0][0] as { n: number }).n);

/** Invented sellers (members and builders) on the reserved .test domain; their ids by role. */
async function benchSellers(pool: Pool): Promise<{ members: number[]; builders: number[] }> {
  const hash = await hashPassword('bench-seller-never-signs-in');
  const rows = Array.from({ length: SELLERS + BUILDERS }, (_, i) => [
    `bench-seller-${i}@bench.test`,
    `Benchmark seller ${i}`,
    hash,
    i < SELLERS ? 'member' : 'builder',
    new Date(),
  ]);
  await pool.query('INSERT IGNORE INTO users (email, display_name, password_hash, role, email_verified_at) VALUES ?', [
    rows,
  ]);
  const [found] = await pool.query<RowDataPacket[]>(
    "SELECT id, role FROM users WHERE email LIKE 'bench-seller-%@bench.test' ORDER BY id",
  );
  return {
    members: found.filter((r) => r.role === 'member').map((r) => Number(r.id)),
    builders: found.filter((r) => r.role === 'builder').map((r) => Number(r.id)),
  };
}

/** Towns weighted by the square root of their population, so cities lead without swamping the rest. */
function townPicker(towns: Town[]): (rnd: Random) => Town {
  const weights = towns.map((t) => Math.sqrt(Math.max(t.population, 1000)));
  const total = weights.reduce((sum, w) => sum + w, 0);
  return (rnd) => {
    let roll = rnd() * total;
    for (let i = 0; i < towns.length; i += 1) if ((roll -= weights[i]!) < 0) return towns[i]!;
    return towns[0]!;
  };
}

/** Column values of a listing, in the order of `columns`, as mysql2 takes them (JSON as text). */
function rowOf(dataSource: DataSource, listing: Listing, columns: string[]): unknown[] {
  const meta = dataSource.getMetadata(Listing);
  return columns.map((name) => {
    const column = meta.findColumnWithDatabaseName(name)!;
    const value = column.getEntityValue(listing, true) as unknown;
    return column.type === 'json' && value !== null ? JSON.stringify(value) : value;
  });
}

/**
 * Make sure the bench database holds at least 20,000 listed listings (and about 8 % in other states): invented
 * modules and services across scales, prices and real towns, inserted 1,000 rows a statement. Each listed one gets a
 * photo row (no stored image: the benchmark never downloads one). Nothing happens when they are already there.
 */
export async function ensureBenchListings(pool: Pool, dataSource: DataSource): Promise<number> {
  const listed = await count(pool, "SELECT COUNT(*) AS n FROM listings WHERE state = 'listed'");
  if (listed >= BENCH_LISTED) return listed;
  const { members, builders } = await benchSellers(pool);
  const towns = (await gazetteer()).search('', 100_000);
  const townOf = townPicker(towns);
  const rnd = randomFrom(`bench-${listed}`);
  const columns = dataSource
    .getMetadata(Listing)
    .columns.map((c) => c.databaseName)
    .filter((name) => !['id', 'updated_at'].includes(name));
  const wanted = BENCH_LISTED - listed;
  const total = Math.round(wanted * 1.08);
  const now = Date.now();
  for (let done = 0; done < total; done += BATCH) {
    const batch: { row: unknown[]; state: ListingState }[] = [];
    for (let i = done; i < Math.min(total, done + BATCH); i += 1) {
      const town = townOf(rnd);
      const currency = town.country === 'IE' ? 'EUR' : 'GBP';
      const service = rnd() < 0.06;
      const body = service ? benchService(rnd, town.id, currency) : benchModule(rnd, town.id, currency);
      const input = listingInputSchema.parse(body);
      const { position } = await resolveLocation(input.townId);
      const state: ListingState = i < wanted ? 'listed' : (['draft', 'awaiting_review', 'withdrawn'] as const)[i % 3]!;
      const published = new Date(now - rnd() * 365 * 86_400_000);
      const listing = dataSource.getRepository(Listing).create({
        ownerId: service ? builders[i % builders.length]! : members[i % members.length]!,
        state,
        submittedAt: state === 'draft' ? null : published,
        publishedAt: state === 'listed' || state === 'withdrawn' ? published : null,
        stateChangedAt: published,
        createdAt: new Date(published.getTime() - 86_400_000),
      });
      applyListingInput(listing, input, position);
      batch.push({ row: rowOf(dataSource, listing, columns), state });
    }
    const [result] = await pool.query<ResultSetHeader>(`INSERT INTO listings (${columns.join(', ')}) VALUES ?`, [
      batch.map((b) => b.row),
    ]);
    const photos = batch.flatMap((b, i) =>
      b.state === 'listed'
        ? [[result.insertId + i, 1, 1, randomBytes(32).toString('base64url'), 1000, 667, 20_000, 60_000]]
        : [],
    );
    if (photos.length)
      await pool.query(
        'INSERT INTO listing_photos (listing_id, position, is_cover, storage_key, width, height, thumb_bytes, display_bytes) VALUES ?',
        [photos],
      );
  }
  return count(pool, "SELECT COUNT(*) AS n FROM listings WHERE state = 'listed'");
}
