import { describe, expect, it } from 'vitest';
import { measureClientBuild } from './client-build';
import { budgetTable } from './route-sizes';

describe('the client bundle budget', () => {
  it('keeps every route’s initial JavaScript and CSS within its budget after a production build', async () => {
    const sizes = await measureClientBuild();

    console.log(`Initial download per route (gzip):\n${budgetTable(sizes)}`);
    expect(sizes.find((s) => s.budget.route === 'home')!.budget.jsKb).toBe(170);
    expect(sizes.every((s) => s.jsKb > 0 && s.cssKb > 0)).toBe(true);
    expect(sizes.flatMap((s) => s.overBudget)).toEqual([]);
  }, 120_000);
});
