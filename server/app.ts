import 'reflect-metadata';
import express, { type Express, type Router } from 'express';
import helmet from 'helmet';
import { createPool } from 'mysql2';
import type { AppContext } from './app-context';
import type { Config } from './config';
import { createDataSource } from './db/data-source';
import { accountRouter } from './features/account/account.router';
import { adminRouter } from './features/admin/admin.router';
import { auditRouter } from './features/audit/audit.router';
import { authRouter } from './features/auth/auth.router';
import { createPassport } from './features/auth/passport';
import { RateLimits } from './features/auth/rate-limits';
import { createSessionMiddleware, sessionTimeouts } from './features/auth/session';
import { builderProfilesRouter } from './features/builders/builder-profiles.router';
import { healthRouter } from './features/health/health.router';
import { plannerRouter } from './features/plans/planner.router';
import { plansRouter, sharedPlansRouter } from './features/plans/plans.router';
import { listingsRouter } from './features/listings/listings.router';
import { moderationRouter } from './features/listings/moderation.router';
import { listingPhotosRouter } from './features/photos/listing-photos.router';
import { photoFilesRouter } from './features/photos/photo-files.router';
import { MailDispatcher } from './features/mail/mail-dispatcher';
import { savedSearchesRouter } from './features/saved-searches/saved-searches.router';
import { shortlistRouter } from './features/shortlist/shortlist.router';
import { townsRouter } from './features/towns/towns.router';
import { conversationsRouter } from './features/conversations/conversations.router';
import { buildStagesRouter } from './features/quotes/build-stages.router';
import { quotesRouter } from './features/quotes/quotes.router';
import { membersRouter, orderReviewsRouter, reviewModerationRouter } from './features/reviews/reviews.router';
import { checkoutRouter } from './features/orders/checkout.router';
import { OrderJobRunner } from './features/orders/order-jobs';
import { paymentWebhookRouter } from './features/orders/payment-webhook.router';
import { adminFeesRouter, feesRouter } from './features/orders/fees.router';
import { orderMovesRouter } from './features/orders/order-moves.router';
import { orderProblemsRouter } from './features/orders/order-problems.router';
import { ordersListRouter } from './features/orders/orders-list.router';
import { payoutsRouter } from './features/orders/payout-accounts.router';
import { compressApi } from './http/middlewares/compress-api';
import { csrf, sameOriginOnly } from './http/middlewares/csrf';
import { apiNotFound, errorHandler } from './http/middlewares/error-handler';
import { staticClient } from './http/static-client';
import { createLogger } from './lib/logger';
import { createMailTransport } from './lib/mail-transport';
import { createPayments } from './lib/payments';
import { requestLog } from './lib/request-log';
import { createStorage } from './lib/storage';

/** A router and where it is mounted under /api; listed so tests can walk every route. */
export type ApiMount = [path: string, router: Router];

export interface AppInstance {
  app: Express;
  apiMounts: readonly ApiMount[];
  ctx: AppContext;
  /** Start background work (the mail dispatcher). */
  start(): void;
  /** Refuse new work in health checks while shutting down. */
  beginShutdown(): void;
  /** Release every resource; the process can then exit. */
  close(): Promise<void>;
}

