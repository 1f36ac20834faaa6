import type { BoardWiring, PlannedBoard } from '@shared/planner';
import { ownLegs } from './board-drawing';

type Format = (mm: number, options?: { fine?: boolean }) => string;

const SUPPORTS: Record<PlannedBoard['frame']['support'], string> = {
  legs: 'on its own legs',
  carried: 'carried on the legs of the board below',
  brackets: 'on a wall batten and brackets',
  ends: 'resting on its neighbours at each end',
};

/** The plan view in words, for people who cannot see the drawing. */
export function boardDescription(board: PlannedBoard, wiring: BoardWiring | undefined, format: Format): string {
  const { frame } = board;
  const centres = frame.crossMemberCentresMm.map((c) => format(c)).join(', ');
  const parts = [
    `${format(board.lengthMm)} by ${format(board.widthMm)} board, ${SUPPORTS[frame.support]}.`,
    `Ladder frame: two side rails and two end rails, with ${frame.crossMemberCentresMm.length} cross members` +
      (centres ? ` at ${centres} from the start end.` : '.'),
  ];
  const legs = ownLegs(board).length;
  if (legs > 0) parts.push(`${legs} legs inside the frame.`);
  if (frame.bracketCentresMm.length > 0) parts.push(`${frame.bracketCentresMm.length} brackets.`);
  if (wiring) {
    parts.push(
      `${wiring.runs.length} bus pairs run its length through ${format(wiring.holes.diameterMm, { fine: true })} holes ` +
        `drilled in every cross member, and ${wiring.droppers.pairs} dropper pairs feed the track.`,
    );
  }
  return parts.join(' ');
}
