import type { Finish } from '../../../../shared/listings/vocabulary';
import type { EndProfile, ModuleListingInput } from '../../../../shared/schemas/listings';
import { describeScale, scaleById, type ScaleGauge } from '../../../../shared/scales';

/** What the drawings need to know of one board. */
export interface BoardDrawing {
  /** Seeds the scenery, so a board always gets the same picture. */
  key: string;
  caption: string;
  scale: ScaleGauge;
  scaleText: string;
  lengthMm: number;
  widthMm: number;
  construction: ModuleListingInput['construction'];
  deckGapMm: number | null;
  ends: { a: EndProfile; b: EndProfile };
  finish: Finish;
}

export function boardDrawing(key: string, caption: string, m: ModuleListingInput): BoardDrawing {
  const scale = scaleById(m.scaleId);
  if (!scale) throw new Error(`demo picture: unknown scale ${m.scaleId}`);
  return {
    key,
    caption,
    scale,
    scaleText: describeScale(scale),
    lengthMm: m.lengthMm,
    widthMm: m.widthMm,
    construction: m.construction,
    deckGapMm: m.levels.type === 'two-level' ? m.levels.deckGapMm : null,
    ends: m.endProfiles,
    finish: m.finish,
  };
}

/** Where a plan (top view) sits on the canvas: the board's back-left corner and pixels per mm. */
export interface PlanLayout {
  x0: number;
  y0: number;
  s: number;
}

const PLAN_AREA = { left: 90, top: 140, width: 960, height: 450 };

/** The board fitted into the plan area, front edge at the bottom, end A on the left. */
export function planLayout(b: BoardDrawing): PlanLayout {
  const s = Math.min(PLAN_AREA.width / b.lengthMm, PLAN_AREA.height / b.widthMm);
  return {
    s,
    x0: PLAN_AREA.left + (PLAN_AREA.width - b.lengthMm * s) / 2,
    y0: PLAN_AREA.top + (PLAN_AREA.height - b.widthMm * s) / 2,
  };
}

/** Finishes with track on the board. */
export const hasTrack = (f: Finish) => !['bare-frame', 'topped'].includes(f);
