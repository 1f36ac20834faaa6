import { Router, type Response } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { shortlistParamSchema, type ShortlistParam } from '../../../shared/schemas/shortlist';
import { listingActorOf } from '../listings/listing-actor';
import * as shortlist from './shortlist.service';

const listingIdOf = (res: Response) => input<ShortlistParam>(res, 'params').listingId;

/** A member's shortlist of listings they want to come back to. */
export function shortlistRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/', async (req, res) => {
    res.json({ items: await shortlist.listShortlist(ctx, listingActorOf(req)) });
  });

  router.put('/:listingId', validate(shortlistParamSchema, 'params'), async (req, res) => {
    await shortlist.addToShortlist(ctx, listingActorOf(req), listingIdOf(res));
    res.status(204).end();
  });

  router.delete('/:listingId', validate(shortlistParamSchema, 'params'), async (req, res) => {
    await shortlist.removeFromShortlist(ctx, listingActorOf(req), listingIdOf(res));
    res.status(204).end();
  });

  return router;
}
