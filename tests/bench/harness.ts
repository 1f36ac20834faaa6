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
  /** How the subject was driven, e.g. "10 conn × 10 s"; in-process when absent. */
  load?: string;
  /** Requests that failed, timed out or answered other than 2xx (left out of the timing). */
  errors?: number;
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;

/**
 * Percentiles of latency samples (ms). Runs per second are the samples over `seconds` of wall time when given (a
 * load test's throughput), else one over the mean (one caller, one run at a time).
 */
export function timingOf(samples: number[], seconds?: number): Timing {
  const sorted = [...samples].sort((a, b) => a - b);
  if (sorted.length === 0) return { runs: 0, p50: NaN, p95: NaN, p99: NaN, mean: NaN, perSecond: 0 };
  const mean = sorted.reduce((sum, s) => sum + s, 0) / sorted.length;
  return {
    runs: sorted.length,
    p50: percentile(sorted, 50),
    p95: percentile(sorted, 95),
    p99: percentile(sorted, 99),
    mean,
    perSecond: seconds ? sorted.length / seconds : 1000 / mean,
  };
}

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
  return timingOf(samples);
}

const ms = (n: number) => n.toFixed(n < 10 ? 2 : 1);

/** The machine the figures come from: CPU, cores, memory and Node. */
export const machine = () =>
  `${os.cpus()[0]?.model ?? 'unknown CPU'} × ${os.cpus().length}, ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}`;

const loadCell = (r: BenchResult) => `${r.load ?? 'in-process'}${r.errors ? `, ${r.errors} errors` : ''}`;
const budgetCell = (r: BenchResult) =>
  r.budget ? `p95 ≤ ${r.budget.p95Ms} ms: ${r.budget.met ? 'met' : 'MISSED'}` : '—';

/** Print a Markdown table and keep both it and the JSON under tests/bench/results/. */
export function report(results: BenchResult[]): string {
  const on = machine();
  const when = new Date().toISOString();
  const lines = [
    `Benchmarks of ${when} on ${on}`,
    '',
    '| benchmark | load | p50 ms | p95 ms | p99 ms | per s | baseline | baseline p50 ms | baseline p95 ms | baseline per s | ratio | budget |',
    '|---|---|---|---|---|---|---|---|---|---|---|---|',
    ...results.map(
      (r) =>
        `| ${r.name} | ${loadCell(r)} | ${ms(r.subject.p50)} | ${ms(r.subject.p95)} | ${ms(r.subject.p99)} | ${r.subject.perSecond.toFixed(0)} | ` +
        `${r.baseline} | ${ms(r.reference.p50)} | ${ms(r.reference.p95)} | ${r.reference.perSecond.toFixed(0)} | ${r.ratio.toFixed(1)}× | ${budgetCell(r)} |`,
    ),
  ];
  const table = lines.join('\n');
  const dir = path.resolve('tests/bench/results');
  mkdirSync(dir, { recursive: true });
  writeFileSync(path.join(dir, 'latest.json'), `${JSON.stringify({ when, machine: on, results }, null, 2)}\n`);
  writeFileSync(path.join(dir, 'latest.md'), `${table}\n`);
  return table;
}
