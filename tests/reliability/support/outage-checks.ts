import request from 'supertest';
import type { AppInstance } from '../../../server/app';

/** What a request answered during an outage, and how long it took. */
export interface Answer {
  status: number;
  body: unknown;
  text: string;
  ms: number;
}

interface HealthBody {
  status: string;
  down: string[];
  parts: Record<string, { ok: boolean; message?: string }>;
}

/** GET /api/health once. */
export async function health(app: AppInstance): Promise<{ status: number; body: HealthBody }> {
  const res = await request(app.app).get('/api/health');
  return { status: res.status, body: res.body as HealthBody };
}

/** Poll /api/health until it answers 200, or fail naming what is still down. */
export async function untilHealthy(app: AppInstance, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const last = await health(app);
    if (last.status === 200) return;
    if (Date.now() > deadline) {
      throw new Error(`still unhealthy after ${timeoutMs} ms: ${JSON.stringify(last.body.parts)}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}
