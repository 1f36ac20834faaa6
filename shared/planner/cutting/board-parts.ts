import type { SheetMaterialId } from '../engineering/sheet-data';
import { LEG_BRACE_HEIGHT_MM } from '../defaults';
import type { LayoutBoard } from '../boards/types';
import type { FrameLayout } from '../frame/types';
import type { ResolvedSection } from '../schema/sections';
import type { BoardPart, PartKind, SheetMaterial, TimberMaterial } from './types';

/** What the parts of a board are made of, and the heights that size its legs, shelf and kickboard. */
export interface PartSettings {
  frame: ResolvedSection;
  legs?: ResolvedSection;
  /** Height of the lower level's top above the floor, mm, when on legs. */
  legHeightMm?: number;
  /** Height of the upper level's top above the lower's, mm. */
  heightAboveMm?: number;
  top: { material: SheetMaterialId; thicknessMm: number };
  lowerShelf?: { sheetThicknessMm: number };
  kickboards?: { heightMm: number; floorFallMm: number; sheetThicknessMm: number };
}

const timber = (s: ResolvedSection): TimberMaterial => ({ type: 'timber', ...s });
const mm = Math.round;
const sheetOf = (settings: PartSettings, thicknessMm: number): SheetMaterial => ({
  type: 'sheet',
  material: settings.top.material,
  thicknessMm,
});

/**
 * Every part of one board. Legs: a board with its own legs has one inside each corner and a pair at each extra leg
 * centre, running from the floor to the underside of its top (through both levels when it carries an upper board);
 * each pair is tied by a brace across at low level, and each long side by one diagonal brace from the foot of the
 * first leg to the rail over the last. Lift-outs and carried upper boards have none.
 */
export function boardParts(board: LayoutBoard, frame: FrameLayout, settings: PartSettings): BoardPart[] {
  const rail = timber(settings.frame);
  const sheet = (thicknessMm: number) => sheetOf(settings, thicknessMm);
  const part = (kind: PartKind, material: BoardPart['material'], lengthMm: number, quantity: number): BoardPart => ({
    kind,
    material,
    lengthMm: mm(lengthMm),
    quantity,
  });
  const parts: BoardPart[] = [
    part('side-rail', rail, frame.longMm, 2),
    part('end-rail', rail, frame.innerLengthMm, 2),
    part('cross-member', rail, frame.innerLengthMm, frame.crossMemberCentresMm.length),
    { ...part('top', sheet(settings.top.thicknessMm), board.lengthMm, 1), widthMm: board.widthMm, grain: 'along' },
  ];
  if (frame.support === 'brackets') parts.push(part('wall-batten', rail, board.lengthMm, 1));
  if (frame.support === 'legs' && settings.legs !== undefined) {
    parts.push(...legParts(board, frame, settings, rail));
    if (board.level === 'lower') parts.push(...underBoardParts(board, frame, settings));
  }
  return parts.filter((p) => p.quantity > 0);
}

/** A lower shelf on two bearers between the legs, and a kickboard along the front, cut the floor's fall taller. */
function underBoardParts(board: LayoutBoard, frame: FrameLayout, settings: PartSettings): BoardPart[] {
  const sheet = (thicknessMm: number) => sheetOf(settings, thicknessMm);
  const innerLong = mm(frame.longMm - 2 * frame.railThicknessMm);
  const parts: BoardPart[] = [];
  const shelf = settings.lowerShelf;
  if (shelf !== undefined) {
    parts.push(
      { kind: 'shelf-bearer', material: timber(settings.frame), lengthMm: innerLong, quantity: 2 },
      {
        kind: 'lower-shelf',
        material: sheet(shelf.sheetThicknessMm),
        lengthMm: innerLong,
        widthMm: mm(frame.innerLengthMm),
        quantity: 1,
        grain: 'any',
      },
    );
  }
  const kick = settings.kickboards;
  if (kick !== undefined) {
    const widthMm = kick.heightMm + kick.floorFallMm;
    const material = sheet(kick.sheetThicknessMm);
    parts.push({ kind: 'kickboard', material, lengthMm: board.lengthMm, widthMm, quantity: 1, grain: 'any' });
  }
  return parts;
}

function legParts(board: LayoutBoard, frame: FrameLayout, settings: PartSettings, rail: TimberMaterial): BoardPart[] {
  const legs = settings.legs!;
  const above = settings.heightAboveMm ?? 0;
  const topHeight = (settings.legHeightMm ?? 0) + (board.level === 'upper' ? above : 0);
  const legLength = topHeight + (board.carries !== undefined ? above : 0) - settings.top.thicknessMm;
  const pairs = frame.legPairCentresMm.length;
  const parts: BoardPart[] = [
    { kind: 'leg', material: timber(legs), lengthMm: mm(legLength), quantity: 2 * pairs },
    { kind: 'leg-brace', material: rail, lengthMm: mm(frame.innerLengthMm), quantity: pairs },
  ];
  const run = frame.legPairCentresMm[pairs - 1]! - frame.legPairCentresMm[0]!;
  const rise = topHeight - settings.top.thicknessMm - frame.railDepthMm - LEG_BRACE_HEIGHT_MM;
  if (run > 0 && rise > 0) {
    parts.push({ kind: 'diagonal-brace', material: rail, lengthMm: mm(Math.hypot(run, rise)), quantity: 2 });
  }
  return parts;
}
