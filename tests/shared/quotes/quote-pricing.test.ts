import { describe, expect, it } from 'vitest';
import { computePlan } from '../../../shared/planner/compute-plan';
import { EXAMPLE_SUPPLIERS } from '../../../shared/planner/examples';
import type { PlanInput } from '../../../shared/planner/schema';
import { deliveryKmFor, differsFromDraft, draftQuote } from '../../../shared/quotes/quote-pricing';
import type { RateCard } from '../../../shared/schemas/listing-service';

/** The rate card of the test builder's listing (tests/support/listing-bodies.ts serviceBody). */
const CARD: RateCard = {
  perMetreFrameMinor: 4_500,
  perSquareMetreTopMinor: 3_000,
  perLegSetMinor: 6_000,
  perSecondLevelMinor: 9_000,
  deliveryPerKmMinor: 60,
  materialsMarkupBp: 1_500,
};

/** One 1200 × 600 mm board on legs, as worked by hand in tests/shared/planner/hand-worked-module.test.ts. */
const board: PlanInput = { boards: [{ id: 'm', name: 'Module', lengthMm: 1200, widthMm: 600 }] };

describe('pricing a plan by a builder’s rate card', () => {
  it('prices a 1200 × 600 board on legs, worked by hand, with delivery kept apart', () => {
    // Frame timber, legs left out (hand-worked-module.test.ts): 2 × 1200 + 6 × 564 + 2 × 1319 = 8422 mm
    //   8.422 m × £45.00 = £378.99 (37 899p)
    // Top: 1.2 m × 0.6 m = 0.72 m² × £30.00 = £21.60 (2 160p); one leg set £60.00 (6 000p)
    // Build price 37 899 + 2 160 + 6 000 = 46 059p; delivery 42 km × 60p = 2 520p, not in the build price.
    const draft = draftQuote(board, CARD, 42);
    expect(draft.lines.map((l) => [l.key, l.quantity, l.unit, l.rateMinor, l.amountMinor])).toEqual([
      ['labour:frame', 8.42, 'm', 4_500, 37_899],
      ['labour:top', 0.72, 'm²', 3_000, 2_160],
      ['labour:legs', 1, 'set', 6_000, 6_000],
      ['materials', null, null, null, 0],
    ]);
    expect(draft.itemMinor).toBe(46_059);
    expect(draft.deliveryMinor).toBe(2_520);
    expect(draft.materialsPriced).toBe(false);
  });

  it('adds the plan’s materials at its suppliers’ prices and the builder’s 15 % mark-up on them', () => {
    const priced: PlanInput = { ...board, pricing: { suppliers: EXAMPLE_SUPPLIERS, mode: 'cheapest-per-item' } };
    // The materials total is the planner's own (tested in tests/shared/planner/costing.test.ts);
    // the mark-up is 15 % of it, rounded to a whole penny (costPlan rounds half up by Math.round).
    const materials = computePlan(priced).cost!.materials!.totalMinor;
    const draft = draftQuote(priced, CARD, 0);
    const byKey = Object.fromEntries(draft.lines.map((l) => [l.key, l.amountMinor]));
    expect(byKey.materials).toBe(materials);
    expect(byKey.markup).toBe(Math.round(materials * 0.15));
    expect(draft.itemMinor).toBe(46_059 + materials + Math.round(materials * 0.15));
    expect(draft.deliveryMinor).toBe(0);
    expect(draft.materialsPriced).toBe(true);
  });

  it('charges the second level per upper board', () => {
    const twoLevel: PlanInput = { ...board, secondLevel: { heightAboveMm: 400 } };
    const plan = computePlan(twoLevel);
    const upper = plan.boards.filter((b) => b.level === 'upper').length;
    const line = draftQuote(twoLevel, CARD, 0).lines.find((l) => l.key === 'labour:second-level');
    expect(upper).toBe(1);
    // one upper board × £90.00
    expect(line?.amountMinor).toBe(9_000);
  });

  it('rounds the distance up to whole km: 41.2 km is charged as 42', () => {
    expect(deliveryKmFor(41.2)).toBe(42);
    expect(deliveryKmFor(0)).toBe(0);
  });

  it('tells a changed quote from the rate card’s own', () => {
    const draft = draftQuote(board, CARD, 42);
    expect(differsFromDraft(draft, draft.lines, draft.deliveryMinor)).toBe(false);
    const dearer = draft.lines.map((l, i) => (i === 0 ? { ...l, amountMinor: l.amountMinor + 1 } : l));
    expect(differsFromDraft(draft, dearer, draft.deliveryMinor)).toBe(true);
    expect(differsFromDraft(draft, draft.lines.slice(1), draft.deliveryMinor)).toBe(true);
    expect(differsFromDraft(draft, draft.lines, 0)).toBe(true);
  });
});
