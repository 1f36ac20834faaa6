import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { generateBoards } from '../../../shared/planner/boards/generate-boards';
import { splitEvenly } from '../../../shared/planner/boards/geometry';
import type { LayoutBoard, PlanRect } from '../../../shared/planner/boards/types';
import { parsePlanInput } from '../../../shared/planner/compute-plan';
import { tenByThirteenTwoLevel } from '../../../shared/planner/examples';

const area = (r: PlanRect) => r.width * r.height;
const overlap = (a: PlanRect, b: PlanRect) =>
  Math.max(0, Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x)) *
  Math.max(0, Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y));

function totalOverlap(boards: readonly LayoutBoard[]): number {
  let sum = 0;
  boards.forEach((board, i) => boards.slice(i + 1).forEach((other) => (sum += overlap(board.outline, other.outline))));
  return sum;
}

/** A rectangular room A × B (walls A, B, A, B clockwise) with a shelf d deep on every wall. */
const rectangularRoom = fc
  .record({
    a: fc.integer({ min: 1200, max: 9000 }),
    b: fc.integer({ min: 1200, max: 9000 }),
    maxBoardLengthMm: fc.integer({ min: 300, max: 2440 }),
    depthShare: fc.double({ min: 0.05, max: 0.45, noNaN: true }),
  })
  .map(({ a, b, maxBoardLengthMm, depthShare }) => ({
    a,
    b,
    maxBoardLengthMm,
    depth: Math.max(150, Math.min(1200, Math.floor(Math.min(a, b) * depthShare))),
  }))
  .filter(({ a, b, depth }) => Math.min(a, b) - depth >= 300);

function roomBoards(a: number, b: number, depth: number, maxBoardLengthMm: number): LayoutBoard[] {
  const walls = [a, b, a, b].map((lengthMm, i) => ({ name: `Wall ${i + 1}`, lengthMm }));
  const input = parsePlanInput({ room: { walls, shelfDepthMm: depth, maxBoardLengthMm } });
  return generateBoards(input).boards;
}

