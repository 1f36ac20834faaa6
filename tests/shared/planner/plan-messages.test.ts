import { describe, expect, it } from 'vitest';
import { computePlan, type PlanTextOptions } from '../../../shared/planner/compute-plan';
import { PlanInputError } from '../../../shared/planner/errors';
import { singlePortableModule, tenByThirteenTwoLevel } from '../../../shared/planner/examples';
import type { Plan } from '../../../shared/planner/plan-types';
import type { PlanInput } from '../../../shared/planner/schema';

/** One 1200 × 600 board on 900 mm legs with someone leaning on its edge: its side rails sag too much. */
const leanedOn: PlanInput = {
  boards: [{ id: 'm', name: 'Module', lengthMm: 1200, widthMm: 600 }],
  loads: { pointLoadN: 500 },
};

/** Every sentence a plan shows people: warnings, sag fixes, wiring and screw problems, fixing notes. */
function messagesOf(plan: Plan): string[] {
  return [
    ...plan.warnings,
    ...plan.sag.flatMap((s) => [...s.rail.suggestions, ...(s.sheet?.suggestions ?? [])].map((x) => x.message)),
    ...plan.wiring.boards.flatMap((b) => b.warnings),
    ...plan.fixings.screws.flatMap((r) => [r.description, r.note ?? '', r.problem ?? '']),
  ].filter((m) => m !== '');
}

/** The field messages `computePlan` refuses `input` with. */
function fieldMessages(input: unknown, options: PlanTextOptions = {}): Record<string, string> {
  try {
    computePlan(input as PlanInput, options);
  } catch (error) {
    if (error instanceof PlanInputError) return error.fields;
    throw error;
  }
  throw new Error('computePlan accepted the input');
}

/** Inputs that between them make most of the planner's field messages. */
const BAD_INPUTS: unknown[] = [
  { boards: [{ lengthMm: 3000, widthMm: 60, level: 'upper' }] },
  { boards: [{ lengthMm: 100, widthMm: 2000 }] },
  {
    boards: [{ lengthMm: 1200, widthMm: 600 }],
    lowerShelf: { heightMm: 200 },
    kickboards: { heightMm: 100 },
    construction: { supports: { kind: 'wall-battens' } },
  },
  { ...singlePortableModule, secondLevel: { heightAboveMm: 60, which: 'selected', boardIds: [] } },
  {
    room: {
      walls: [
        { name: 'Window wall', lengthMm: 3000 },
        { name: 'Door wall', lengthMm: 3000 },
      ],
      closed: true,
      shelfDepthMm: 1400,
      useWalls: [0, 0, 5],
      maxBoardLengthMm: 2500,
    },
  },
  {
    ...tenByThirteenTwoLevel,
    room: { ...tenByThirteenTwoLevel.room!, useWalls: [0, 1, 2], opening: { wallIndex: 3, offsetMm: 0, widthMm: 800 } },
  },
  { boards: [{ lengthMm: 1200, widthMm: 600 }], lowerShelf: { heightMm: 880, sheetThicknessMm: 40 } },
  { boards: [{ lengthMm: 2400, widthMm: 600 }], construction: { stockLengthsMm: [1800] } },
  {
    ...singlePortableModule,
    pricing: {
      suppliers: [
        {
          name: 'Yard',
          items: [
            { itemKey: 'pva:bottle', priceMinor: 500 },
            { itemKey: 'pva:bottle', priceMinor: 600 },
          ],
        },
      ],
    },
  },
];

describe('lengths in the planner’s messages', () => {
  it('quotes a sagging rail and its fixes in millimetres for a metric plan', () => {
    const [warning] = computePlan(leanedOn).warnings;

    // Leg centres 40 mm in from each end of the 1200 mm board: 1120 mm of rail between legs.
    expect(warning).toMatch(
      /^Module: A side rail sags \d+\.\d mm over 1120 mm between legs, more than the 3\.7 mm allowed/,
    );
  });

  it('quotes the same in feet and inches for an imperial plan', () => {
    const [warning] = computePlan({ ...leanedOn, units: 'imperial' }).warnings;

    // 1120 mm = 44.09 in → 3' 8 1/8" (nearest 1/16 in); the limit 1120 / 300 = 3.73 mm = 0.147 in → 5/32" (nearest 1/32 in).
    expect(warning).toMatch(
      /^Module: A side rail sags [\d /]+" over 3' 8 1\/8" between legs, more than the 5\/32" allowed/,
    );
    expect(warning).not.toMatch(/\d mm\b/);
  });

  it('quotes field limits in the plan’s unit', () => {
    const board = { boards: [{ lengthMm: 100, widthMm: 600 }] };

    expect(fieldMessages(board)['boards.0.lengthMm']).toBe('Board length must be at least 300 mm.');
    // 300 mm = 11.81 in → 11 13/16" (nearest 1/16 in; 1 in = 25.4 mm exactly)
    expect(fieldMessages({ ...board, units: 'imperial' })['boards.0.lengthMm']).toBe(
      'Board length must be at least 11 13/16".',
    );
  });

  it('puts every length through the caller’s formatter, so the app words them as it words everything else', () => {
    const marked: PlanTextOptions = { formatLength: (mm, precision) => `⟨${precision ?? 'size'} ${mm}⟩` };
    const plans = [computePlan(leanedOn, marked), computePlan(tenByThirteenTwoLevel, marked)];
    const fields = BAD_INPUTS.flatMap((input) => Object.values(fieldMessages(input, marked)));
    const messages = [...plans.flatMap(messagesOf), ...fields];

    expect(messages.some((m) => m.includes('⟨size 1120⟩'))).toBe(true);
    expect(fields).toContain('Board length must be at least ⟨size 300⟩.');
    for (const message of messages) expect(message).not.toMatch(/\d\s*(mm|in|ft)\b|\d"|\d'/);
  });

  it('never names an internal field or setting, only what people see on the form', () => {
    const messages = BAD_INPUTS.flatMap((input) => Object.values(fieldMessages(input)));

    expect(messages.length).toBeGreaterThan(12);
    for (const message of messages) {
      // camelCase names (useWalls, secondLevel, boardIds), dotted paths (construction.supports), keys (pva:bottle).
      expect(message).not.toMatch(/\b[a-z]+[A-Z]\w*\b|\b[a-z]+\.[a-z]+\b|\w:\w/);
      expect(message).not.toMatch(/same-footprint|wall-battens|numbered 0/);
    }
  });
});
