import { Router } from 'express';
import { checkCurrency, checkPositiveAmount, formatMoney } from '../domain/amounts';
import { adjustBalance, available } from '../domain/balance';
import { invalidRequest, noSuchParam, notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import type { ApiContext } from '../http/context';
import { LIST_PARAMS, newestFirst, paginate } from '../http/list';
import { newId } from '../ids';
import { Params } from '../params';
import type { Runtime } from '../runtime';
import type { Charge, Transfer, TransferReversal } from '../types';

const EXPANDABLE = ['destination', 'source_transaction'] as const;

function findTransfer(ctx: ApiContext): Transfer {
  const id = ctx.path.id ?? '';
  const transfer = ctx.store.state.transfers[id];
  if (!transfer) throw notFound('transfer', id);
  return transfer;
}

/** What is left of a charge to fund transfers: captured minus refunded minus what other transfers took. */
function transferableFrom(ctx: ApiContext, charge: Charge): number {
  const transferred = Object.values(ctx.store.state.transfers)
    .filter((transfer) => transfer.source_transaction === charge.id)
    .reduce((sum, transfer) => sum + transfer.amount - transfer.amount_reversed, 0);
  return charge.amount_captured - charge.amount_refunded - transferred;
}

function create(ctx: ApiContext): Transfer {
  const p = new Params(ctx.raw, [
    'amount',
    'currency',
    'destination',
    'transfer_group',
    'source_transaction',
    'metadata',
    'description',
  ]);
  const amount = p.requiredInt('amount');
  checkPositiveAmount(amount);
  const currency = p.currency();
  checkCurrency(currency);
  const destinationId = p.requiredString('destination');
  const sourceId = p.string('source_transaction');
  const metadata = p.metadata() ?? {};
  const description = p.nullableString('description') ?? null;
  const transferGroup = p.nullableString('transfer_group') ?? null;

  const destination = ctx.store.state.accounts[destinationId];
  if (!destination) throw noSuchParam('destination', destinationId, 'destination');
  if (!destination.payouts_enabled || destination.capabilities.transfers !== 'active') {
    throw invalidRequest(
      'Your destination account needs to have at least one of the following capabilities enabled: transfers, crypto_transfers, legacy_payments',
      { code: 'insufficient_capabilities_for_transfer', param: 'destination' },
    );
  }
  if (sourceId !== undefined) {
    const source = ctx.store.state.charges[sourceId];
    if (!source) throw noSuchParam('charge', sourceId, 'source_transaction');
    if (source.status !== 'succeeded') {
      throw invalidRequest(`The source_transaction ${source.id} has not succeeded.`, { param: 'source_transaction' });
    }
    if (source.currency !== currency) {
      throw invalidRequest(
        `The currency of source_transaction's balance transaction (${source.currency}) must be the same as the transfer currency (${currency}).`,
        { param: 'currency' },
      );
    }
    const left = transferableFrom(ctx, source);
    if (amount > left) {
      throw invalidRequest(
        `The transfer amount (${formatMoney(amount, currency)}) exceeds what remains of source_transaction ${source.id} (${formatMoney(left, currency)}).`,
        { param: 'amount' },
      );
    }
  }
  if (available(ctx.store, currency) < amount) {
    throw invalidRequest(
      'You have insufficient available funds in your Stripe account. Try adding funds directly to your available balance by creating Charges using the 4000000000000077 test card.',
      { code: 'balance_insufficient' },
    );
  }
  const id = newId('tr');
  const transfer: Transfer = {
    id,
    object: 'transfer',
    amount,
    amount_reversed: 0,
    balance_transaction: newId('txn'),
    created: ctx.now(),
    currency,
    description,
    destination: destination.id,
    destination_payment: newId('py'),
    livemode: false,
    metadata,
    reversals: { object: 'list', data: [], has_more: false, total_count: 0, url: `/v1/transfers/${id}/reversals` },
    reversed: false,
    source_transaction: sourceId ?? null,
    source_type: 'card',
    transfer_group: transferGroup,
  };
  ctx.store.state.transfers[id] = transfer;
  adjustBalance(ctx.store, currency, -amount);
  ctx.emit('transfer.created', transfer);
  return transfer;
}

function retrieve(ctx: ApiContext): Transfer {
  new Params(ctx.raw, []);
  return findTransfer(ctx);
}

function list(ctx: ApiContext): object {
  const p = new Params(ctx.raw, [...LIST_PARAMS, 'destination', 'transfer_group']);
  const destination = p.string('destination');
  const transferGroup = p.string('transfer_group');
  const transfers = newestFirst(ctx.store.state.transfers).filter(
    (transfer) =>
      (destination === undefined || transfer.destination === destination) &&
      (transferGroup === undefined || transfer.transfer_group === transferGroup),
  );
  return paginate(transfers, p, '/v1/transfers', 'transfer');
}

function reverse(ctx: ApiContext): TransferReversal {
  const transfer = findTransfer(ctx);
  const p = new Params(ctx.raw, ['amount', 'metadata', 'description']);
  const metadata = p.metadata() ?? {};
  p.string('description');
  const remaining = transfer.amount - transfer.amount_reversed;
  if (remaining <= 0) {
    throw invalidRequest(`Transfer ${transfer.id} has already been fully reversed.`, {});
  }
  const amount = p.int('amount') ?? remaining;
  checkPositiveAmount(amount);
  if (amount > remaining) {
    throw invalidRequest(
      `Reversal amount (${formatMoney(amount, transfer.currency)}) is greater than the amount not yet reversed (${formatMoney(remaining, transfer.currency)}).`,
      { code: 'amount_too_large', param: 'amount' },
    );
  }
  const reversal: TransferReversal = {
    id: newId('trr'),
    object: 'transfer_reversal',
    amount,
    balance_transaction: newId('txn'),
    created: ctx.now(),
    currency: transfer.currency,
    destination_payment_refund: newId('pyr'),
    metadata,
    source_refund: null,
    transfer: transfer.id,
  };
  const previous = { amount_reversed: transfer.amount_reversed, reversed: transfer.reversed };
  transfer.reversals.data.unshift(reversal);
  transfer.reversals.total_count += 1;
  transfer.amount_reversed += amount;
  transfer.reversed = transfer.amount_reversed === transfer.amount;
  adjustBalance(ctx.store, transfer.currency, amount);
  ctx.emit('transfer.reversed', transfer, previous);
  return reversal;
}

function listReversals(ctx: ApiContext): object {
  const transfer = findTransfer(ctx);
  const p = new Params(ctx.raw, [...LIST_PARAMS]);
  return paginate(transfer.reversals.data, p, transfer.reversals.url, 'transfer_reversal');
}

function retrieveReversal(ctx: ApiContext): TransferReversal {
  const transfer = findTransfer(ctx);
  new Params(ctx.raw, []);
  const id = ctx.path.reversal ?? '';
  const reversal = transfer.reversals.data.find((item) => item.id === id);
  if (!reversal) throw notFound('transfer_reversal', id);
  return reversal;
}

export function transferRoutes(runtime: Runtime): Router {
  const router = Router();
  router.post('/v1/transfers', apiRoute(runtime, create, { expandable: EXPANDABLE }));
  router.get('/v1/transfers', apiRoute(runtime, list, { expandable: EXPANDABLE.map((f) => `data.${f}`) }));
  router.get('/v1/transfers/:id', apiRoute(runtime, retrieve, { expandable: EXPANDABLE }));
  router.post('/v1/transfers/:id/reversals', apiRoute(runtime, reverse, { expandable: ['transfer'] }));
  router.get('/v1/transfers/:id/reversals', apiRoute(runtime, listReversals));
  router.get(
    '/v1/transfers/:id/reversals/:reversal',
    apiRoute(runtime, retrieveReversal, { expandable: ['transfer'] }),
  );
  return router;
}
