import { performance } from 'node:perf_hooks';
import autocannon from 'autocannon';
import type { Pool } from 'mysql2/promise';
import { timingOf, type Timing } from './harness';

/** The figures of one load run: latency of the successful requests, and how many failed. */
export interface LoadResult {
  timing: Timing;
  errors: number;
}

export interface HttpLoad {
  /** http://127.0.0.1:<port> */
  url: string;
  /** Sent in turn by each connection, round and round. */
  requests: { method?: 'GET' | 'POST'; path: string; headers?: Record<string, string>; body?: string }[];
  connections: number;
  seconds: number;
}

/** Drive the app with autocannon; every response's latency is kept, so any percentile can be read. */
export function httpLoad(load: HttpLoad): Promise<LoadResult> {
  return new Promise((resolve, reject) => {
    const samples: number[] = [];
    const instance = autocannon(
      { url: load.url, connections: load.connections, duration: load.seconds, timeout: 10, requests: load.requests },
      (error, result) => {
        if (error) return reject(error);
        resolve({
          timing: timingOf(samples, result.duration),
          errors: result.errors + result.timeouts + result.non2xx,
        });
      },
    );
    instance.on('response', (_client: unknown, status: number, _bytes: number, ms: number) => {
      if (status >= 200 && status < 300) samples.push(ms);
    });
  });
}

/** One SQL statement as the app sent it: text and parameters. */
export interface Statement {
  sql: string;
  params: unknown[];
}

/** One request's statements in the order the service runs them; the statements of a group run at the same time. */
export type StatementPlan = Statement[][];

/**
 * The baseline: `plans` run straight through a mysql2 pool by `connections` callers at once for `seconds`, each
 * caller taking the next plan in turn, timed from the first statement to the last answer.
 */
export async function sqlLoad(pool: Pool, plans: StatementPlan[], connections: number, seconds: number) {
  const samples: number[] = [];
  let errors = 0;
  let next = 0;
  const stop = performance.now() + seconds * 1000;
  const caller = async () => {
    while (performance.now() < stop) {
      const plan = plans[next++ % plans.length]!;
      const start = performance.now();
      try {
        for (const group of plan) await Promise.all(group.map((s) => pool.query(s.sql, s.params)));
        samples.push(performance.now() - start);
      } catch {
        errors += 1;
      }
    }
  };
  const began = performance.now();
  await Promise.all(Array.from({ length: connections }, caller));
  return { timing: timingOf(samples, (performance.now() - began) / 1000), errors };
}
