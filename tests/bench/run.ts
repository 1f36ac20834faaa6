import { report, type BenchResult } from './harness';
import { plannerBench } from './planner.bench';

/** `npm run bench`: every benchmark, printed as a table and kept in tests/bench/results/. */
async function main(): Promise<void> {
  const results: BenchResult[] = [];
  results.push(plannerBench());
  console.log(report(results));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
