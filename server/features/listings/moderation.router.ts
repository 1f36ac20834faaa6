import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireRole } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  approveSchema,
  dismissReportsSchema,
  moderationQueueQuerySchema,
  sendBackSchema,
  takeDownSchema,
  type ApproveInput,
  type DismissReportsInput,
  type ModerationQueueQuery,
  type SendBackInput,
  type TakeDownInput,
} from '../../../shared/schemas/listing-moderation';
import { listingIdParamSchema, type ListingIdParam } from '../../../shared/schemas/listings';
import { listingActorOf, type ListingActor } from './listing-actor';
import * as moderation from './moderation.service';
import { moderationQueue } from './moderation-queue';
import { getListing } from './listings.service';

const idParam = validate(listingIdParamSchema, 'params');

/** Listing moderation: moderators and administrators only. */
export function moderationRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireRole('moderator'));

  router.get('/queue', validate(moderationQueueQuerySchema, 'query'), async (_req, res) => {
    res.json(await moderationQueue(ctx.dataSource.manager, input<ModerationQueueQuery>(res, 'query')));
  });

  /** Each decision answers with the listing as it now stands. */
  const decide = <T>(
    path: string,
    schema: Parameters<typeof validate>[0],
    act: (actor: ListingActor, id: number, body: T) => Promise<void>,
  ) =>
    router.post(path, idParam, validate(schema), async (req, res) => {
      const actor = listingActorOf(req);
      const { id } = input<ListingIdParam>(res, 'params');
      await act(actor, id, input<T>(res));
      res.json({ listing: await getListing(ctx, actor, id) });
    });

  decide<ApproveInput>('/listings/:id/approve', approveSchema, (a, id, body) =>
    moderation.approveListing(ctx, a, id, body),
  );
  decide<SendBackInput>('/listings/:id/send-back', sendBackSchema, (a, id, body) =>
    moderation.sendBackListing(ctx, a, id, body),
  );
  decide<TakeDownInput>('/listings/:id/take-down', takeDownSchema, (a, id, body) =>
    moderation.takeDownListing(ctx, a, id, body),
  );
  decide<DismissReportsInput>('/listings/:id/dismiss-reports', dismissReportsSchema, (a, id, body) =>
    moderation.dismissReports(ctx, a, id, body),
  );

  return router;
}
