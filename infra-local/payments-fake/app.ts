import express, { type ErrorRequestHandler, type Express } from 'express';
import { unrecognizedUrl } from './errors';
import { requireTestKey } from './http/auth';
import { sendJson } from './http/respond';
import { accountRoutes } from './routes/accounts';
import { balanceRoutes } from './routes/balance';
import { chargeRoutes } from './routes/charges';
import { eventRoutes } from './routes/events';
import { fakeRoutes } from './routes/fake';
import { onboardingRoutes } from './routes/onboarding';
import { paymentIntentRoutes } from './routes/payment-intents';
import { refundRoutes } from './routes/refunds';
import { transferRoutes } from './routes/transfers';
import { webhookEndpointRoutes } from './routes/webhook-endpoints';
import type { Runtime } from './runtime';

/** Body parser failures (malformed or oversized form bodies) as Stripe-style 400s. */
const bodyErrors: ErrorRequestHandler = (error: unknown, _req, res, next) => {
  if (res.headersSent) {
    next(error);
    return;
  }
  const status =
    typeof error === 'object' && error !== null && 'status' in error && typeof error.status === 'number'
      ? error.status
      : 500;
  const message = error instanceof Error ? error.message : String(error);
  sendJson(res, status >= 400 && status < 500 ? status : 500, {
    error: {
      type: status < 500 ? 'invalid_request_error' : 'api_error',
      message: `Could not read the request: ${message}`,
    },
  });
};

export function buildApp(runtime: Runtime): Express {
  const app = express();
  app.disable('x-powered-by');
  app.disable('etag');
  // Stripe's GET parameters use brackets too (`expand[0]=…`, `types[0]=…`).
  app.set('query parser', 'extended');
  app.use(express.urlencoded({ extended: true, limit: '1mb', parameterLimit: 10_000 }));
  if (runtime.log !== noLog) {
    app.use((req, res, next) => {
      const started = Date.now();
      res.on('finish', () =>
        runtime.log(`${req.method} ${req.originalUrl} ${res.statusCode} ${Date.now() - started}ms`),
      );
      next();
    });
  }

  app.use(fakeRoutes(runtime));
  app.use(onboardingRoutes(runtime));
  app.use('/v1', requireTestKey());
  app.use(paymentIntentRoutes(runtime));
  app.use(chargeRoutes(runtime));
  app.use(refundRoutes(runtime));
  app.use(accountRoutes(runtime));
  app.use(transferRoutes(runtime));
  app.use(balanceRoutes(runtime));
  app.use(eventRoutes(runtime));
  app.use(webhookEndpointRoutes(runtime));

  app.use((req, res) => {
    const error = unrecognizedUrl(req.method, req.originalUrl.split('?')[0] ?? req.path);
    sendJson(res, error.status, { error: error.body });
  });
  app.use(bodyErrors);
  return app;
}

export function noLog(): void {}
