import { report, type BenchResult } from './harness';
import { plannerBench } from './planner.bench';
import { searchBenches } from './search.bench';

/** However the benchmarks go, the run ends by itself. */
const LIMIT_MS = 15 * 60_000;

/** `npm run bench`: every benchmark, printed as a table and kept in tests/bench/results/. */
async function main(): Promise<void> {
  setTimeout(() => {
    console.error(`npm run bench: still running after ${LIMIT_MS / 60_000} minutes; stopping.`);
    process.exit(1);
  }, LIMIT_MS).unref();
  const results: BenchResult[] = [];
  results.push(plannerBench());
  results.push(...(await searchBenches()));
  console.log(report(results));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
