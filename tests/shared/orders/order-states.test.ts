import { describe, expect, it } from 'vitest';
import {
  FINAL_STATES,
  ORDER_MOVES,
  ORDER_STATES,
  canMoveOrder,
  movesFrom,
  type OrderMove,
  type OrderState,
} from '../../../shared/orders/states';

/** The order lifecycle as the product describes it, written out move by move. */
const ALLOWED: Record<OrderMove, OrderState[]> = {
  pay: ['awaiting_payment'],
  payDeposit: ['awaiting_deposit'],
  finishBuild: ['in_build'],
  payBalance: ['awaiting_balance'],
  lapse: ['awaiting_payment', 'awaiting_deposit'],
  send: ['paid_held'],
  offerCollection: ['paid_held'],
  confirmReceipt: ['sent', 'ready_to_collect'],
  autoConfirm: ['sent', 'ready_to_collect'],
  payOut: ['received'],
  cancel: ['in_build', 'awaiting_balance', 'paid_held'],
  raiseProblem: ['in_build', 'awaiting_balance', 'paid_held', 'sent', 'ready_to_collect'],
  settleRefund: ['problem_raised'],
  settlePartRefund: ['problem_raised'],
  settleRelease: ['problem_raised'],
};

describe('order moves', () => {
  for (const move of Object.keys(ORDER_MOVES) as OrderMove[]) {
    it(`allows "${move}" only from ${ALLOWED[move].join(', ')}`, () => {
      for (const state of ORDER_STATES)
        expect(canMoveOrder(state, move), `${move} from ${state}`).toBe(ALLOWED[move].includes(state));
    });
  }

  it('lets nothing out of a final state', () => {
    for (const state of FINAL_STATES)
      for (const move of Object.keys(ORDER_MOVES) as OrderMove[])
        expect(canMoveOrder(state, move), `${move} from ${state}`).toBe(false);
  });

  it('never lets the browser mark an order paid: only verified payment events do', () => {
    for (const move of ['pay', 'payDeposit', 'payBalance'] as const) expect(ORDER_MOVES[move].by).toEqual(['payments']);
    expect(movesFrom('awaiting_payment', 'buyer')).toEqual(['lapse']);
  });

  it('offers the seller hand-over moves on a paid order and the buyer confirmation once handed over', () => {
    expect(movesFrom('paid_held', 'seller')).toEqual(['send', 'offerCollection', 'cancel', 'raiseProblem']);
    expect(movesFrom('sent', 'buyer')).toEqual(['confirmReceipt', 'raiseProblem']);
    expect(movesFrom('problem_raised', 'moderator')).toEqual(['settleRefund', 'settlePartRefund', 'settleRelease']);
  });
});
