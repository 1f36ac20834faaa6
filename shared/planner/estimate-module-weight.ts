import type { Support, TopMaterial } from '../listings/vocabulary';
import type { LayoutBoard } from './boards/types';
import { boardParts, type PartSettings } from './cutting/board-parts';
import { DEFAULT_LEG_HEIGHT_MM } from './defaults';
import { standardSection } from './engineering/materials';
import { SHEET_MATERIALS, type SheetMaterialId } from './engineering/sheet-data';
import { DEFAULT_TIMBER_CLASS } from './engineering/timber-data';
import { frameLayout } from './frame/frame-layout';
import type { SupportKind } from './frame/types';
import { planWeight } from './plan/weight';
import type { ResolvedSection } from './schema/sections';

/** What a module listing says about how one board is built: the fields the estimate reads. */
export interface ModuleConstruction {
  boardCount: number;
  lengthMm: number;
  widthMm: number;
  levels: { type: 'single' } | { type: 'two-level'; deckGapMm: number };
  construction: {
    frameDepthMm: number;
    frameThicknessMm: number;
    crossMemberSpacingMm: number;
    topMaterial: TopMaterial;
    topThicknessMm: number | null;
    supports: Support;
  };
  /** The ends' rail-top heights: one measured from the floor gives the legs' length. */
  endProfiles?: { a?: RailTop; b?: RailTop };
}

interface RailTop {
  railTopHeightMm: number;
  railTopFrom: 'floor' | 'frame';
}

/** Legs counted with the board, as the planner builds them. */
export interface EstimatedLegs {
  count: number;
  lengthMm: number;
  /** The section assumed, e.g. "2x2" at 44 × 44 mm. */
  section: { nominal: string; widthMm: number; thicknessMm: number };
  /** Where the height of the top came from: an end's rail top measured from the floor, or the planner's default. */
  heightFrom: 'rail-top' | 'default';
  topHeightMm: number;
}

/** A board's estimated weight, or why none can be given. */
export type ModuleWeightEstimate =
  | {
      ok: true;
      /** One board (both decks of a two-level board), grams: what the listing's weight field holds. */
      boardG: number;
      /** The frame timber and the top sheet(s) of that board, grams. */
      timberG: number;
      sheetG: number;
      /** The density the top was weighed at, kg/m³; null with no top. */
      topDensityKgM3: number | null;
      /** Every board, grams, taking each as large as the largest. */
      allBoardsG: number;
      legs: EstimatedLegs | null;
    }
  | { ok: false; reason: string };

/** Listing top materials the planner has a density for. Softboard and "other" have none. */
const SHEETS: Partial<Record<TopMaterial, SheetMaterialId>> = {
  'birch-plywood': 'birch-ply',
  'softwood-plywood': 'softwood-ply',
  'poplar-plywood': 'poplar-ply',
  mdf: 'mdf',
  'insulation-foam': 'extruded-foam',
};

const NO_DENSITY: Partial<Record<TopMaterial, string>> = {
  softboard: 'fibre softboard',
  other: 'a top of another material',
};

/** The section legs are assumed to be: the planner's default leg section. */
const LEG_SECTION_ID = 'uk-2x2';

function topHeight(m: ModuleConstruction): { mm: number; from: EstimatedLegs['heightFrom'] } {
  const ends = [m.endProfiles?.a, m.endProfiles?.b];
  const fromFloor = ends.flatMap((e) => (e?.railTopFrom === 'floor' ? [e.railTopHeightMm] : []));
  return fromFloor.length > 0
    ? { mm: Math.max(...fromFloor), from: 'rail-top' }
    : { mm: DEFAULT_LEG_HEIGHT_MM, from: 'default' };
}

function deck(m: ModuleConstruction, level: LayoutBoard['level']): LayoutBoard {
  const { lengthMm, widthMm } = m;
  const twoLevel = m.levels.type === 'two-level';
  return {
    id: level,
    name: level === 'lower' ? 'Lower deck' : 'Upper deck',
    level,
    role: 'scenic',
    source: 'explicit',
    lengthMm,
    widthMm,
    elevationMm: level === 'upper' && m.levels.type === 'two-level' ? m.levels.deckGapMm : 0,
    placement: { x: 0, y: 0, rotationDeg: 0 },
    outline: { x: 0, y: 0, width: lengthMm, height: widthMm },
    ...(twoLevel && level === 'lower' ? { carries: 'upper' } : {}),
    ...(twoLevel && level === 'upper' ? { carriedBy: 'lower' } : {}),
  };
}

