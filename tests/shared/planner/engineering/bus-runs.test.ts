import { describe, expect, it } from 'vitest';
import { busRuns, type BusRunsInput } from '../../../../shared/planner/engineering/bus-runs';

/** A 1200 × 600 mm board with cross members at 400 mm centres, 2x1 throughout, and 3 mm wire. */
const board: BusRunsInput = {
  boardLengthMm: 1200,
  boardWidthMm: 600,
  crossMemberPositionsMm: [800, 400],
  wireOuterDiameterMm: 3,
  accessoryOffsetsMm: [-100, 100],
  crossMemberDepthMm: 44,
};

describe('busRuns', () => {
  it('runs a track-feed pair down the middle and accessory pairs either side', () => {
    const plan = busRuns(board);
    expect(plan.runs.map((r) => [r.name, r.acrossMm])).toEqual([
      ['track feed', 300],
      ['accessory 1', 200],
      ['accessory 2', 400],
    ]);
  });

  it('cuts each wire to the board plus 150 mm at each end for the connections', () => {
    const plan = busRuns(board);
    // common practice, no source: 150 mm per end
    expect(plan.runs.every((r) => r.wireLengthMm === 1500 && r.pairLengthMm === 3000)).toBe(true);
  });

  it('drills the same holes in every cross member, at mid-depth, sized for two wires and clearance', () => {
    const plan = busRuns(board);
    expect(plan.crossMembersAtMm).toEqual([400, 800]);
    // common practice, no source: 2 × 3 mm + 2 mm clearance, rounded up to 0.5 mm
    expect(plan.holes).toEqual({ diameterMm: 8, acrossMm: [300, 200, 400], fromTopMm: 22 });
    expect(busRuns({ ...board, wireOuterDiameterMm: 2.6 }).holes.diameterMm).toBe(7.5);
    expect(plan.warnings).toEqual([]);
  });

  it('gives one dropper pair per metre of track, placed clear of the cross members', () => {
    // common practice, no source: a pair per 1 m rail section, 150 mm each
    const plan = busRuns(board);
    expect(plan.droppers).toEqual({ pairs: 2, alongMm: [500, 1100], lengthEachMm: 150, totalWireMm: 600 });
    const shifted = busRuns({ ...board, boardLengthMm: 800, dropperSectionMm: 400, crossMemberPositionsMm: [200] });
    expect(shifted.droppers.alongMm).toEqual([219, 600]); // 9 mm half-thickness + 10 mm clear
  });

  it('totals the wire for runs and droppers', () => {
    expect(busRuns(board).totalWireMm).toBe(3 * 3000 + 600);
  });

  it('warns when holes crowd each other, leave the cross member or weaken it', () => {
    const crowded = busRuns({ ...board, accessoryOffsetsMm: [20] });
    expect(crowded.warnings).toEqual([expect.stringMatching(/track feed and accessory 1 holes are 20 mm apart/)]);
    const outside = busRuns({ ...board, accessoryOffsetsMm: [295] });
    expect(outside.warnings).toEqual([expect.stringMatching(/accessory 1 hole at 595 mm is not within/)]);
    const shallow = busRuns({ ...board, crossMemberDepthMm: 20 });
    // from memory (house-joist guidance): holes no wider than a quarter of the depth
    expect(shallow.warnings).toEqual([expect.stringMatching(/more than a quarter of the 20 mm/)]);
  });

  it('refuses a cross member off the board', () => {
    expect(() => busRuns({ ...board, crossMemberPositionsMm: [1300] })).toThrow(/off the 1200 mm board/);
  });
});
