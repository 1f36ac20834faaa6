import type { EntityManager } from 'typeorm';
import { findContactDetails } from '../../../shared/listings/contact-details';
import { CHECKLIST_ITEMS, CHECKLIST_LABELS } from '../../../shared/listings/moderation';
import type { ModerationQueueQuery } from '../../../shared/schemas/listing-moderation';
import type { ContactFlagView, ModerationQueueItem } from '../../../shared/types/listings';
import type { Page } from '../../../shared/types/user';
import { photosByListing } from '../photos/listing-photos.repository';
import { gazetteer } from '../towns/gazetteer';
import { ListingDecision } from './listing-decision.entity';
import type { ModuleDetails } from './listing-details';
import { ListingReport } from './listing-report.entity';
import type { Listing } from './listing.entity';
import { presentDecision, presentOwnListing } from './listing.presenter';
import { listingsInOrder } from './listing.repository';

/**
 * Listings waiting for a moderator: those submitted for review and those with open reports, oldest first by when
 * they started waiting (submission or first open report, whichever came first).
 */
const FROM = `FROM listings l
  LEFT JOIN (SELECT listing_id, MIN(created_at) AS first_at FROM listing_reports
             WHERE resolved_at IS NULL GROUP BY listing_id) r ON r.listing_id = l.id
  WHERE l.state = 'awaiting_review' OR r.listing_id IS NOT NULL`;
const QUEUED_AT = `CASE WHEN l.state = 'awaiting_review' AND (r.first_at IS NULL OR l.submitted_at <= r.first_at)
  THEN l.submitted_at ELSE r.first_at END`;

/** Spots in the seller's own words that look like an e-mail address or a phone number. */
export function contactFlags(l: Listing): ContactFlagView[] {
  const d = l.details.type === 'module' ? (l.details as ModuleDetails) : null;
  const fields: [ContactFlagView['field'], string][] = [
    ['title', l.title],
    ['description', l.description],
    ['conditionNotes', d?.conditionNotes ?? ''],
    ['boardConnectors', d?.wiring?.boardConnectors ?? ''],
  ];
  return fields.flatMap(([field, text]) => findContactDetails(text).map((f) => ({ field, ...f })));
}

const CHECKLIST = CHECKLIST_ITEMS.map((item) => ({ item, label: CHECKLIST_LABELS[item] }));

export async function moderationQueue(
  m: EntityManager,
  query: ModerationQueueQuery,
): Promise<Page<ModerationQueueItem>> {
  const rows = (await m.query(
    `SELECT l.id AS id, ${QUEUED_AT} AS queued_at ${FROM} ORDER BY queued_at ASC, l.id ASC LIMIT ? OFFSET ?`,
    [query.pageSize, (query.page - 1) * query.pageSize],
  )) as { id: number; queued_at: Date }[];
  const [{ total }] = (await m.query(`SELECT COUNT(*) AS total ${FROM}`)) as [{ total: number | string }];
  const ids = rows.map((r) => Number(r.id));
  const [listings, towns, photos, reports, decisions] = await Promise.all([
    listingsInOrder(m, ids),
    gazetteer(),
    photosByListing(m, ids),
    ids.length
      ? m
          .getRepository(ListingReport)
          .createQueryBuilder('r')
          .innerJoinAndSelect('r.reporter', 'reporter')
          .where('r.listing_id IN (:...ids) AND r.resolved_at IS NULL', { ids })
          .orderBy('r.id', 'ASC')
          .getMany()
      : [],
    ids.length
      ? m
          .getRepository(ListingDecision)
          .createQueryBuilder('d')
          .leftJoinAndSelect('d.moderator', 'moderator')
          .where('d.listing_id IN (:...ids)', { ids })
          .orderBy('d.id', 'ASC')
          .getMany()
      : [],
  ]);
  const queuedAt = new Map(rows.map((r) => [Number(r.id), new Date(r.queued_at)]));
  const items = listings.map((l): ModerationQueueItem => {
    const history = decisions.filter((d) => d.listingId === l.id);
    return {
      listing: presentOwnListing(l, towns, photos.get(l.id) ?? [], history.at(-1), true),
      queuedAt: queuedAt.get(l.id)!.toISOString(),
      awaitingReview: l.state === 'awaiting_review',
      reports: reports
        .filter((r) => r.listingId === l.id)
        .map((r) => ({
          id: r.id,
          reason: r.reason,
          details: r.details,
          reporter: { id: r.reporterId, displayName: r.reporter?.displayName ?? '' },
          at: r.createdAt.toISOString(),
        })),
      checklist: CHECKLIST,
      flags: contactFlags(l),
      history: history.map((d) => presentDecision(d, true)),
    };
  });
  return { items, total: Number(total), page: query.page, pageSize: query.pageSize };
}
