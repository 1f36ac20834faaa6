import { describe, expect, it } from 'vitest';
import { computePlan, parsePlanInput } from '../../../shared/planner/compute-plan';
import { PlanInputError } from '../../../shared/planner/errors';
import { singlePortableModule, tenByThirteenTwoLevel } from '../../../shared/planner/examples';
import { type PlanInput, planInputSchema } from '../../../shared/planner/schema';

/** The error computePlan throws for `input`, or a failure when it throws none. */
function planError(input: unknown): PlanInputError {
  try {
    computePlan(input as PlanInput);
  } catch (error) {
    if (error instanceof PlanInputError) return error;
    throw error;
  }
  throw new Error('computePlan accepted the input');
}

describe('the plan input schema', () => {
  it('makes a whole input of one board’s size, filling in every default', () => {
    const parsed = parsePlanInput({ boards: [{ lengthMm: 1200, widthMm: 600 }] });
    expect(parsed.boards).toEqual([{ id: 'board-1', name: 'Board 1', lengthMm: 1200, widthMm: 600, level: 'lower' }]);
    // TRADE.md: UK 2x1 planed "44 × 18 mm common"; C16 is the class assumed for unmarked timber (common practice, no source)
    expect(parsed.construction.frameSection).toEqual({ sectionId: 'uk-2x1', widthMm: 44, thicknessMm: 18 });
    expect(parsed.construction.timberClass).toBe('C16');
    expect(parsed.construction.crossMemberSpacingMm).toBe(400); // TRADE.md: "16 in / about 400 mm centres" (practice)
    expect(parsed.construction.kerfMm).toBe(3); // common practice, no source
    expect(parsed.construction.stockLengthsMm).toEqual([1800, 2400, 3000, 3600, 4200, 4800, 5400]); // TRADE.md: UK stock lengths
    expect(parsed.construction.sheetSizeMm).toEqual({ lengthMm: 2440, widthMm: 1220 }); // TRADE.md: standard sheet
    expect(parsed.loads).toEqual({ uniformKgM2: 50, pointLoadN: 0, spanLimitRatio: 300 }); // common practice; EN 1995-1-1 Table 7.2
    expect(parsed.wiring.busConductor).toEqual({ kind: 'iec', areaMm2: 1.5, class: '1/2' });
  });

  it('spaces cross members at 16 in (406.4 mm) in imperial plans', () => {
    // TRADE.md: cross-member spacing "16 in / about 400 mm centres" (practice); 16 × 25.4 = 406.4 mm exactly
    const parsed = parsePlanInput({ units: 'imperial', boards: [{ lengthMm: 1200, widthMm: 600 }] });
    expect(parsed.construction.crossMemberSpacingMm).toBeCloseTo(406.4, 10);
  });

  it('rounds board and wall lengths to whole millimetres, the precision of a cut', () => {
    const parsed = parsePlanInput({ boards: [{ lengthMm: 1219.2, widthMm: 609.6 }] });
    expect(parsed.boards[0]).toMatchObject({ lengthMm: 1219, widthMm: 610 });
  });

  it('parses its own output to the same input again', () => {
    for (const example of [singlePortableModule, tenByThirteenTwoLevel]) {
      const once = planInputSchema.parse(example);
      expect(planInputSchema.parse(JSON.parse(JSON.stringify(once)))).toEqual(once);
    }
  });

  it('fills in every wall and a closed room when a room of four walls says neither', () => {
    const parsed = parsePlanInput(tenByThirteenTwoLevel);
    expect(parsed.room?.useWalls).toEqual([0, 1, 2, 3]);
    expect(parsed.room?.closed).toBe(true);
  });
});

