import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireRole, requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  builderApplicationSchema,
  builderDeclineSchema,
  builderProfileIdParamSchema,
  builderProfileListQuerySchema,
  type BuilderApplicationInput,
  type BuilderDeclineInput,
  type BuilderProfileListQuery,
} from '../../../shared/schemas/builders';
import { listingActorOf } from '../listings/listing-actor';
import * as builders from './builder-profiles.service';

const idParam = validate(builderProfileIdParamSchema, 'params');

/** Builder profiles: members apply; moderators approve or decline. */
export function builderProfilesRouter(ctx: AppContext): Router {
  const router = Router();

  router.post('/', requireSignedIn, validate(builderApplicationSchema), async (req, res) => {
    const profile = await builders.applyForBuilderProfile(
      ctx,
      listingActorOf(req),
      input<BuilderApplicationInput>(res),
    );
    res.status(201).json({ profile });
  });

  router.get('/mine', requireSignedIn, async (req, res) => {
    res.json({ profile: await builders.myBuilderProfile(ctx, listingActorOf(req)) });
  });

  router.get('/', requireRole('moderator'), validate(builderProfileListQuerySchema, 'query'), async (_req, res) => {
    res.json(await builders.listBuilderProfiles(ctx, input<BuilderProfileListQuery>(res, 'query')));
  });

  router.post('/:id/approve', requireRole('moderator'), idParam, async (req, res) => {
    const { id } = input<{ id: number }>(res, 'params');
    res.json({ profile: await builders.approveBuilderProfile(ctx, listingActorOf(req), id) });
  });

  router.post('/:id/decline', requireRole('moderator'), idParam, validate(builderDeclineSchema), async (req, res) => {
    const { id } = input<{ id: number }>(res, 'params');
    const { reason } = input<BuilderDeclineInput>(res);
    res.json({ profile: await builders.declineBuilderProfile(ctx, listingActorOf(req), id, reason) });
  });

  return router;
}
