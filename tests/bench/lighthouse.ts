import { execSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';
import { startDemoAppProcess, type DemoApp } from './lighthouse-app';

/**
 * `npm run lighthouse`: Lighthouse's performance, accessibility and best-practices scores for the home page, the
 * search page and a listing page, with Debian's Chromium, headless. Lighthouse's default run is used as it is
 * (a mid-range phone on a slow 4G link, simulated), so the figures compare with any other Lighthouse report.
 * LIGHTHOUSE_URL points it at a running app; otherwise it starts one with the demo data (test services needed).
 * A printed figure, not a test: it writes tests/bench/results/lighthouse.json and .md, and keeps each page's full
 * report under tests/.artifacts/lighthouse/ for its audit details.
 */
const CATEGORIES = ['performance', 'accessibility', 'best-practices'] as const;
const METRICS = [
  'first-contentful-paint',
  'largest-contentful-paint',
  'total-blocking-time',
  'cumulative-layout-shift',
];
const RESULTS = path.resolve(import.meta.dirname, 'results');
/** Lighthouse's full report of each page, kept for its audit details (layout shifts, LCP element, issues). */
const REPORTS = path.resolve(import.meta.dirname, '../.artifacts/lighthouse');
const LIMIT_MS = 10 * 60_000;

interface PageScores {
  page: string;
  url: string;
  scores: Record<string, number>;
  metrics: Record<string, string>;
  /** Audits that cost points in accessibility and best practices, by id. */
  missed: string[];
}

function machine() {
  const cpu = /model name\s*:\s*(.+)/.exec(readFileSync('/proc/cpuinfo', 'utf8'))?.[1] ?? 'unknown';
  const chromium = execSync(`${process.env.CHROME_PATH} --version 2>/dev/null`).toString().trim();
  const lighthouseVersion = (
    JSON.parse(readFileSync('node_modules/lighthouse/package.json', 'utf8')) as { version: string }
  ).version;
  return {
    date: new Date().toISOString(),
    nproc: os.availableParallelism(),
    cpu,
    chromium,
    lighthouse: lighthouseVersion,
  };
}

async function firstListingPath(url: string): Promise<string> {
  const res = await fetch(`${url}/api/listings?pageSize=1`);
  const body = (await res.json()) as { items: { id: number }[] };
  if (!body.items[0]) throw new Error(`${url} has no listed listing to measure`);
  return `/modules/${body.items[0].id}`;
}

async function measure(url: string): Promise<PageScores[]> {
  const pages: [string, string][] = [
    ['home', '/'],
    ['search', '/modules'],
    ['listing', await firstListingPath(url)],
  ];
  const root = process.getuid?.() === 0;
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROME_PATH,
    chromeFlags: ['--headless=new', '--disable-gpu', ...(root ? ['--no-sandbox'] : [])],
  });
  try {
    const results: PageScores[] = [];
    for (const [page, at] of pages) {
      const run = await lighthouse(`${url}${at}`, {
        port: chrome.port,
        output: 'json',
        logLevel: 'error',
        onlyCategories: [...CATEGORIES],
      });
      if (!run) throw new Error(`Lighthouse gave no result for ${at}`);
      const { categories, audits } = run.lhr;
      mkdirSync(REPORTS, { recursive: true });
      writeFileSync(path.join(REPORTS, `${page}.json`), JSON.stringify(run.lhr, null, 1));
      results.push({
        page,
        url: at,
        scores: Object.fromEntries(CATEGORIES.map((c) => [c, Math.round((categories[c]?.score ?? 0) * 100)])),
        metrics: Object.fromEntries(METRICS.map((m) => [m, audits[m]?.displayValue ?? '–'])),
        missed: (['accessibility', 'best-practices'] as const).flatMap((c) =>
          (categories[c]?.auditRefs ?? [])
            .filter((ref) => ref.weight > 0 && (audits[ref.id]?.score ?? 1) < 1)
            .map((ref) => ref.id),
        ),
      });
      console.log(`${page}: ${CATEGORIES.map((c) => `${c} ${results.at(-1)!.scores[c]}`).join(', ')}`);
    }
    return results;
  } finally {
    chrome.kill();
  }
}

function markdown(env: ReturnType<typeof machine>, results: PageScores[]): string {
  const head = `| page | path | ${CATEGORIES.join(' | ')} | FCP | LCP | TBT | CLS |`;
  const rule = `|${' --- |'.repeat(CATEGORIES.length + 6)}`;
  const rows = results.map(
    (r) =>
      `| ${r.page} | ${r.url} | ${CATEGORIES.map((c) => r.scores[c]).join(' | ')} | ${METRICS.map((m) => r.metrics[m]).join(' | ')} |`,
  );
  const missed = results.filter((r) => r.missed.length).map((r) => `- ${r.page}: ${r.missed.join(', ')}`);
  return [
    `Lighthouse ${env.lighthouse}, ${env.chromium}, default mobile run (simulated slow 4G, 4× CPU slowdown).`,
    `${env.date}; ${env.nproc} cores, ${env.cpu}.`,
    '',
    head,
    rule,
    ...rows,
    '',
    ...(missed.length ? ['Audits that cost accessibility or best-practices points:', ...missed, ''] : []),
  ].join('\n');
}

async function main(): Promise<void> {
  setTimeout(() => {
    console.error('npm run lighthouse: still running after 10 minutes; stopping.');
    process.exit(1);
  }, LIMIT_MS).unref();
  process.env.CHROME_PATH ??= '/usr/bin/chromium';
  const given = process.env.LIGHTHOUSE_URL?.replace(/\/$/, '');
  const app: DemoApp | null = given ? null : await startDemoAppProcess();
  try {
    const env = machine();
    const results = await measure(given ?? app!.url);
    mkdirSync(RESULTS, { recursive: true });
    writeFileSync(path.join(RESULTS, 'lighthouse.json'), `${JSON.stringify({ ...env, results }, null, 2)}\n`);
    const table = markdown(env, results);
    writeFileSync(path.join(RESULTS, 'lighthouse.md'), table);
    console.log(`\n${table}`);
  } finally {
    await app?.stop();
  }
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
