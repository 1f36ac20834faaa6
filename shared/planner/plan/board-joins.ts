import { CLAMPS_PER_JOIN } from '../defaults';
import { boardJoinFixings } from '../engineering/board-joins';

/** How neighbouring boards are held together. */
export type JoinMethod = 'bolts' | 'dowels' | 'pattern-makers-dowels' | 'clamps';

/** The fixings for every board-to-board join of the plan. */
export interface JoinFixingsPlan {
  method: JoinMethod;
  joins: number;
  perJoin: number;
  total: number;
  /** For bolts: the coach bolt, its clearance hole, and the washers and wing nuts to go with them. */
  bolt?: { diameterMm: number; lengthMm: number; clearanceHoleMm: number; washers: number; wingNuts: number };
  note: string;
}

const LIFT_OUT_NOTE = ' A lift-out rests on its neighbours’ end rails and is located by the same fixings.';

/**
 * Fixings for `joins` joins through end rails `endRailThicknessMm` thick: two per join — coach bolts with washers
 * and wing nuts, dowels (plain or pattern-makers’) to line the boards up, or clamps.
 */
export function joinFixings(
  method: JoinMethod,
  joins: number,
  endRailThicknessMm: number,
  liftOuts: number,
): JoinFixingsPlan {
  const liftOutNote = liftOuts > 0 ? LIFT_OUT_NOTE : '';
  if (method === 'clamps') {
    return {
      method,
      joins,
      perJoin: CLAMPS_PER_JOIN,
      total: CLAMPS_PER_JOIN * joins,
      note: `Clamp the end rails together with the boards in line and their tops level.${liftOutNote}`,
    };
  }
  const fixings = boardJoinFixings(joins, endRailThicknessMm, method === 'bolts' ? 'bolts' : 'dowels');
  const dowelNote =
    method === 'dowels'
      ? 'Fit each pair of dowels with the boards clamped in line, then hold the join with a bolt, clamp or catch.'
      : fixings.note;
  return {
    method,
    joins,
    perJoin: fixings.perJoin,
    total: fixings.total,
    ...(fixings.bolt === undefined ? {} : { bolt: fixings.bolt }),
    note: `${dowelNote}${liftOutNote}`,
  };
}
