import type { AppContext } from '../../app-context';
import { CHECKLIST_ITEMS } from '../../../shared/listings/moderation';
import { EDITABLE_LISTING_STATES, type ListingMove, type ListingState } from '../../../shared/listings/states';
import { approveSchema, sendBackSchema } from '../../../shared/schemas/listing-moderation';
import { listingInputSchema } from '../../../shared/schemas/listings';
import { recordAudit } from '../../features/audit/audit.service';
import { AuditEvent } from '../../features/audit/audit-event.entity';
import type { ListingActor } from '../../features/listings/listing-actor';
import { Listing } from '../../features/listings/listing.entity';
import { createListing, sellerMove } from '../../features/listings/listings.service';
import { approveListing, sendBackListing } from '../../features/listings/moderation.service';
import { addListingPhoto } from '../../features/photos/listing-photos.service';
import { countPhotos } from '../../features/photos/photo-rules';
import type { User } from '../../features/users/user.entity';
import { DEMO_LISTINGS, type DemoListing, type DemoState } from './data';
import { demoDrawings, toJpeg } from './pictures/render';

/** The audit action that ties a listing to its demo slug, so the next run finds it whatever has been edited. */
const SEEDED = 'demo.listing_seeded';

/** The moves that take a new draft to each demo state, as its seller and the moderator would make them. */
const PATHS: Record<DemoState, readonly ListingMove[]> = {
  draft: [],
  awaiting_review: ['submit'],
  listed: ['submit', 'approve'],
  sent_back: ['submit', 'sendBack'],
  withdrawn: ['submit', 'approve', 'withdraw'],
};
const AFTER: Partial<Record<ListingMove, ListingState>> = {
  submit: 'awaiting_review',
  approve: 'listed',
  sendBack: 'sent_back',
  withdraw: 'withdrawn',
};

export interface DemoListingsReport {
  created: number;
  photos: number;
  moves: number;
  /** Listings left as they were because someone moved them off the demo's path. */
  skipped: string[];
}

const actorOf = (user: User): ListingActor => ({ id: user.id, role: user.role, ip: '127.0.0.1' });

/** Demo slug → listing id, from the audit log. */
async function seededIds(ctx: AppContext): Promise<Map<string, number>> {
  const rows = await ctx.dataSource.getRepository(AuditEvent).find({ where: { action: SEEDED }, order: { id: 'ASC' } });
  return new Map(rows.map((row) => [String(row.detail?.slug), Number(row.targetId)]));
}

/** The demo listing's row: known by its slug, else (from an older seed) by seller and title, else a new draft. */
async function findOrCreate(ctx: AppContext, demo: DemoListing, owner: User, knownId: number | undefined) {
  const repo = ctx.dataSource.getRepository(Listing);
  const input = listingInputSchema.parse(demo.body);
  const known = knownId === undefined ? null : await repo.findOneBy({ id: knownId });
  if (known) return { listing: known, created: false };
  const found = await repo.findOneBy({ ownerId: owner.id, title: input.title });
  const id = found?.id ?? (await createListing(ctx, actorOf(owner), input)).id;
  await ctx.transaction((m) =>
    recordAudit(m, { actorId: null, action: SEEDED, targetType: 'listing', targetId: id, detail: { slug: demo.slug } }),
  );
  return { listing: await repo.findOneByOrFail({ id }), created: !found };
}

/** Upload the drawings the listing still lacks, through the photo pipeline, while its seller may still add them. */
async function addPictures(ctx: AppContext, demo: DemoListing, owner: User, listing: Listing): Promise<number> {
  if (!EDITABLE_LISTING_STATES.includes(listing.state)) return 0;
  const have = await countPhotos(ctx.dataSource.manager, listing.id);
  const drawings = demoDrawings(demo);
  for (const svg of drawings.slice(have)) await addListingPhoto(ctx, actorOf(owner), listing.id, await toJpeg(svg));
  return Math.max(0, drawings.length - have);
}

async function move(ctx: AppContext, demo: DemoListing, id: number, step: ListingMove, owner: User, moderator: User) {
  if (step === 'approve') {
    const checklist = Object.fromEntries(CHECKLIST_ITEMS.map((item) => [item, true]));
    return approveListing(ctx, actorOf(moderator), id, approveSchema.parse({ checklist }));
  }
  if (step === 'sendBack') return sendBackListing(ctx, actorOf(moderator), id, sendBackSchema.parse(demo.sendBack));
  if (step === 'submit' || step === 'withdraw') return sellerMove(ctx, actorOf(owner), id, step);
  throw new Error(`demo seed: no way to make the move ${step}`);
}

/** The moves still to make from `state` along the demo's path, or null when `state` is off the path. */
function remainingMoves(target: DemoState, state: ListingState): readonly ListingMove[] | null {
  const path = PATHS[target];
  const states: ListingState[] = ['draft', ...path.map((m) => AFTER[m]!)];
  const at = states.lastIndexOf(state);
  return at === -1 ? null : path.slice(at);
}

/**
 * Add the demo's listings through the services a seller and a moderator use: create the draft, upload its drawings,
 * then submit, approve, send back or withdraw. Running it again adds nothing: each listing is found by its slug, and
 * only pictures or moves still missing (say, after an interrupted run) are made.
 */
export async function seedDemoListings(
  ctx: AppContext,
  sellers: ReadonlyMap<string, User>,
  moderator: User,
): Promise<DemoListingsReport> {
  const known = await seededIds(ctx);
  const report: DemoListingsReport = { created: 0, photos: 0, moves: 0, skipped: [] };
  const seedOne = async (demo: DemoListing) => {
    const owner = sellers.get(demo.seller);
    if (!owner) throw new Error(`demo seed: no account ${demo.seller} for ${demo.slug}`);
    const { listing, created } = await findOrCreate(ctx, demo, owner, known.get(demo.slug));
    if (created) report.created += 1;
    const added = await addPictures(ctx, demo, owner, listing);
    report.photos += added;
    const { state } = await ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: listing.id });
    const moves = remainingMoves(demo.state, state);
    if (!moves) return void report.skipped.push(demo.slug);
    for (const step of moves) await move(ctx, demo, listing.id, step, owner, moderator);
    report.moves += moves.length;
  };
  // A few at a time: drawing and re-encoding pictures is the slow part, and it runs off the main thread.
  const queue = [...DEMO_LISTINGS];
  const worker = async () => {
    for (let demo = queue.shift(); demo; demo = queue.shift()) await seedOne(demo);
  };
  await Promise.all(Array.from({ length: 4 }, worker));
  return report;
}
