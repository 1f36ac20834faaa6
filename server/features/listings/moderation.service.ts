import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { hasAnyRole } from '../../../shared/roles';
import { SEND_BACK_REASON_LABELS } from '../../../shared/listings/moderation';
import { canMove } from '../../../shared/listings/states';
import type {
  ApproveInput,
  DismissReportsInput,
  SendBackInput,
  TakeDownInput,
} from '../../../shared/schemas/listing-moderation';
import { conflict, forbidden } from '../../http/errors';
import { suspendAccount } from '../admin/admin.service';
import { recordAudit } from '../audit/audit.service';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { assertHasPhotos } from '../photos/photo-rules';
import type { User } from '../users/user.entity';
import type { ListingActor } from './listing-actor';
import { ListingDecision } from './listing-decision.entity';
import { moveListing, refusedMove, type MoveActor } from './listing-lifecycle';
import { ListingReport } from './listing-report.entity';
import type { Listing } from './listing.entity';
import { lockListing } from './listing.repository';

type Locked = Listing & { owner: User };

const asModerator = (ctx: AppContext, actor: ListingActor): MoveActor => ({
  id: actor.id,
  ip: actor.ip,
  as: 'moderator',
  appOrigin: ctx.config.appOrigin,
});
const listingUrl = (ctx: AppContext, id: number) => `${ctx.config.appOrigin}/listings/${id}`;

/** Lock the listing; a moderator never decides on their own listing. */
async function lockForDecision(m: EntityManager, actor: ListingActor, id: number): Promise<Locked> {
  const listing = await lockListing(m, id);
  if (listing.ownerId === actor.id) throw conflict('own_listing', 'Another moderator must decide on your own listing.');
  return listing;
}

/** Record the decision and close the listing's open reports with it. */
async function recordDecision(
  m: EntityManager,
  actor: ListingActor,
  listing: Listing,
  fields: Pick<ListingDecision, 'decision' | 'reasons' | 'note' | 'checklist' | 'sellerAction'>,
): Promise<ListingDecision> {
  const decision = await m.save(m.create(ListingDecision, { listingId: listing.id, moderatorId: actor.id, ...fields }));
  await m
    .getRepository(ListingReport)
    .createQueryBuilder()
    .update()
    .set({ resolvedAt: new Date(), resolvedByDecisionId: decision.id })
    .where('listing_id = :id AND resolved_at IS NULL', { id: listing.id })
    .execute();
  return decision;
}

/** Approve a listing awaiting review that has a photo: it is listed, and the seller hears so. */
export async function approveListing(ctx: AppContext, actor: ListingActor, id: number, input: ApproveInput) {
  await ctx.transaction(async (m) => {
    const listing = await lockForDecision(m, actor, id);
    if (!canMove(listing.state, 'approve')) throw refusedMove(listing.state, 'approve');
    await assertHasPhotos(m, id);
    await moveListing(m, listing, 'approve', asModerator(ctx, actor));
    await recordDecision(m, actor, listing, {
      decision: 'approved',
      reasons: [],
      note: '',
      checklist: input.checklist,
      sellerAction: null,
    });
    const { owner } = listing;
    await enqueueEmail(
      m,
      owner.email,
      mailTemplates.listingApproved(owner.displayName, listing.title, listingUrl(ctx, id)),
    );
  });
}

/** Send a listing back to its seller with reasons; the seller is e-mailed them. */
export async function sendBackListing(ctx: AppContext, actor: ListingActor, id: number, input: SendBackInput) {
  await ctx.transaction(async (m) => {
    const listing = await lockForDecision(m, actor, id);
    await moveListing(m, listing, 'sendBack', asModerator(ctx, actor), { reasons: input.reasons });
    await recordDecision(m, actor, listing, {
      decision: 'sent_back',
      reasons: input.reasons,
      note: input.note,
      checklist: input.checklist ?? null,
      sellerAction: null,
    });
    const { owner } = listing;
    const words = input.reasons.map((r) => SEND_BACK_REASON_LABELS[r]);
    await enqueueEmail(
      m,
      owner.email,
      mailTemplates.listingSentBack(owner.displayName, listing.title, words, input.note, listingUrl(ctx, id)),
    );
  });
}

/**
 * Withdraw a listing that breaks the rules, and warn or suspend its seller. Moderators suspend members and builders
 * only; suspending a moderator or administrator is for an administrator, on the people page.
 */
export async function takeDownListing(ctx: AppContext, actor: ListingActor, id: number, input: TakeDownInput) {
  await ctx.transaction(async (m) => {
    const listing = await lockForDecision(m, actor, id);
    const { owner } = listing;
    if (input.sellerAction === 'suspend' && hasAnyRole(owner.role, ['moderator']))
      throw forbidden('A moderator or administrator can be suspended only by an administrator.');
    await moveListing(m, listing, 'takeDown', asModerator(ctx, actor), { reason: input.reason });
    await recordDecision(m, actor, listing, {
      decision: 'taken_down',
      reasons: [],
      note: input.reason,
      checklist: null,
      sellerAction: input.sellerAction,
    });
    if (input.sellerAction === 'warn')
      await recordAudit(m, {
        actorId: actor.id,
        action: 'user.warned',
        targetType: 'user',
        targetId: owner.id,
        detail: { reason: input.reason, listingId: id },
        ip: actor.ip,
      });
    if (input.sellerAction === 'suspend') await suspendAccount(m, actor, owner.id, input.reason);
    await enqueueEmail(
      m,
      owner.email,
      mailTemplates.listingTakenDown(owner.displayName, listing.title, input.reason, input.sellerAction),
    );
  });
}

/** The reports were looked at and the listing stays as it is. */
export async function dismissReports(ctx: AppContext, actor: ListingActor, id: number, input: DismissReportsInput) {
  await ctx.transaction(async (m) => {
    const listing = await lockForDecision(m, actor, id);
    const open = await m
      .getRepository(ListingReport)
      .createQueryBuilder('r')
      .where('r.listing_id = :id AND r.resolved_at IS NULL', { id })
      .getCount();
    if (open === 0) throw conflict('no_open_reports', 'This listing has no open reports to dismiss.');
    const decision = await recordDecision(m, actor, listing, {
      decision: 'reports_dismissed',
      reasons: [],
      note: input.note,
      checklist: null,
      sellerAction: null,
    });
    await recordAudit(m, {
      actorId: actor.id,
      action: 'listing.reports_dismissed',
      targetType: 'listing',
      targetId: id,
      detail: { decisionId: decision.id, note: input.note },
      ip: actor.ip,
    });
  });
}
