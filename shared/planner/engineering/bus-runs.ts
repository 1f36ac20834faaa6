import { lengthText as len } from '../text/lengths';
import { EngineeringInputError, requireFinite, requirePositive } from './checks';
import { standardSection } from './materials';
import {
  DEFAULT_DROPPER_LENGTH_MM,
  DEFAULT_DROPPER_SECTION_MM,
  DEFAULT_END_ALLOWANCE_MM,
  DEFAULT_HOLE_CLEARANCE_MM,
  DRILL_STEP_MM,
  DROPPER_CLEARANCE_MM,
  HOLE_RULES,
} from './wiring-data';

/** A board's wiring under the top: pairs of wires running its length through holes in the cross members. */
export interface BusRunsInput {
  boardLengthMm: number;
  boardWidthMm: number;
  /** Centres of the cross members, measured along the board from one end, mm. */
  crossMemberPositionsMm: readonly number[];
  /** Outside diameter of one insulated wire, mm. Each pair passes one hole, side by side. */
  wireOuterDiameterMm: number;
  /** Distance of the track-feed pair from the front edge, mm; default the middle of the board. */
  trackFeedAcrossMm?: number;
  /** Each accessory pair's distance from the track-feed pair, mm: negative towards the front, positive behind. */
  accessoryOffsetsMm?: readonly number[];
  /** Depth of the cross members on edge, mm; when given, holes are placed at mid-depth and checked against it. */
  crossMemberDepthMm?: number;
  /** Thickness of the cross members, mm (default the 2x1's 18); droppers are kept clear of them. */
  crossMemberThicknessMm?: number;
  /** Thickness of the side rails, mm (default the 2x1's 18); holes must lie between them. */
  sideRailThicknessMm?: number;
  holeClearanceMm?: number;
  /** Wire left at each end of a run for the connection, mm (default 150). */
  endAllowanceMm?: number;
  /** One dropper pair per rail section of this length, mm (default 1000). */
  dropperSectionMm?: number;
  /** Length of each dropper wire, mm (default 150). */
  dropperLengthMm?: number;
}

/** One pair of wires along the board. */
export interface BusRun {
  name: string;
  /** Distance from the front edge, mm. */
  acrossMm: number;
  /** Length of each of the two wires, mm, with the end allowances. */
  wireLengthMm: number;
  /** Both wires together, mm. */
  pairLengthMm: number;
}

/** The wiring plan for one board. */
export interface BusRunsPlan {
  runs: BusRun[];
  /** The drilling template: the same holes in every cross member. */
  holes: { diameterMm: number; acrossMm: number[]; fromTopMm?: number };
  crossMembersAtMm: number[];
  /** Track droppers: one pair per rail section, placed clear of the cross members. */
  droppers: { pairs: number; alongMm: number[]; lengthEachMm: number; totalWireMm: number };
  totalWireMm: number;
  /** Problems with the layout of holes, in plain words; empty when there are none. */
  warnings: string[];
}

/** Rails and cross members are 2x1 unless told otherwise. */
const DEFAULT_MEMBER_THICKNESS_MM = standardSection('uk-2x1').thicknessMm;

const roundUpTo = (value: number, step: number): number => Math.ceil(value / step - 1e-9) * step;

function holeWarnings(input: BusRunsInput, runs: BusRun[], diameterMm: number): string[] {
  const rail = input.sideRailThicknessMm ?? DEFAULT_MEMBER_THICKNESS_MM;
  const [lo, hi] = [rail + diameterMm / 2, input.boardWidthMm - rail - diameterMm / 2];
  const warnings = runs
    .filter((r) => r.acrossMm < lo || r.acrossMm > hi)
    .map(
      (r) =>
        `The ${r.name} hole at ${len(r.acrossMm)} is not within the cross member (${len(lo)} to ${len(hi)}); move it.`,
    );
  const minCentres = HOLE_RULES.minCentresInDiameters * diameterMm;
  const sorted = [...runs].sort((a, b) => a.acrossMm - b.acrossMm);
  sorted.slice(1).forEach((run, i) => {
    const prev = sorted[i] as BusRun;
    const gap = run.acrossMm - prev.acrossMm;
    if (gap < minCentres) {
      warnings.push(
        `The ${prev.name} and ${run.name} holes are ${len(gap)} apart; keep them ${len(minCentres)} apart.`,
      );
    }
  });
  const depth = input.crossMemberDepthMm;
  if (depth !== undefined && diameterMm > HOLE_RULES.maxFractionOfDepth * depth) {
    warnings.push(
      `A ${len(diameterMm, 'fine')} hole is more than a quarter of the ${len(depth)} cross-member depth; ` +
        'use thinner wire or deeper cross members.',
    );
  }
  return warnings;
}