describe('bad input', () => {
  it('names the field at fault by its dotted path with a message that says the fix', () => {
    const error = planError({ boards: [{ lengthMm: 200, widthMm: 600 }] });
    expect(error.fields).toEqual({ 'boards.0.lengthMm': 'Board length must be at least 300 mm.' });
    expect(error.message).toBe('Board length must be at least 300 mm.');
  });

  it('names an unknown setting at its own path', () => {
    const error = planError({ boards: [{ lengthMm: 1200, widthMm: 600, colour: 'green' }] });
    expect(error.fields['boards.0.colour']).toMatch(/"colour" is not a setting of a board/);
  });

  it('reports every field at fault at once', () => {
    const error = planError({
      boards: [{ lengthMm: 1200, widthMm: 'wide' }],
      construction: { kerfMm: 2.5, timberClass: 'C30' },
    });
    expect(Object.keys(error.fields).sort()).toEqual([
      'boards.0.widthMm',
      'construction.kerfMm',
      'construction.timberClass',
    ]);
    expect(error.fields['construction.timberClass']).toBe('Choose the timber strength class: C16, C24.');
    expect(error.fields['construction.kerfMm']).toBe('Saw kerf must be a whole number.');
  });

  it('refuses a board too long for one sheet, at the board’s length', () => {
    const error = planError({ boards: [{ lengthMm: 3000, widthMm: 600 }] });
    expect(error.fields['boards.0.lengthMm']).toMatch(/at most 2440 mm, the sheet’s length/);
  });

  it('refuses input with no boards and no room', () => {
    expect(planError({}).fields).toEqual({
      boards: 'Add at least one board, or describe a room to plan boards round.',
    });
  });

  it('refuses a wall longer than 30 m so a mistyped length cannot freeze the page', () => {
    const room = { walls: [{ name: 'Long', lengthMm: 300_000 }], shelfDepthMm: 600 };
    expect(planError({ room }).fields['room.walls.0.lengthMm']).toBe('Wall length must be at most 30000 mm.');
  });

  it('refuses a room that splits into more than 60 boards, at the longest-board field', () => {
    const walls = ['A', 'B', 'C', 'D'].map((name) => ({ name, lengthMm: 30_000 }));
    const error = planError({ room: { walls, shelfDepthMm: 600, maxBoardLengthMm: 600 } });
    expect(error.fields['room.maxBoardLengthMm']).toMatch(/makes 196 boards; at most 60/);
  });

  it('refuses an opening that leaves a sliver of shelf beside it', () => {
    const room = { ...tenByThirteenTwoLevel.room!, opening: { wallIndex: 3, offsetMm: 700, widthMm: 800 } };
    // The example is imperial: 100 mm = 3.94 in → 3 15/16", 300 mm = 11.81 in → 11 13/16" (nearest 1/16 in).
    expect(planError({ ...tenByThirteenTwoLevel, room }).fields['room.opening.offsetMm']).toBe(
      'The doorway leaves 3 15/16" of shelf beside it; move it up to the corner or at least 11 13/16" from it.',
    );
    expect(planError({ ...tenByThirteenTwoLevel, units: 'metric', room }).fields['room.opening.offsetMm']).toBe(
      'The doorway leaves 100 mm of shelf beside it; move it up to the corner or at least 300 mm from it.',
    );
  });

  it('refuses a lower shelf when the boards hang on the wall', () => {
    const error = planError({
      boards: [{ lengthMm: 1200, widthMm: 600 }],
      lowerShelf: { heightMm: 200 },
      construction: { supports: { kind: 'wall-battens' } },
    });
    expect(error.fields.lowerShelf).toMatch(/needs legs to fix to/);
  });

  it('points a part longer than any stock length at the stock lengths', () => {
    const error = planError({ boards: [{ lengthMm: 2400, widthMm: 600 }], construction: { stockLengthsMm: [1800] } });
    expect(error.fields['construction.stockLengthsMm']).toMatch(/longest timber on sale gives 1800 mm/);
  });

  it('points a second-level board that does not exist at its place in boardIds', () => {
    const error = planError({
      boards: [{ id: 'station', lengthMm: 1200, widthMm: 600 }],
      secondLevel: { heightAboveMm: 300, which: 'selected', boardIds: ['station', 'yard'] },
    });
    expect(error.fields).toEqual({ 'secondLevel.boardIds.1': 'No lower board has id "yard"; choose from station.' });
  });
});