/** Build the Express app and the resources it needs. Never listens: index.ts and tests do. */
export async function createApp(config: Config): Promise<AppInstance> {
  const logger = createLogger(config);
  const dataSource = createDataSource(config.db);
  await dataSource.initialize();
  const pool = createPool({ ...config.db, connectionLimit: 5, connectTimeout: 5000 });
  const mailTransport = createMailTransport(config.mail);
  const mailDispatcher = new MailDispatcher(dataSource, mailTransport, config.mail.from, logger);
  const ctx: AppContext = {
    config,
    logger,
    dataSource,
    rateLimits: new RateLimits(pool, config),
    mailTransport,
    mailDispatcher,
    storage: createStorage(config.s3),
    payments: createPayments(config.stripe),
    async transaction(work) {
      const result = await dataSource.transaction(work);
      mailDispatcher.nudge();
      return result;
    },
  };
  const orderJobs = new OrderJobRunner(ctx);
  const sessions = createSessionMiddleware(config, pool);
  const passport = createPassport(ctx);
  let shuttingDown = false;

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxyHops);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'script-src': ["'self'"],
          'connect-src': ["'self'"],
          'frame-ancestors': ["'none'"],
          'form-action': ["'self'"],
          'upgrade-insecure-requests': config.session.cookieSecure ? [] : null,
        },
      },
      strictTransportSecurity: config.session.cookieSecure,
    }),
  );
  app.use(requestLog(logger));
  app.use((_req, res, next) => {
    // While draining, ask keep-alive clients to reconnect elsewhere instead of holding this process open.
    if (shuttingDown) res.setHeader('Connection', 'close');
    next();
  });

  const api = express.Router();
  const health = healthRouter(ctx, () => shuttingDown);
  api.use(compressApi());
  api.use('/health', health); // before sessions: probes must not create them
  const paymentWebhook = paymentWebhookRouter(ctx);
  api.use('/payments', paymentWebhook); // raw body, no session or CSRF: the provider's signature is its credential
  api.use(express.json({ limit: '100kb', strict: true }));
  api.use(sessions.middleware, sessionTimeouts(config), passport.initialize(), passport.session());
  api.use(sameOriginOnly(config.appOrigin), csrf.csrfSynchronisedProtection);
  const mounts: ApiMount[] = [
    ['/health', health],
    ['/auth', authRouter(ctx, passport)],
    ['/account', accountRouter(ctx)],
    ['/admin', adminRouter(ctx)],
    ['/audit-events', auditRouter(ctx)],
    ['/planner', plannerRouter(ctx)],
    ['/plans', plansRouter(ctx)],
    ['/shared-plans', sharedPlansRouter(ctx)],
    ['/listings', listingsRouter(ctx)],
    ['/listings', listingPhotosRouter(ctx)],
    ['/photos', photoFilesRouter(ctx)],
    ['/moderation', moderationRouter(ctx)],
    ['/builder-profiles', builderProfilesRouter(ctx)],
    ['/shortlist', shortlistRouter(ctx)],
    ['/saved-searches', savedSearchesRouter(ctx)],
    ['/towns', townsRouter()],
    ['/payments', paymentWebhook],
    ['/orders', checkoutRouter(ctx)],
    ['/orders', ordersListRouter(ctx)],
    ['/orders', orderMovesRouter(ctx)],
    ['/order-problems', orderProblemsRouter(ctx)],
    ['/payouts', payoutsRouter(ctx)],
    ['/fees', feesRouter(ctx)],
    ['/admin/fees', adminFeesRouter(ctx)],
    ['/conversations', conversationsRouter(ctx)],
    ['/orders', orderReviewsRouter(ctx)],
    ['/members', membersRouter(ctx)],
    ['/moderation', reviewModerationRouter(ctx)],
    ['/quotes', quotesRouter(ctx)],
    ['/builds', buildStagesRouter(ctx)],
  ];
  for (const [path, router] of mounts.slice(1)) if (router !== paymentWebhook) api.use(path, router);
  api.use(apiNotFound);
  app.use('/api', api);

  const client = staticClient(config.clientDist);
  if (client) app.use(client);
  app.use(apiNotFound);
  app.use(errorHandler);

  return {
    app,
    apiMounts: mounts,
    ctx,
    start: () => {
      mailDispatcher.start();
      orderJobs.start();
    },
    beginShutdown: () => {
      shuttingDown = true;
    },
    async close() {
      await orderJobs.stop();
      await mailDispatcher.stop();
      await sessions.close().catch(() => undefined);
      await new Promise<void>((resolve) => pool.end(() => resolve()));
      mailTransport.close();
      ctx.storage.destroy();
      await dataSource.destroy();
    },
  };
}
