import type { AppContext } from '../../app-context';
import type { ReportInput } from '../../../shared/schemas/listing-moderation';
import { conflict, forbidden } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import type { ListingActor } from './listing-actor';
import { ListingReport } from './listing-report.entity';
import { assertCanSee, isSeller } from './listing.policy';
import { lockListing } from './listing.repository';

/**
 * A member reports a listing they can see. The report puts the listing in the moderation queue until a
 * moderator decides; one open report per member per listing.
 */
export async function reportListing(ctx: AppContext, actor: ListingActor, id: number, input: ReportInput) {
  await ctx.transaction(async (m) => {
    const listing = await lockListing(m, id);
    assertCanSee(actor, listing, listing.owner);
    if (isSeller(actor, listing)) throw forbidden('You cannot report your own listing.');
    const already = await m
      .getRepository(ListingReport)
      .createQueryBuilder('r')
      .where('r.listing_id = :id AND r.reporter_id = :reporter AND r.resolved_at IS NULL', { id, reporter: actor.id })
      .getCount();
    if (already > 0)
      throw conflict('already_reported', 'You have already reported this listing; a moderator will look at it soon.');
    const report = await m.save(
      m.create(ListingReport, { listingId: id, reporterId: actor.id, reason: input.reason, details: input.details }),
    );
    await recordAudit(m, {
      actorId: actor.id,
      action: 'listing.reported',
      targetType: 'listing',
      targetId: id,
      detail: { reportId: report.id, reason: input.reason },
      ip: actor.ip,
    });
  });
}
