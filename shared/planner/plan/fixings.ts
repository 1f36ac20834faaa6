import type { LayoutBoard } from '../boards/types';
import type { BoardPart } from '../cutting/types';
import { PVA_BOTTLE_G } from '../defaults';
import { pvaGrams } from '../engineering/board-joins';
import { fixingSchedule, type JointFixing } from '../engineering/fixing-schedule';
import type { Screw } from '../engineering/screws';
import type { FrameLayout } from '../frame/types';
import type { ResolvedSection } from '../schema/sections';
import { joinFixings, type JoinFixingsPlan, type JoinMethod } from './board-joins';
import { type ExtraJointKind, extraJoints } from './extra-joints';

/** One kind of screwed joint over the whole plan, with its screw and how many it takes. */
export interface FixingRow {
  joint: JointFixing['joint'] | ExtraJointKind;
  description: string;
  /** The screw with its pilot, clearance and countersink; null where none will do or another maker specifies it. */
  screw: Screw | null;
  /** Why no screw will do, when none will. */
  problem?: string;
  perJoint: number;
  joints: number;
  total: number;
  /** How many boards have this joint. */
  boards: number;
  note?: string;
}

/** Everything that holds the plan together. */
export interface FixingsPlan {
  screws: FixingRow[];
  /** Screws to buy, by gauge and length. */
  screwsToBuy: { gaugeMm: number; lengthMm: number; count: number }[];
  boardJoins: JoinFixingsPlan;
  /** PVA for the frame's butt joints and for gluing each top to its frame. */
  glue: { grams: number; bottles: number };
  /** Shelf brackets, for boards on wall battens. */
  brackets: number;
}

/** A board as the fixings need it. */
export interface FixingBoard {
  board: LayoutBoard;
  frame: FrameLayout;
  parts: readonly BoardPart[];
}

/** Screws per joint for every board, the board joins, and the glue. */
export function planFixings(
  boards: readonly FixingBoard[],
  sections: { frame: ResolvedSection; legs?: ResolvedSection; topThicknessMm: number },
  joins: { method: JoinMethod; count: number; liftOuts: number },
): FixingsPlan {
  const rows = new Map<string, FixingRow>();
  let grams = 0;
  for (const { frame, parts } of boards) {
    const legs = frame.legPairCentresMm.length * 2;
    const schedule = [
      ...fixingSchedule({
        boardLengthMm: frame.longMm,
        boardWidthMm: frame.shortMm,
        rail: { widthMm: frame.railDepthMm, thicknessMm: frame.railThicknessMm },
        crossMemberCount: frame.crossMemberCentresMm.length,
        topSheetThicknessMm: sections.topThicknessMm,
        ...(legs > 0 && sections.legs !== undefined ? { legs: { count: legs, section: sections.legs } } : {}),
        ...(frame.support === 'brackets' ? { wallBattenCount: 1 } : {}),
      }),
      ...extraJoints(frame, parts, sections),
    ];
    for (const joint of schedule) addRow(rows, joint);
    grams += frameGlueGrams(frame);
  }
  const screws = [...rows.values()];
  return {
    screws,
    screwsToBuy: screwsToBuy(screws),
    boardJoins: joinFixings(joins.method, joins.count, sections.frame.thicknessMm, joins.liftOuts),
    glue: { grams, bottles: Math.ceil(grams / PVA_BOTTLE_G) },
    brackets: boards.reduce((n, b) => n + b.frame.bracketCentresMm.length, 0),
  };
}

function addRow(rows: Map<string, FixingRow>, joint: Omit<JointFixing, 'joint'> & { joint: FixingRow['joint'] }): void {
  const screw = joint.screw?.ok === true ? joint.screw.screw : null;
  const problem = joint.screw?.ok === false ? joint.screw.reason : undefined;
  const key = [joint.joint, joint.description, screw ? `${screw.gaugeMm}x${screw.lengthMm}` : problem].join('|');
  const row = rows.get(key);
  if (row !== undefined) {
    row.joints += joint.joints;
    row.total += joint.total;
    row.boards += 1;
    return;
  }
  rows.set(key, {
    joint: joint.joint,
    description: joint.description,
    screw,
    ...(problem === undefined ? {} : { problem }),
    perJoint: joint.perJoint,
    joints: joint.joints,
    total: joint.total,
    boards: 1,
    ...(joint.note === undefined ? {} : { note: joint.note }),
  });
}

function screwsToBuy(rows: readonly FixingRow[]): FixingsPlan['screwsToBuy'] {
  const counts = new Map<string, { gaugeMm: number; lengthMm: number; count: number }>();
  for (const row of rows) {
    if (row.screw === null || row.total === 0) continue;
    const key = `${row.screw.gaugeMm}x${row.screw.lengthMm}`;
    const entry = counts.get(key) ?? { gaugeMm: row.screw.gaugeMm, lengthMm: row.screw.lengthMm, count: 0 };
    entry.count += row.total;
    counts.set(key, entry);
  }
  return [...counts.values()].sort((a, b) => a.gaugeMm - b.gaugeMm || a.lengthMm - b.lengthMm);
}

/** Glue on the end grain of each end rail and cross member, and along every member's top edge under the top. */
function frameGlueGrams(frame: FrameLayout): number {
  const { railDepthMm, railThicknessMm: t, longMm, innerLengthMm } = frame;
  const members = 2 + frame.crossMemberCentresMm.length;
  const butts = Array.from({ length: 2 * members }, () => ({ lengthMm: railDepthMm, faceWidthMm: t }));
  const topEdges = { lengthMm: 2 * longMm + members * innerLengthMm, faceWidthMm: t };
  return pvaGrams([...butts, topEdges]);
}
