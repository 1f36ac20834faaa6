import type { LayoutBoard } from '../boards/types';
import type { SheetMaterialId } from '../engineering/sheet-data';
import { SHEET_MATERIALS } from '../engineering/sheet-data';
import { sagCheck, type SagCheckResult } from '../engineering/sag-check';
import { standardSection, standardSections } from '../engineering/materials';
import { TIMBER_CLASSES, type TimberClassId } from '../engineering/timber-data';
import { sheetMassPerAreaKgM2 } from '../engineering/weight';
import type { FrameLayout, SupportKind } from '../frame/types';
import type { ResolvedSection } from '../schema/sections';

/** Sag of a board's front side rail over its longest span between supports. */
export interface RailSag extends SagCheckResult {
  spanMm: number;
  supportedBy: SupportKind;
}

/** Sag of a board's top between two cross members. */
export interface SheetSag extends SagCheckResult {
  spacingMm: number;
}

/** One board's sag checks; `sheet` is null for a top that is not to span (foam: lay it on a sheet that is). */
export interface BoardSag {
  boardId: string;
  rail: RailSag;
  sheet: SheetSag | null;
}

/** What the checks need. */
export interface SagSettings {
  frame: ResolvedSection;
  timberClass: TimberClassId;
  top: { material: SheetMaterialId; thicknessMm: number };
  loads: { uniformKgM2: number; pointLoadN: number; spanLimitRatio: number };
}

/**
 * Checks each board: its side rail on edge over the longest span between legs, brackets or (for a lift-out) its own
 * ends, carrying half the board's width of load and top plus someone leaning at mid-span; and its top as a strip
 * between cross members. Failing checks carry worked-out suggestions. Boards alike are checked once.
 */
export function planSag(
  boards: readonly { board: LayoutBoard; frame: FrameLayout }[],
  settings: SagSettings,
): BoardSag[] {
  const timber = TIMBER_CLASSES[settings.timberClass];
  const sheet = SHEET_MATERIALS[settings.top.material];
  const topKgM2 = sheetMassPerAreaKgM2(settings.top.thicknessMm, sheet.densityKgM3);
  const region = standardSection(settings.frame.sectionId).region;
  const candidates = standardSections(region);
  const { loads } = settings;
  const seen = new Map<string, { rail: RailSag; sheet: SheetSag | null }>();
  return boards.map(({ board, frame }) => {
    const key = `${frame.railSpanMm}|${frame.shortMm}|${frame.bayMm}|${frame.support}`;
    let checks = seen.get(key);
    if (checks === undefined) {
      const rail = sagCheck({
        member: 'rail',
        spanMm: frame.railSpanMm,
        section: { widthMm: frame.railDepthMm, thicknessMm: frame.railThicknessMm },
        eNmm2: timber.eMeanNmm2,
        densityKgM3: timber.densityMeanKgM3,
        loadKgM2: loads.uniformKgM2 + topKgM2,
        tributaryWidthMm: frame.shortMm / 2,
        pointLoadN: loads.pointLoadN,
        limitRatio: loads.spanLimitRatio,
        candidateSections: candidates,
      });
      const top =
        sheet.bendingENmm2 === null
          ? null
          : sagCheck({
              member: 'sheet',
              spacingMm: frame.bayMm,
              thicknessMm: settings.top.thicknessMm,
              eNmm2: sheet.bendingENmm2,
              densityKgM3: sheet.densityKgM3,
              loadKgM2: loads.uniformKgM2,
              limitRatio: loads.spanLimitRatio,
            });
      checks = {
        rail: { ...rail, spanMm: frame.railSpanMm, supportedBy: frame.support },
        sheet: top === null ? null : { ...top, spacingMm: frame.bayMm },
      };
      seen.set(key, checks);
    }
    return { boardId: board.id, ...checks };
  });
}
