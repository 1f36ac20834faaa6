import type { LayoutBoard } from '../boards/types';
import { WIRE_PAIR_SPACING_MM } from '../defaults';
import { busRuns, type BusRunsPlan } from '../engineering/bus-runs';
import { type Conductor, type ConductorFamily, smallestPassingConductor, voltageDrop } from '../engineering/wiring';
import type { FrameLayout } from '../frame/types';
import { conductorName } from './item-keys';

/** The wiring settings, as parsed. */
export interface WiringSettings {
  system: 'dc' | 'dcc';
  busConductor: Conductor;
  wireOuterDiameterMm: number;
  accessoryPairs: number;
  accessoryVoltage: number;
  currentA: number;
  dropLimitV: number;
  feedFrom: 'one-end' | 'centre';
}

/** The voltage lost by the time the bus reaches a board's far end. */
export interface FarEndDrop {
  /** Bus length from the feed to this board's far end, m. */
  distanceM: number;
  /** Loop drop (out and back) with the whole current drawn at the far end: the worst case, V. */
  dropV: number;
  limitV: number;
  passes: boolean;
  /** The drop as a share of the accessory supply's voltage, for the accessory pairs on the same wire, %. */
  accessoryDropPercent: number;
  /** When it fails: the smallest conductor of the same family that passes, and its drop; null if none does. */
  passingConductor?: { conductor: Conductor; name: string; dropV: number } | null;
}

/** One board's wiring: its bus runs, drilling template and droppers, and the drop at its far end. */
export interface BoardWiring extends BusRunsPlan {
  boardId: string;
  farEnd: FarEndDrop;
}

/** The wiring of the whole plan. */
export interface WiringPlan {
  system: 'dc' | 'dcc';
  conductor: Conductor;
  conductorName: string;
  feedFrom: 'one-end' | 'centre';
  boards: BoardWiring[];
  /** Bus wire over every board, both wires of every pair, end allowances included, m. */
  busWireM: number;
  dropperWireM: number;
  worstDropV: number;
  passes: boolean;
}

function familyOf(conductor: Conductor): ConductorFamily {
  if (conductor.kind === 'awg') return 'awg';
  return conductor.kind === 'iec' && conductor.class === '5/6' ? 'iec-5/6' : 'iec-1/2';
}

/** Accessory pairs alternate behind and in front of the track feed, one pair spacing further out each time. */
export function accessoryOffsets(pairs: number): number[] {
  return Array.from(
    { length: pairs },
    (_, i) => (i % 2 === 0 ? 1 : -1) * Math.ceil((i + 1) / 2) * WIRE_PAIR_SPACING_MM,
  );
}

/**
 * Distance from the feed to the far end of each board, mm: along its run of joined boards, fed at the first board's
 * start ("one-end") or halfway along the run ("centre").
 */
export function farEndDistances(
  runs: readonly string[][],
  lengthOf: (id: string) => number,
  feedFrom: string,
): Map<string, number> {
  const distances = new Map<string, number>();
  for (const run of runs) {
    const total = run.reduce((sum, id) => sum + lengthOf(id), 0);
    const feed = feedFrom === 'centre' ? total / 2 : 0;
    let start = 0;
    for (const id of run) {
      const end = start + lengthOf(id);
      distances.set(id, Math.max(Math.abs(start - feed), Math.abs(end - feed)));
      start = end;
    }
  }
  return distances;
}

/** Plans the bus runs of every board and checks the drop at each board's far end against the limit. */
export function planWiring(
  boards: readonly { board: LayoutBoard; frame: FrameLayout }[],
  runs: readonly string[][],
  settings: WiringSettings,
): WiringPlan {
  const frames = new Map(boards.map((b) => [b.board.id, b.frame]));
  const distances = farEndDistances(runs, (id) => frames.get(id)!.longMm, settings.feedFrom);
  const offsets = accessoryOffsets(settings.accessoryPairs);
  const planned = boards.map(({ board, frame }): BoardWiring => {
    const plan = busRuns({
      boardLengthMm: frame.longMm,
      boardWidthMm: frame.shortMm,
      crossMemberPositionsMm: frame.crossMemberCentresMm,
      wireOuterDiameterMm: settings.wireOuterDiameterMm,
      accessoryOffsetsMm: offsets,
      crossMemberDepthMm: frame.railDepthMm,
      crossMemberThicknessMm: frame.railThicknessMm,
      sideRailThicknessMm: frame.railThicknessMm,
    });
    return { ...plan, boardId: board.id, farEnd: farEndDrop(distances.get(board.id) ?? frame.longMm, settings) };
  });
  const dropperMm = planned.reduce((sum, b) => sum + b.droppers.totalWireMm, 0);
  const totalMm = planned.reduce((sum, b) => sum + b.totalWireMm, 0);
  return {
    system: settings.system,
    conductor: settings.busConductor,
    conductorName: conductorName(settings.busConductor),
    feedFrom: settings.feedFrom,
    boards: planned,
    busWireM: (totalMm - dropperMm) / 1000,
    dropperWireM: dropperMm / 1000,
    worstDropV: Math.max(0, ...planned.map((b) => b.farEnd.dropV)),
    passes: planned.every((b) => b.farEnd.passes),
  };
}

function farEndDrop(distanceMm: number, settings: WiringSettings): FarEndDrop {
  const lengthM = distanceMm / 1000;
  const dropV = voltageDrop({ lengthM, currentA: settings.currentA, conductor: settings.busConductor });
  const passes = dropV <= settings.dropLimitV;
  const result: FarEndDrop = {
    distanceM: lengthM,
    dropV,
    limitV: settings.dropLimitV,
    passes,
    accessoryDropPercent: (100 * dropV) / settings.accessoryVoltage,
  };
  if (passes) return result;
  const run = { lengthM, currentA: settings.currentA, family: familyOf(settings.busConductor) };
  const better = smallestPassingConductor(settings.dropLimitV, run);
  result.passingConductor = better === null ? null : { ...better, name: conductorName(better.conductor) };
  return result;
}
