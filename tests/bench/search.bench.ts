import mysql from 'mysql2/promise';
import { BENCH_DATABASE } from '../../infra-local/profile';
import { loadConfig } from '../../server/config';
import { createDataSource } from '../../server/db/data-source';
import { computePlan, tenByThirteenTwoLevel } from '../../shared/planner';
import { apiScenarios, type ApiScenario } from './api-scenarios';
import { startBenchApp } from './app-process';
import { ensureBenchListings } from './bench-listings';
import { time, type BenchResult, type Timing } from './harness';
import { httpLoad, sqlLoad, type HttpLoad } from './load';
import { sqlRecorder } from './sql-capture';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const WARMUP_SECONDS = Math.min(2, SECONDS);
/** Ten callers at once saturate the machine (capacity); one shows the answer time a lone buyer gets (latency). */
const CONNECTIONS = [10, 1];
const POOL_SIZE = Math.max(...CONNECTIONS);

interface Measured {
  subject: Timing;
  reference: Timing;
  errors: number;
}

function row(s: Pick<ApiScenario, 'name' | 'what' | 'budgetMs'>, baseline: string, m: Measured, connections: number) {
  const result: BenchResult = {
    name: s.name,
    what: s.what,
    baseline,
    subject: m.subject,
    reference: m.reference,
    ratio: m.subject.p50 / m.reference.p50,
    load: `${connections} conn × ${SECONDS} s`,
    errors: m.errors,
  };
  if (s.budgetMs) result.budget = { p95Ms: s.budgetMs, met: m.subject.p95 < s.budgetMs };
  return result;
}

/** Warm up, drive the app over HTTP, then run the same SQL straight through mysql2: same callers, same time. */
async function measure(url: string, s: ApiScenario, pool: mysql.Pool, connections: number): Promise<Measured> {
  const load = { url, requests: s.requests, connections };
  await httpLoad({ ...load, seconds: WARMUP_SECONDS });
  const app = await httpLoad({ ...load, seconds: SECONDS });
  await sqlLoad(pool, s.plans, connections, WARMUP_SECONDS);
  const raw = await sqlLoad(pool, s.plans, connections, SECONDS);
  return { subject: app.timing, reference: raw.timing, errors: app.errors + raw.errors };
}

/** A visitor's session cookie and CSRF token, as the browser app holds them before it posts. */
async function browserSession(url: string): Promise<Record<string, string>> {
  const res = await fetch(`${url}/api/auth/session`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { csrfToken } = (await res.json()) as { csrfToken: string };
  return { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' };
}

/** The planner over HTTP against its own computation in-process (it runs no SQL). */
async function plannerRow(url: string, connections: number): Promise<BenchResult> {
  const headers = await browserSession(url);
  const body = JSON.stringify(tenByThirteenTwoLevel);
  const load: HttpLoad = {
    url,
    requests: [{ method: 'POST', path: '/api/planner/plan', headers, body }],
    connections,
    seconds: WARMUP_SECONDS,
  };
  await httpLoad(load);
  const http = await httpLoad({ ...load, seconds: SECONDS });
  const inProcess = time(() => computePlan(tenByThirteenTwoLevel), 300);
  const scenario = { name: 'planner: two-level example over HTTP', what: 'POST /api/planner/plan' };
  return row(
    scenario,
    'computePlan in-process, one caller',
    { subject: http.timing, reference: inProcess, errors: http.errors },
    connections,
  );
}

/**
 * The API at 20,000 listed listings, on loopback: search by words, scale and price; search near a town by distance;
 * a listing's page data; the planner. Each against the same SQL run straight through mysql2 in the same run.
 */
export async function searchBenches(): Promise<BenchResult[]> {
  const config = loadConfig();
  if (config.db.database !== BENCH_DATABASE)
    throw new Error(`The benchmarks run on ${BENCH_DATABASE}, not ${config.db.database}: use npm run bench.`);
  const dataSource = createDataSource(config.db);
  await dataSource.initialize();
  const pool = mysql.createPool({
    ...config.db,
    connectionLimit: POOL_SIZE,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
  });
  try {
    await dataSource.runMigrations({ transaction: 'each' });
    console.log(`bench: ${await ensureBenchListings(pool, dataSource)} listed listings in ${BENCH_DATABASE}`);
    const recorder = await sqlRecorder(config.db);
    const app = await startBenchApp();
    try {
      const results: BenchResult[] = [];
      for (const scenario of await apiScenarios(recorder, pool))
        for (const connections of scenario.budgetMs ? CONNECTIONS : [POOL_SIZE])
          results.push(
            row(
              scenario,
              'the same SQL through mysql2',
              await measure(app.url, scenario, pool, connections),
              connections,
            ),
          );
      results.push(await plannerRow(app.url, POOL_SIZE));
      return results;
    } finally {
      await app.stop();
      await recorder.close();
    }
  } finally {
    await pool.end();
    await dataSource.destroy();
  }
}