/** What holds each deck up, as the planner names it: legs carry an upper deck; brackets stay on the wall. */
function supportOf(support: Support, level: LayoutBoard['level']): SupportKind {
  if (support === 'legs') return level === 'upper' ? 'carried' : 'legs';
  return support === 'wall-brackets' ? 'brackets' : 'ends';
}

/**
 * Estimates what one board of a module weighs from how the listing says it is built, with the planner's own frame,
 * parts and weights: a ladder frame of the given section with cross members at no more than the spacing, timber at
 * the C16 mean density (EN 338:2016, Table 1) and the top at the planner's density for its sheet material. Legs, when
 * the board stands on them, are the planner's default 2x2 with its braces, as tall as the highest rail top measured
 * from the floor (900 mm when none is). A two-level board counts both decks, the legs running up to the upper one.
 * Wall brackets stay on the wall and are not counted. Track, scenery and wiring are not counted either.
 */
export function estimateModuleWeight(m: ModuleConstruction): ModuleWeightEstimate {
  const c = m.construction;
  const withTop = c.topMaterial !== 'none';
  const sheet = SHEETS[c.topMaterial];
  if (withTop && sheet === undefined) {
    const what = NO_DENSITY[c.topMaterial] ?? 'this top';
    return { ok: false, reason: `The planner has no density for ${what}, so weigh the board instead.` };
  }
  const frame: ResolvedSection = {
    sectionId: 'listing-frame',
    widthMm: c.frameDepthMm,
    thicknessMm: c.frameThicknessMm,
  };
  const legSection = standardSection(LEG_SECTION_ID);
  const legs: ResolvedSection = {
    sectionId: legSection.id,
    widthMm: legSection.widthMm,
    thicknessMm: legSection.thicknessMm,
  };
  const height = topHeight(m);
  const topThicknessMm = withTop ? (c.topThicknessMm ?? 0) : 0;
  const settings: PartSettings = {
    frame,
    ...(c.supports === 'legs' ? { legs, legHeightMm: height.mm } : {}),
    ...(m.levels.type === 'two-level' ? { heightAboveMm: m.levels.deckGapMm } : {}),
    // With no top the top part is dropped below; the material only has to be one the planner knows.
    top: { material: sheet ?? 'birch-ply', thicknessMm: topThicknessMm },
  };
  const levels: LayoutBoard['level'][] = m.levels.type === 'two-level' ? ['lower', 'upper'] : ['lower'];
  const built = levels.map((level) => {
    const board = deck(m, level);
    const layout = frameLayout(board, {
      frame,
      crossMemberSpacingMm: c.crossMemberSpacingMm,
      support: supportOf(c.supports, level),
      ...(c.supports === 'legs' ? { legs } : {}),
    });
    const parts = boardParts(board, layout, settings).filter((p) => withTop || p.kind !== 'top');
    return { board, parts };
  });
  const weight = planWeight(built, DEFAULT_TIMBER_CLASS);
  const grams = (kg: number) => Math.round(kg * 1000);
  const boardG = grams(weight.totalKg);
  const legParts = built[0]!.parts.find((p) => p.kind === 'leg');
  return {
    ok: true,
    boardG,
    timberG: grams(weight.boards.reduce((sum, b) => sum + b.timberKg, 0)),
    sheetG: grams(weight.boards.reduce((sum, b) => sum + b.sheetKg, 0)),
    topDensityKgM3: withTop && sheet !== undefined ? SHEET_MATERIALS[sheet].densityKgM3 : null,
    allBoardsG: boardG * m.boardCount,
    legs:
      legParts === undefined
        ? null
        : {
            count: legParts.quantity,
            lengthMm: legParts.lengthMm,
            section: { nominal: legSection.nominal, widthMm: legSection.widthMm, thicknessMm: legSection.thicknessMm },
            heightFrom: height.from,
            topHeightMm: height.mm,
          },
  };
}

/** The estimate as the listing's weight field takes it: kilograms to one decimal place, at least 0.1 kg. */
export function estimateToKg(boardG: number): number {
  return Math.max(0.1, Math.round(boardG / 100) / 10);
}