function clearOfCrossMembers(alongMm: number, crossMembers: readonly number[], clearMm: number): number {
  const hit = crossMembers.find((c) => Math.abs(alongMm - c) < clearMm);
  if (hit === undefined) return alongMm;
  return alongMm >= hit ? hit + clearMm : hit - clearMm;
}

function dropperPositions(input: BusRunsInput, sectionMm: number): number[] {
  const clear = (input.crossMemberThicknessMm ?? DEFAULT_MEMBER_THICKNESS_MM) / 2 + DROPPER_CLEARANCE_MM;
  const sections = Math.ceil(input.boardLengthMm / sectionMm - 1e-9);
  return Array.from({ length: sections }, (_, i) => {
    const middle = (i * sectionMm + Math.min((i + 1) * sectionMm, input.boardLengthMm)) / 2;
    return clearOfCrossMembers(middle, input.crossMemberPositionsMm, clear);
  });
}

function checkInput(input: BusRunsInput): void {
  requirePositive(input.boardLengthMm, 'Board length', 'millimetres');
  requirePositive(input.boardWidthMm, 'Board width', 'millimetres');
  requirePositive(input.wireOuterDiameterMm, 'Wire outside diameter', 'millimetres');
  for (const at of input.crossMemberPositionsMm) {
    requireFinite(at, 'Cross-member position', 'millimetres');
    if (at < 0 || at > input.boardLengthMm) {
      throw new EngineeringInputError(
        `A cross member at ${at} mm is off the ${input.boardLengthMm} mm board.`,
        'cross',
      );
    }
  }
}

/**
 * Plans the wiring under one board: a track-feed pair and accessory pairs running its length, each cut to the board
 * plus an allowance at each end; one hole per pair, at the same place in every cross member, sized for two wires
 * side by side plus clearance; and track droppers, one pair per rail section.
 */
export function busRuns(input: BusRunsInput): BusRunsPlan {
  checkInput(input);
  const end = input.endAllowanceMm ?? DEFAULT_END_ALLOWANCE_MM;
  const wireLengthMm = input.boardLengthMm + 2 * end;
  const feed = input.trackFeedAcrossMm ?? input.boardWidthMm / 2;
  const runs: BusRun[] = [
    { name: 'track feed', acrossMm: feed, wireLengthMm, pairLengthMm: 2 * wireLengthMm },
    ...(input.accessoryOffsetsMm ?? []).map((offset, i) => ({
      name: `accessory ${i + 1}`,
      acrossMm: feed + offset,
      wireLengthMm,
      pairLengthMm: 2 * wireLengthMm,
    })),
  ];
  const diameterMm = roundUpTo(
    2 * input.wireOuterDiameterMm + (input.holeClearanceMm ?? DEFAULT_HOLE_CLEARANCE_MM),
    DRILL_STEP_MM,
  );
  const sectionMm = input.dropperSectionMm ?? DEFAULT_DROPPER_SECTION_MM;
  requirePositive(sectionMm, 'Rail section length', 'millimetres');
  const alongMm = dropperPositions(input, sectionMm);
  const lengthEachMm = input.dropperLengthMm ?? DEFAULT_DROPPER_LENGTH_MM;
  const dropperWire = alongMm.length * 2 * lengthEachMm;
  return {
    runs,
    holes: {
      diameterMm,
      acrossMm: runs.map((r) => r.acrossMm),
      fromTopMm: input.crossMemberDepthMm === undefined ? undefined : input.crossMemberDepthMm / 2,
    },
    crossMembersAtMm: [...input.crossMemberPositionsMm].sort((a, b) => a - b),
    droppers: { pairs: alongMm.length, alongMm, lengthEachMm, totalWireMm: dropperWire },
    totalWireMm: runs.reduce((sum, r) => sum + r.pairLengthMm, 0) + dropperWire,
    warnings: holeWarnings(input, runs, diameterMm),
  };
}
