import type { LayoutBoard, PlanRect } from '../boards/types';
import type { ResolvedSection } from '../schema/sections';
import type { FrameLayout, SupportKind } from './types';

/** What the frame is built from and stands on. */
export interface FrameSettings {
  frame: ResolvedSection;
  crossMemberSpacingMm: number;
  support: SupportKind;
  /** Section of the legs, for boards with legs of their own or carried. */
  legs?: ResolvedSection;
  /** Longest span between pairs of legs, mm, when pairs are added along the sides. */
  maxLegSpanMm?: number;
  /** Longest distance between brackets, mm, for boards on brackets. */
  bracketSpacingMm?: number;
}

/** Evenly spaced centres from `from` to `to`: the fewest equal bays no wider than `maxBay`. */
export function evenCentres(from: number, to: number, maxBay: number): number[] {
  const bays = Math.max(1, Math.ceil((to - from) / maxBay - 1e-9));
  return Array.from({ length: bays + 1 }, (_, k) => from + ((to - from) * k) / bays);
}

const round = (mm: number) => Math.round(mm * 10) / 10;

/** The ladder frame of one board, its supports, and the longest rail span between them. */
export function frameLayout(board: LayoutBoard, settings: FrameSettings): FrameLayout {
  const { frame, support, legs } = settings;
  const railsAlongLength = board.lengthMm >= board.widthMm;
  const longMm = Math.max(board.lengthMm, board.widthMm);
  const shortMm = Math.min(board.lengthMm, board.widthMm);
  const t = frame.thicknessMm;
  const ends = evenCentres(t / 2, longMm - t / 2, settings.crossMemberSpacingMm);
  const crossMemberCentresMm = ends.slice(1, -1).map(round);
  const withLegs = (support === 'legs' || support === 'carried') && legs !== undefined;
  const legCentresRaw = withLegs ? legCentres(longMm, t, legs, settings.maxLegSpanMm) : [];
  const bracketSpacing = settings.bracketSpacingMm ?? board.lengthMm;
  const bracketCentresRaw = support === 'brackets' ? evenCentres(0, board.lengthMm, bracketSpacing) : [];
  // A board wider than long on brackets has its rails running out from the wall: batten at one end, bracket at the other.
  const onBrackets = support === 'brackets' && railsAlongLength;
  const supports = withLegs ? legCentresRaw : onBrackets ? bracketCentresRaw : [0, longMm];
  const layout: Omit<FrameLayout, 'drawing'> = {
    railsAlongLength,
    longMm,
    shortMm,
    railThicknessMm: t,
    railDepthMm: frame.widthMm,
    innerLengthMm: shortMm - 2 * t,
    crossMemberCentresMm,
    bayMm: (longMm - t) / (ends.length - 1),
    support,
    legPairCentresMm: legCentresRaw.map(round),
    bracketCentresMm: bracketCentresRaw.map(round),
    railSpanMm: round(Math.max(...supports.slice(1).map((c, i) => c - supports[i]!))),
  };
  return { ...layout, drawing: frameDrawing(layout, withLegs ? legs : undefined) };
}

/** Leg pairs: one inside each end, against the end rail, and evenly between them when a span limit asks. */
function legCentres(longMm: number, t: number, legs: ResolvedSection, maxSpanMm: number | undefined): number[] {
  const first = t + legs.widthMm / 2;
  const last = longMm - t - legs.widthMm / 2;
  return evenCentres(first, last, maxSpanMm ?? Infinity);
}

function frameDrawing(layout: Omit<FrameLayout, 'drawing'>, legs: ResolvedSection | undefined): FrameLayout['drawing'] {
  const { longMm, shortMm, railThicknessMm: t } = layout;
  const rect = (along: number, across: number, alongSize: number, acrossSize: number): PlanRect =>
    layout.railsAlongLength
      ? { x: along, y: across, width: alongSize, height: acrossSize }
      : { x: across, y: along, width: acrossSize, height: alongSize };
  const legRects = (legs === undefined ? [] : layout.legPairCentresMm).flatMap((c) => [
    rect(c - legs!.widthMm / 2, t, legs!.widthMm, legs!.thicknessMm),
    rect(c - legs!.widthMm / 2, shortMm - t - legs!.thicknessMm, legs!.widthMm, legs!.thicknessMm),
  ]);
  return {
    sideRails: [rect(0, 0, longMm, t), rect(0, shortMm - t, longMm, t)],
    endRails: [rect(0, t, t, shortMm - 2 * t), rect(longMm - t, t, t, shortMm - 2 * t)],
    crossMembers: layout.crossMemberCentresMm.map((c) => rect(c - t / 2, t, t, shortMm - 2 * t)),
    legs: legRects,
  };
}
