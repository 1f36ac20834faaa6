import { type Response, Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  acceptQuoteSchema,
  builderChoiceQuerySchema,
  createQuoteRequestSchema,
  quoteParamSchema,
  quoteRequestParamSchema,
  quoteSettingsSchema,
  sendQuoteSchema,
  type AcceptQuoteInput,
  type BuilderChoiceQuery,
  type CreateQuoteRequestInput,
  type QuoteSettingsInput,
  type SendQuoteInput,
} from '../../../shared/schemas/quotes';
import { listingActorOf } from '../listings/listing-actor';
import { builderChoices } from './builder-choices.service';
import { acceptQuote } from './quote-accept.service';
import { getInboxRequest, listInbox } from './quote-inbox.service';
import { getMyRequest } from './quote-request-view.service';
import { createQuoteRequest, listMyRequests } from './quote-requests.service';
import { sendQuote } from './quote-sending.service';
import { getQuoteSettings, saveQuoteSettings } from './quote-settings.service';

const id = (res: Response) => input<{ id: number }>(res, 'params').id;
const requestParam = validate(quoteRequestParamSchema, 'params');

/**
 * Quotes: buyers ask builders to price a saved plan and accept one quote; builders answer the requests sent to
 * them. Every route is for signed-in accounts; who may see what is decided per record (404 for anyone else's).
 */
export function quotesRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/builders', validate(builderChoiceQuerySchema, 'query'), async (req, res) => {
    const { town } = input<BuilderChoiceQuery>(res, 'query');
    res.json({ items: await builderChoices(ctx, req.user!.id, town) });
  });

  router.post('/requests', validate(createQuoteRequestSchema), async (req, res) => {
    const actor = listingActorOf(req);
    res.status(201).json(await createQuoteRequest(ctx, actor, input<CreateQuoteRequestInput>(res)));
  });

  router.get('/requests', async (req, res) => {
    res.json({ items: await listMyRequests(ctx, listingActorOf(req)) });
  });

  router.get('/requests/:id', requestParam, async (req, res) => {
    res.json({ request: await getMyRequest(ctx, listingActorOf(req), id(res)) });
  });

  router.get('/inbox', async (req, res) => {
    res.json({ items: await listInbox(ctx, listingActorOf(req)) });
  });

  router.get('/inbox/:id', requestParam, async (req, res) => {
    res.json({ request: await getInboxRequest(ctx, listingActorOf(req), id(res)) });
  });

  router.post('/inbox/:id/quote', requestParam, validate(sendQuoteSchema), async (req, res) => {
    res.status(201).json(await sendQuote(ctx, listingActorOf(req), id(res), input<SendQuoteInput>(res)));
  });

  router.post('/:id/accept', validate(quoteParamSchema, 'params'), validate(acceptQuoteSchema), async (req, res) => {
    res.status(201).json(await acceptQuote(ctx, listingActorOf(req), id(res), input<AcceptQuoteInput>(res)));
  });

  router.get('/settings', async (req, res) => {
    res.json({ settings: await getQuoteSettings(ctx, listingActorOf(req)) });
  });

  router.put('/settings', validate(quoteSettingsSchema), async (req, res) => {
    const settings = await saveQuoteSettings(ctx, listingActorOf(req), input<QuoteSettingsInput>(res));
    res.json({ settings });
  });

  return router;
}
