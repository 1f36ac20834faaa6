import { HeadObjectCommand } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { DEMO_LISTINGS } from '../../server/db/seeds/data';
import { DEMO_ACCOUNTS, DEMO_SELLERS } from '../../server/db/seeds/demo-accounts';
import { seedDemo, type DemoSeedReport } from '../../server/db/seeds/demo-seed';
import { passwordProblem } from '../../server/features/auth/password-policy';
import { objectKey } from '../../server/features/photos/photo-objects';
import { PASSWORD_MIN_LENGTH } from '../../shared/limits';
import { PHOTO_VARIANTS } from '../../shared/listings/photo-limits';
import { startTestApp } from '../support/test-app';

/**
 * The demo scenario seeded into the test database, twice: the second run must find everything in place and change
 * nothing. Seeding draws and uploads about 140 pictures the first time, hence the long set-up.
 */
let app: AppInstance;
let second: DemoSeedReport;
let before: Snapshot;
const emails = [...DEMO_ACCOUNTS, ...DEMO_SELLERS].map((a) => a.email);

const query = <T>(sql: string, params: unknown[] = []) => app.ctx.dataSource.query(sql, params) as Promise<T[]>;

/** Everything the seed writes about the demo's people and listings, as plain values. */
async function snapshot() {
  const [users, listings, photos, decisions, audit, mail, profiles] = await Promise.all([
    query('SELECT id, email, password_hash, role, updated_at FROM users WHERE email IN (?) ORDER BY id', [emails]),
    query(
      'SELECT l.id, l.state, l.title, l.updated_at FROM listings l JOIN users u ON u.id = l.owner_id ' +
        'WHERE u.email IN (?) ORDER BY l.id',
      [emails],
    ),
    query(
      'SELECT p.id, p.listing_id, p.storage_key, p.position FROM listing_photos p JOIN listings l ON l.id = p.listing_id ' +
        'JOIN users u ON u.id = l.owner_id WHERE u.email IN (?) ORDER BY p.id',
      [emails],
    ),
    query(
      'SELECT COUNT(*) AS n FROM listing_decisions d JOIN listings l ON l.id = d.listing_id JOIN users u ON u.id = l.owner_id ' +
        'WHERE u.email IN (?)',
      [emails],
    ),
    query(
      "SELECT COUNT(*) AS n FROM audit_events a JOIN listings l ON a.target_type = 'listing' AND a.target_id = l.id " +
        'JOIN users u ON u.id = l.owner_id WHERE u.email IN (?)',
      [emails],
    ),
    query('SELECT COUNT(*) AS n FROM outbound_emails WHERE to_address IN (?)', [emails]),
    query(
      'SELECT b.id, b.state, b.updated_at FROM builder_profiles b JOIN users u ON u.id = b.user_id ' +
        'WHERE u.email IN (?) ORDER BY b.id',
      [emails],
    ),
  ]);
  return { users, listings, photos, decisions, audit, mail, profiles };
}
type Snapshot = Awaited<ReturnType<typeof snapshot>>;

/** Demo slug → the listing's id and state. */
async function demoListings(): Promise<Map<string, { id: number; state: string }>> {
  const rows = await query<{ slug: string; id: number; state: string }>(
    "SELECT JSON_VALUE(a.detail, '$.slug') AS slug, l.id, l.state FROM audit_events a " +
      "JOIN listings l ON l.id = a.target_id WHERE a.action = 'demo.listing_seeded'",
  );
  return new Map(rows.map((r) => [r.slug, { id: Number(r.id), state: r.state }]));
}

beforeAll(async () => {
  app = await startTestApp();
  await seedDemo(app.ctx);
  before = await snapshot();
  second = await seedDemo(app.ctx);
}, 180_000);
afterAll(() => app.close());

describe('seeding the demo scenario', () => {
  it('changes nothing when it runs a second time', async () => {
    expect(second.accountsChanged).toBe(0);
    expect(second.listings).toEqual({ created: 0, photos: 0, moves: 0, skipped: [] });
    expect(await snapshot()).toEqual(before);
  });

  it('leaves every demo listing in the state the scenario names', async () => {
    const seeded = await demoListings();
    expect(DEMO_LISTINGS.length).toBeGreaterThanOrEqual(40);
    for (const { slug, state } of DEMO_LISTINGS)
      expect({ slug, state: seeded.get(slug)?.state }).toEqual({ slug, state });
  });

  it('gives every listed listing a photo whose stored sizes exist', async () => {
    const listed = [...(await demoListings()).values()].filter((l) => l.state === 'listed');
    expect(listed.length).toBeGreaterThanOrEqual(30);
    for (const { id } of listed) {
      const photos = await query<{ storage_key: string }>(
        'SELECT storage_key FROM listing_photos WHERE listing_id = ?',
        [id],
      );
      expect(photos.length).toBeGreaterThanOrEqual(1);
      for (const { storage_key: key } of photos)
        for (const variant of PHOTO_VARIANTS) {
          const head = await app.ctx.storage.send(
            new HeadObjectCommand({ Bucket: app.ctx.config.s3.bucket, Key: objectKey(key, variant) }),
          );
          expect(head.ContentType).toBe('image/jpeg');
        }
    }
  });

  it('gives every seller a .test address and a password the policy accepts', () => {
    const sellers = new Set(DEMO_LISTINGS.map((l) => l.seller));
    for (const account of [...DEMO_ACCOUNTS, ...DEMO_SELLERS]) {
      expect(account.email).toMatch(/\.test$/);
      expect(account.password.length).toBeGreaterThanOrEqual(PASSWORD_MIN_LENGTH);
      expect(passwordProblem(account.password, account)).toBeNull();
    }
    for (const seller of sellers) expect(emails).toContain(seller);
  });
});