describe('boards round a room', () => {
  it('cover the shelf round every wall exactly, with no board overlapping another', () => {
    fc.assert(
      fc.property(rectangularRoom, ({ a, b, depth, maxBoardLengthMm }) => {
        const boards = roomBoards(a, b, depth, maxBoardLengthMm);
        // The shelf is the room less its middle: A·B − (A − 2d)(B − 2d).
        const shelf = a * b - (a - 2 * depth) * (b - 2 * depth);
        expect(boards.reduce((sum, board) => sum + area(board.outline), 0)).toBe(shelf);
        const middle = { x: depth, y: depth, width: a - 2 * depth, height: b - 2 * depth };
        const outside = boards.filter(
          ({ outline: { x, y, width, height } }) => x < 0 || y < 0 || x + width > a || y + height > b,
        );
        expect(outside).toEqual([]);
        expect(boards.every((board) => overlap(board.outline, middle) === 0)).toBe(true);
        expect(totalOverlap(boards)).toBe(0);
        expect(boards.every((board) => board.lengthMm <= maxBoardLengthMm && board.widthMm === depth)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it('cover the shelves of any walls chosen, less the doorway, with no overlaps', () => {
    const rooms = fc.record({
      a: fc.integer({ min: 2000, max: 8000 }),
      b: fc.integer({ min: 2000, max: 8000 }),
      depth: fc.integer({ min: 150, max: 900 }),
      used: fc.subarray([0, 1, 2, 3], { minLength: 1 }),
      door: fc.record({ at: fc.double({ min: 0, max: 1, noNaN: true }), widthMm: fc.integer({ min: 600, max: 1000 }) }),
      kind: fc.constantFrom('gap' as const, 'lift-out' as const, undefined),
    });
    fc.assert(
      fc.property(rooms, ({ a, b, depth, used, door, kind }) => {
        const lengths = [a, b, a, b];
        const from = (i: number) => (used.includes((i + 3) % 4) ? depth : 0);
        const wall = used[0]!;
        const free = lengths[wall]! - from(wall) - door.widthMm;
        // At the corner, or at least 300 mm clear of either end of the shelf; as wide as the shelf if it is too short.
        const widthMm = free < 300 ? door.widthMm + free : door.widthMm;
        const offset = from(wall) + (free < 600 ? 0 : 300 + Math.round(door.at * (free - 600)));
        const opening = kind === undefined ? undefined : { wallIndex: wall, offsetMm: offset, widthMm, kind };
        const walls = lengths.map((lengthMm, i) => ({ name: `Wall ${i + 1}`, lengthMm }));
        const input = { room: { walls, shelfDepthMm: depth, useWalls: used, opening } };
        const boards = generateBoards(parsePlanInput(input)).boards;
        const gap = kind === 'gap' ? widthMm * depth : 0;
        const shelf = used.reduce((sum, i) => sum + (lengths[i]! - from(i)) * depth, 0) - gap;
        expect(boards.reduce((sum, board) => sum + area(board.outline), 0)).toBe(shelf);
        expect(totalOverlap(boards)).toBe(0);
        expect(boards.filter((board) => board.source === 'lift-out')).toHaveLength(kind === 'lift-out' ? 1 : 0);
      }),
      { numRuns: 150 },
    );
  });

  it('splits a run into the fewest equal boards no longer than the longest allowed', () => {
    fc.assert(
      fc.property(fc.integer({ min: 300, max: 30_000 }), fc.integer({ min: 300, max: 2440 }), (run, max) => {
        const lengths = splitEvenly(run, max);
        expect(lengths.reduce((s, l) => s + l, 0)).toBe(run);
        expect(lengths.length).toBe(Math.ceil(run / max));
        expect(Math.max(...lengths) - Math.min(...lengths)).toBeLessThanOrEqual(1);
        expect(Math.max(...lengths)).toBeLessThanOrEqual(max);
      }),
    );
  });

  it('gives each corner to the wall that runs into it, so the next wall starts one shelf depth out', () => {
    // Corner convention (see room-runs.ts): a 10 × 13 ft room (3048 × 3962 mm), 600 mm shelves on every wall.
    const boards = generateBoards(parsePlanInput(tenByThirteenTwoLevel)).boards.filter((b) => b.level === 'lower');
    const first = boards.find((b) => b.id === 'wall-1-1')!;
    expect(first.outline).toEqual({ x: 600, y: 0, width: 816, height: 600 }); // (3048 − 600) / 3 = 816
    const lastOfLastWall = boards.find((b) => b.id === 'wall-4-3')!;
    expect(lastOfLastWall.outline).toEqual({ x: 0, y: 0, width: 600, height: 981 }); // runs into the first corner
  });

  it('bridges the doorway with a lift-out board of the opening’s width', () => {
    const layout = generateBoards(parsePlanInput(tenByThirteenTwoLevel));
    const liftOut = layout.boards.find((b) => b.id === 'wall-4-lift-out')!;
    expect(liftOut).toMatchObject({ source: 'lift-out', lengthMm: 800, widthMm: 600, wallIndex: 3 });
    // The door wall runs up the left side from (0, 3962); the opening is 1200–2000 mm along it.
    expect(liftOut.outline).toEqual({ x: 0, y: 3962 - 2000, width: 600, height: 800 });
    const kinds = layout.joins.filter((j) => j.boardIds.includes(liftOut.id)).map((j) => j.kind);
    expect(kinds).toEqual(['lift-out', 'lift-out']);
    expect(layout.runs[0]).toHaveLength(13); // a whole loop, bridged at the door
  });

  it('leaves a gap at the doorway and starts the run just past it', () => {
    const input = parsePlanInput({
      ...tenByThirteenTwoLevel,
      room: { ...tenByThirteenTwoLevel.room!, opening: { wallIndex: 3, offsetMm: 1200, widthMm: 800, kind: 'gap' } },
      secondLevel: undefined,
    });
    const layout = generateBoards(input);
    expect(layout.boards.some((b) => b.source === 'lift-out')).toBe(false);
    expect(layout.runs).toEqual([
      [
        'wall-4-2',
        'wall-4-3',
        'wall-1-1',
        'wall-1-2',
        'wall-1-3',
        'wall-2-1',
        'wall-2-2',
        'wall-2-3',
        'wall-3-1',
        'wall-3-2',
        'wall-3-3',
        'wall-4-1',
      ],
    ]);
  });

  it('builds the second level over the same footprint at its height, carried by the lower boards', () => {
    const layout = generateBoards(parsePlanInput(tenByThirteenTwoLevel));
    const lower = layout.boards.filter((b) => b.level === 'lower');
    const upper = layout.boards.filter((b) => b.level === 'upper');
    expect(upper).toHaveLength(lower.length);
    for (const board of lower) {
      const copy = upper.find((u) => u.carriedBy === board.id)!;
      expect(copy.outline).toEqual(board.outline);
      expect(copy.elevationMm).toBe(350);
      expect(copy.role).toBe('scenic');
      expect(board.role).toBe('storage');
      expect(board.carries).toBe(copy.id);
    }
  });

  it('lays boards given by size end to end, each joined to the next', () => {
    const input = parsePlanInput({
      boards: [
        { lengthMm: 1200, widthMm: 600 },
        { lengthMm: 900, widthMm: 450 },
      ],
    });
    const layout = generateBoards(input);
    expect(layout.boards.map((b) => b.outline)).toEqual([
      { x: 0, y: 0, width: 1200, height: 600 },
      { x: 1200, y: 0, width: 900, height: 450 },
    ]);
    expect(layout.joins).toEqual([{ boardIds: ['board-1', 'board-2'], kind: 'end-to-end', level: 'lower' }]);
  });
});
