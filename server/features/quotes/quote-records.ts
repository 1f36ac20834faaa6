import { In, type EntityManager } from 'typeorm';
import { DEFAULT_DEPOSIT_BPS } from '../../../shared/orders/timing';
import { BuilderProfile } from '../builders/builder-profile.entity';
import type { ServiceDetails } from '../listings/listing-details';
import type { Listing } from '../listings/listing.entity';
import { User } from '../users/user.entity';
import { BuilderQuoteSettings } from './builder-quote-settings.entity';

/** A builder as quotes show them: their name and trading name. */
export interface BuilderName {
  id: number;
  displayName: string;
  businessName: string;
}

/** Names of the builders with these ids, keyed by id; the trading name falls back to the person's name. */
export async function builderNames(m: EntityManager, ids: readonly number[]): Promise<Map<number, BuilderName>> {
  if (ids.length === 0) return new Map();
  const unique = [...new Set(ids)];
  const [users, profiles] = await Promise.all([
    m.find(User, { where: { id: In(unique) } }),
    m.find(BuilderProfile, { where: { userId: In(unique) } }),
  ]);
  const trading = new Map(profiles.map((p) => [p.userId, p.businessName]));
  return new Map(
    users.map((u) => [
      u.id,
      { id: u.id, displayName: u.displayName, businessName: trading.get(u.id) ?? u.displayName },
    ]),
  );
}

/** Each builder's deposit in basis points: their own setting, else the default. */
export async function depositRates(m: EntityManager, ids: readonly number[]): Promise<Map<number, number>> {
  const rows = ids.length ? await m.find(BuilderQuoteSettings, { where: { userId: In([...new Set(ids)]) } }) : [];
  const set = new Map(rows.map((r) => [r.userId, r.depositBps]));
  return new Map(ids.map((id) => [id, set.get(id) ?? DEFAULT_DEPOSIT_BPS]));
}

/** The rate card of a service listing (null for a module). */
export const rateCardOf = (listing: Listing) =>
  listing.details.type === 'service' ? (listing.details as ServiceDetails).rateCard : null;

/** Today as YYYY-MM-DD (UTC), and days after it. */
export function isoDay(daysAhead = 0, from = new Date()): string {
  const day = new Date(Date.UTC(from.getUTCFullYear(), from.getUTCMonth(), from.getUTCDate() + daysAhead));
  return day.toISOString().slice(0, 10);
}
