import { describe, expect, it } from 'vitest';
import { boardJoinFixings, pvaGrams, pvaGramsPerMetre } from '../../../../shared/planner/engineering/board-joins';
import {
  fixingSchedule,
  type FrameFixingInput,
  topSheetScrewCount,
} from '../../../../shared/planner/engineering/fixing-schedule';

/** A 1200 × 600 mm 2x1 board, two cross members, 9 mm top, four 2x2 legs, one wall batten. */
const frame: FrameFixingInput = {
  boardLengthMm: 1200,
  boardWidthMm: 600,
  rail: { widthMm: 44, thicknessMm: 18 },
  crossMemberCount: 2,
  topSheetThicknessMm: 9,
  legs: { count: 4, section: { widthMm: 44, thicknessMm: 44 } },
  wallBattenCount: 1,
};

const byJoint = (input: FrameFixingInput) => Object.fromEntries(fixingSchedule(input).map((j) => [j.joint, j]));

describe('fixingSchedule', () => {
  it('puts two screws in each butt joint of the frame', () => {
    const joints = byJoint(frame);
    // common practice, no source: 2 screws per butt joint
    expect(joints['frame-corner']).toMatchObject({ perJoint: 2, joints: 4, total: 8 });
    expect(joints['cross-member']).toMatchObject({ perJoint: 2, joints: 4, total: 8 });
    expect(joints['frame-corner']?.screw).toMatchObject({ ok: true, screw: { lengthMm: 60 } }); // published (trade guides)
    expect(joints['frame-corner']?.note).toMatch(/end grain/);
  });

  it('screws the top down every 150 mm around the edge and along each cross member', () => {
    // common practice, no source: 8 + 8 along the sides, 4 + 4 across the ends, 3 more on each cross member
    expect(topSheetScrewCount(1200, 600, 2)).toBe(30);
    const top = byJoint(frame)['top-sheet'];
    expect(top).toMatchObject({ total: 30, screw: { ok: true, screw: { lengthMm: 30 } } }); // published (trade guides)
    expect(top?.note).toMatch(/no head stands proud/);
  });

  it('screws each leg through both rails and suggests bolts when the leg is too thin for a screw', () => {
    expect(byJoint(frame).leg).toMatchObject({ perJoint: 4, total: 16, screw: { ok: true } }); // common practice, no source
    const thin = byJoint({ ...frame, legs: { count: 4, section: { widthMm: 38, thicknessMm: 38 } } }).leg;
    expect(thin?.screw?.ok).toBe(false);
    expect(thin?.note).toMatch(/coach bolts/);
  });

  it("leaves the wall fixing to the wall plug maker's instructions", () => {
    const wall = byJoint(frame)['wall-batten'];
    expect(wall?.screw).toBeNull();
    expect(wall?.note).toMatch(/wall plug maker's instructions/);
  });

  it('leaves out legs and wall battens the board does not have', () => {
    const joints = byJoint({ ...frame, legs: undefined, wallBattenCount: 0 });
    expect(Object.keys(joints)).toEqual(['frame-corner', 'cross-member', 'top-sheet']);
  });
});

describe('boardJoinFixings', () => {
  it('joins boards with two M8 coach bolts and wing nuts per join, long enough for both end rails', () => {
    const fixings = boardJoinFixings(3, 18);
    // common practice, no source: 2 per join; 2 × 18 mm + 1.5 × 8 mm = 48 mm → 50 mm stock (from memory)
    expect(fixings).toMatchObject({ perJoin: 2, total: 6 });
    expect(fixings.bolt).toEqual({ diameterMm: 8, lengthMm: 50, clearanceHoleMm: 9, washers: 6, wingNuts: 6 });
  });

  it("lines boards up with pattern-makers' dowels, two per join", () => {
    expect(boardJoinFixings(2, 18, 'dowels')).toMatchObject({ method: 'dowels', total: 4 }); // common practice, no source
  });
});

describe('PVA', () => {
  it('works out glue from the glued face and the spread', () => {
    expect(pvaGramsPerMetre(44)).toBeCloseTo(0.044 * 180, 12); // from memory: about 180 g/m² on one face
    expect(
      pvaGrams([
        { lengthMm: 500, faceWidthMm: 18 },
        { lengthMm: 0, faceWidthMm: 18 },
      ]),
    ).toBeCloseTo(1.62, 12);
  });
});
