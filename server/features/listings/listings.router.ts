import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { reportSchema, type ReportInput } from '../../../shared/schemas/listing-moderation';
import {
  listingIdParamSchema,
  listingInputSchema,
  listingSearchSchema,
  myListingsQuerySchema,
  type ListingIdParam,
  type ListingInput,
  type ListingSearchQuery,
  type MyListingsQuery,
} from '../../../shared/schemas/listings';
import { listingActorOf, viewerOf } from './listing-actor';
import { reportListing } from './listing-reports.service';
import { searchListings } from './listing-search.service';
import * as listings from './listings.service';

const idParam = validate(listingIdParamSchema, 'params');
const idOf = (res: Parameters<typeof input>[0]) => input<ListingIdParam>(res, 'params').id;

/**
 * Module and build-service listings. Search and listed listings are public; everything else needs a signed-in
 * member, and the services check that the caller is the seller (or a builder, for services).
 */
export function listingsRouter(ctx: AppContext): Router {
  const router = Router();

  router.get('/', validate(listingSearchSchema, 'query'), async (_req, res) => {
    res.json(await searchListings(ctx, input<ListingSearchQuery>(res, 'query')));
  });

  router.post('/', requireSignedIn, validate(listingInputSchema), async (req, res) => {
    res.status(201).json({ listing: await listings.createListing(ctx, listingActorOf(req), input<ListingInput>(res)) });
  });

  router.get('/mine', requireSignedIn, validate(myListingsQuerySchema, 'query'), async (req, res) => {
    res.json(await listings.myListings(ctx, listingActorOf(req), input<MyListingsQuery>(res, 'query')));
  });

  router.get('/:id', idParam, async (req, res) => {
    res.json({ listing: await listings.getListing(ctx, viewerOf(req), idOf(res)) });
  });

  router.put('/:id', requireSignedIn, idParam, validate(listingInputSchema), async (req, res) => {
    const listing = await listings.updateListing(ctx, listingActorOf(req), idOf(res), input<ListingInput>(res));
    res.json({ listing });
  });

  router.post('/:id/submit', requireSignedIn, idParam, async (req, res) => {
    res.json({ listing: await listings.sellerMove(ctx, listingActorOf(req), idOf(res), 'submit') });
  });

  router.post('/:id/withdraw', requireSignedIn, idParam, async (req, res) => {
    res.json({ listing: await listings.sellerMove(ctx, listingActorOf(req), idOf(res), 'withdraw') });
  });

  router.post('/:id/reports', requireSignedIn, idParam, validate(reportSchema), async (req, res) => {
    await reportListing(ctx, listingActorOf(req), idOf(res), input<ReportInput>(res));
    res.status(201).json({ message: 'Thank you. A moderator will look at this listing.' });
  });

  return router;
}
