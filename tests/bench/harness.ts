import { mkdirSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';

/** Timing of one workload: percentiles in milliseconds and runs per second. */
export interface Timing {
  runs: number;
  p50: number;
  p95: number;
  p99: number;
  mean: number;
  perSecond: number;
}

/** One benchmark: the workload and the baseline measured in the same run, and their ratio. */
export interface BenchResult {
  name: string;
  what: string;
  baseline: string;
  subject: Timing;
  reference: Timing;
  /** subject p50 ÷ baseline p50: how many baselines one run costs. */
  ratio: number;
  budget?: { p95Ms: number; met: boolean };
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;

/** Run `work` after a warm-up until `runs` samples or `maxMs` have passed; synchronous work only. */
export function time(work: () => unknown, runs = 200, warmup = 20, maxMs = 10_000): Timing {
  for (let i = 0; i < warmup; i += 1) work();
  const samples: number[] = [];
  const stop = performance.now() + maxMs;
  while (samples.length < runs && performance.now() < stop) {
    const start = performance.now();
    work();
    samples.push(performance.now() - start);
  }
  samples.sort((a, b) => a - b);
  const mean = samples.reduce((sum, s) => sum + s, 0) / samples.length;
  return {
    runs: samples.length,
    p50: percentile(samples, 50),
    p95: percentile(samples, 95),
    p99: percentile(samples, 99),
    mean,
    perSecond: 1000 / mean,
  };
}

const ms = (n: number) => n.toFixed(n < 10 ? 2 : 1);

/** Print a Markdown table and keep both it and the JSON under tests/bench/results/. */
export function report(results: BenchResult[]): string {
  const machine = `${os.cpus()[0]?.model ?? 'unknown CPU'} × ${os.cpus().length}, ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}`;
  const when = new Date().toISOString();
  const lines = [
    `Benchmarks of ${when} on ${machine}`,
    '',
    '| benchmark | p50 ms | p95 ms | p99 ms | per s | baseline | baseline p50 ms | ratio | budget |',
    '|---|---|---|---|---|---|---|---|---|',
    ...results.map(
      (r) =>
        `| ${r.name} | ${ms(r.subject.p50)} | ${ms(r.subject.p95)} | ${ms(r.subject.p99)} | ${r.subject.perSecond.toFixed(0)} | ${r.baseline} | ${ms(r.reference.p50)} | ${r.ratio.toFixed(1)}× | ${r.budget ? `p95 ≤ ${r.budget.p95Ms} ms: ${r.budget.met ? 'met' : 'MISSED'}` : '—'} |`,
    ),
  ];
  const table = lines.join('\n');
  const dir = path.resolve('tests/bench/results');
  mkdirSync(dir, { recursive: true });
  writeFileSync(path.join(dir, 'latest.json'), `${JSON.stringify({ when, machine, results }, null, 2)}\n`);
  writeFileSync(path.join(dir, 'latest.md'), `${table}\n`);
  return table;
}
