import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { checkPayments } from '../../lib/payments';
import { checkStorage } from '../../lib/storage';

const TIMEOUT_MS = 3000;

type PartState = { ok: true } | { ok: false; message: string };

async function probe(check: () => Promise<unknown>): Promise<PartState> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${TIMEOUT_MS} ms`)), TIMEOUT_MS);
  });
  try {
    await Promise.race([check(), timeout]);
    return { ok: true };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message || error.name : 'unavailable' };
  } finally {
    clearTimeout(timer);
  }
}

/** GET /api/health: 200 when database, storage, payments and mail all answer; 503 naming what does not. */
export function healthRouter(ctx: AppContext, isShuttingDown: () => boolean): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const [database, storage, payments, mail] = await Promise.all([
      probe(() => ctx.dataSource.query('SELECT 1')),
      probe(() => checkStorage(ctx.storage, ctx.config.s3.bucket)),
      probe(() => checkPayments(ctx.payments)),
      probe(() => ctx.mailTransport.verify()),
    ]);
    const parts = { database, storage, payments, mail };
    const down = Object.entries(parts)
      .filter(([, state]) => !state.ok)
      .map(([name]) => name);
    const stopping = isShuttingDown();
    const status = down.length || stopping ? 'unavailable' : 'ok';
    res.setHeader('Cache-Control', 'no-store');
    res.status(status === 'ok' ? 200 : 503).json({ status, stopping, down, parts });
  });
  return router;
}
