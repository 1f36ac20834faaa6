import { computePlan, tenByThirteenTwoLevel } from '../../shared/planner';
import { firstFitDecreasing } from '../../shared/planner/packing';
import type { BenchResult } from './harness';
import { time } from './harness';

/**
 * The whole plan of a 10 × 13 ft around-the-walls two-level layout, against a baseline of the
 * simplest step inside it (First-Fit Decreasing over the same timber parts), measured in the same run.
 */
export function plannerBench(): BenchResult {
  const timberParts = computePlan(tenByThirteenTwoLevel)
    .cuttingList.filter((row) => row.material.type === 'timber')
    .map((row, i) => ({ id: `p${i}`, length: row.lengthMm, quantity: row.quantity }));
  const reference = time(() => firstFitDecreasing({ parts: timberParts }), 300);
  const subject = time(() => computePlan(tenByThirteenTwoLevel), 200);
  return {
    name: 'planner: 10 × 13 ft two-level room plan',
    what: 'computePlan(tenByThirteenTwoLevel) in-process',
    baseline: 'First-Fit Decreasing of its timber parts',
    subject,
    reference,
    ratio: subject.p50 / reference.p50,
    budget: { p95Ms: 50, met: subject.p95 <= 50 },
  };
}
