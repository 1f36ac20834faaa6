import { CROSS_MEMBER_SPACING_IMPERIAL_MM, CROSS_MEMBER_SPACING_METRIC_MM } from '../defaults';
import { roomShape } from './check-room';
import type { PlanInputFields } from './object';
import { resolveSection } from './sections';

/**
 * Fills in the defaults that depend on other fields: the cross-member spacing from the units, the walls used and
 * whether the room is closed, board ids and names, the sections' sizes, and the sheet's long side first.
 */
export function resolvePlanInput(input: PlanInputFields) {
  const { construction } = input;
  const { supports, sheetSizeMm } = construction;
  const imperial = input.units === 'imperial';
  return {
    ...input,
    boards: input.boards.map((board, i) => ({
      ...board,
      id: board.id ?? `board-${i + 1}`,
      name: board.name ?? `Board ${i + 1}`,
    })),
    room: input.room === undefined ? undefined : resolveRoom(input.room),
    construction: {
      ...construction,
      frameSection: resolveSection(construction.frameSection),
      crossMemberSpacingMm:
        construction.crossMemberSpacingMm ??
        (imperial ? CROSS_MEMBER_SPACING_IMPERIAL_MM : CROSS_MEMBER_SPACING_METRIC_MM),
      supports: supports.kind === 'legs' ? { ...supports, ...resolveSection(supports) } : supports,
      sheetSizeMm: {
        lengthMm: Math.max(sheetSizeMm.lengthMm, sheetSizeMm.widthMm),
        widthMm: Math.min(sheetSizeMm.lengthMm, sheetSizeMm.widthMm),
      },
    },
  };
}

/** The room with the walls used and whether it is closed filled in; plain, mutable data like the rest of the input. */
function resolveRoom(room: NonNullable<PlanInputFields['room']>) {
  const shape = roomShape(room);
  return { ...room, useWalls: [...shape.useWalls], closed: shape.closed };
}
