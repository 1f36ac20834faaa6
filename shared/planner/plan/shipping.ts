import type { LayoutBoard } from '../boards/types';
import { shippingWeight, type ShippingWeight } from '../engineering/shipping';
import type { FrameLayout } from '../frame/types';

/** One board packed for a courier, legs off and laid inside its frame. */
export interface BoardShipping extends ShippingWeight {
  boardId: string;
}

/**
 * Each board packed flat with padding all round: its length and width, and the depth of its frame and top (legs and
 * braces taken off and packed inside the frame). Chargeable weight is the greater of actual and volumetric.
 */
export function planShipping(
  boards: readonly { board: LayoutBoard; frame: FrameLayout; massKg: number }[],
  topThicknessMm: number,
): BoardShipping[] {
  return boards.map(({ board, frame, massKg }) => ({
    boardId: board.id,
    ...shippingWeight(
      { lengthMm: board.lengthMm, widthMm: board.widthMm, heightMm: frame.railDepthMm + topThicknessMm },
      massKg,
    ),
  }));
}
