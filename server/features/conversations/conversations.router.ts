import { Router, type Response } from 'express';
import type { AppContext } from '../../app-context';
import { requireRole, requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  conversationIdParamSchema,
  listingIdParamSchema,
  markReadSchema,
  messageInputSchema,
  messagePageQuerySchema,
  orderIdParamSchema,
  threadListQuerySchema,
  type MarkReadInput,
  type MessagePageQuery,
  type MessageParsed,
  type ThreadListQuery,
} from '../../../shared/schemas/conversations';
import { listingActorOf } from '../listings/listing-actor';
import { listFlaggedThreads } from './conversation-moderation.service';
import { getThread, listThreads, markRead, messagePage, unreadTotal } from './conversation-reading.service';
import { sendAboutListing, sendAboutOrder, sendInThread } from './conversation-sending.service';
import { threadAboutListing, threadAboutOrder } from './conversation-subjects.service';

const idOf = (res: Response) => input<{ id: number }>(res, 'params').id;
const bodyOf = (res: Response) => input<MessageParsed>(res).body;

/** Threads between buyers and sellers: per listing and asking member, and per order. */
export function conversationsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/', validate(threadListQuerySchema, 'query'), async (req, res) => {
    res.json(await listThreads(ctx, listingActorOf(req), input<ThreadListQuery>(res, 'query').page));
  });

  // Polled by the header on every page: one indexed sum, nothing else.
  router.get('/unread-count', async (req, res) => {
    res.json({ count: await unreadTotal(ctx.dataSource.manager, req.user!.id) });
  });

  router.get('/flagged', requireRole('moderator'), validate(threadListQuerySchema, 'query'), async (req, res) => {
    res.json(await listFlaggedThreads(ctx, listingActorOf(req), input<ThreadListQuery>(res, 'query').page));
  });

  router.get('/listings/:id', validate(listingIdParamSchema, 'params'), async (req, res) => {
    res.json(await threadAboutListing(ctx, listingActorOf(req), idOf(res)));
  });

  router.post(
    '/listings/:id/messages',
    validate(listingIdParamSchema, 'params'),
    validate(messageInputSchema),
    async (req, res) => {
      res.status(201).json(await sendAboutListing(ctx, listingActorOf(req), idOf(res), bodyOf(res)));
    },
  );

  router.get('/orders/:id', validate(orderIdParamSchema, 'params'), async (req, res) => {
    res.json(await threadAboutOrder(ctx, listingActorOf(req), idOf(res)));
  });

  router.post(
    '/orders/:id/messages',
    validate(orderIdParamSchema, 'params'),
    validate(messageInputSchema),
    async (req, res) => {
      res.status(201).json(await sendAboutOrder(ctx, listingActorOf(req), idOf(res), bodyOf(res)));
    },
  );

  router.get('/:id', validate(conversationIdParamSchema, 'params'), async (req, res) => {
    res.json(await getThread(ctx, listingActorOf(req), idOf(res)));
  });

  router.get(
    '/:id/messages',
    validate(conversationIdParamSchema, 'params'),
    validate(messagePageQuerySchema, 'query'),
    async (req, res) => {
      res.json(await messagePage(ctx, listingActorOf(req), idOf(res), input<MessagePageQuery>(res, 'query')));
    },
  );

  router.post(
    '/:id/messages',
    validate(conversationIdParamSchema, 'params'),
    validate(messageInputSchema),
    async (req, res) => {
      res.status(201).json(await sendInThread(ctx, listingActorOf(req), idOf(res), bodyOf(res)));
    },
  );

  router.post(
    '/:id/read',
    validate(conversationIdParamSchema, 'params'),
    validate(markReadSchema),
    async (req, res) => {
      const count = await markRead(ctx, listingActorOf(req), idOf(res), input<MarkReadInput>(res).lastMessageId);
      res.json({ count });
    },
  );

  return router;
}
