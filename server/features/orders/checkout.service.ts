import { In, type EntityManager } from 'typeorm';
import { PUBLIC_LISTING_STATES } from '../../../shared/listings/states';
import { orderAmounts } from '../../../shared/orders/money';
import { HANDOVER_LABELS } from '../../../shared/orders/states';
import { RESERVATION_MINUTES } from '../../../shared/orders/timing';
import type { CreateOrderInput } from '../../../shared/schemas/checkout';
import type { CheckoutPreview, OrderView } from '../../../shared/types/orders';
import type { AppContext } from '../../app-context';
import { conflict, forbidden, notFound, validationFailed } from '../../http/errors';
import { moveListing } from '../listings/listing-lifecycle';
import { Listing } from '../listings/listing.entity';
import { ListingPhoto } from '../photos/listing-photo.entity';
import { photoUrl } from '../photos/photo.presenter';
import { gazetteer } from '../towns/gazetteer';
import { User } from '../users/user.entity';
import { checkoutOptions } from './checkout-options';
import { currentFeeRates } from './fee-rates';
import { localPayments } from './order-payments.service';
import { loadOrderFor, type OrderViewer } from './order-access';
import { lapseUnpaidOrder } from './order-lapse.job';
import { noteOrderEvent } from './order-lifecycle';
import { orderViewOf } from './order.presenter';
import { Order } from './order.entity';

const RESERVED_MESSAGE =
  `Someone has just reserved this module and is paying for it now. If they do not finish within ` +
  `${RESERVATION_MINUTES} minutes it is offered again: save it to your shortlist and look back later.`;

/** A module listing anyone may see, or 404 (drafts, services and hidden listings are not for sale here). */
function saleableOrNotFound(listing: Listing | null): Listing {
  if (!listing || listing.kind !== 'module' || !PUBLIC_LISTING_STATES.includes(listing.state) || !listing.priceMinor)
    throw notFound('That module');
  return listing;
}

const townNameOf = async (townId: number) => (await gazetteer()).find(townId)?.name ?? 'the seller’s town';

/** The viewer's own order for a listing that still waits for payment, if any. */
const openOrderOf = (m: EntityManager, listingId: number, buyerId: number) =>
  m.findOne(Order, { where: { listingId, buyerId, state: In(['awaiting_payment']) }, order: { id: 'DESC' } });

/** What the buyer would pay for each way the module can reach them, before they give any detail. */
export async function previewCheckout(
  ctx: AppContext,
  viewer: OrderViewer,
  listingId: number,
): Promise<CheckoutPreview> {
  return ctx.transaction(async (m) => {
    const listing = saleableOrNotFound(await m.findOneBy(Listing, { id: listingId }));
    const seller = await m.findOneByOrFail(User, { id: listing.ownerId });
    const rates = await currentFeeRates(m);
    const cover = await m.findOne(ListingPhoto, {
      where: { listingId },
      order: { isCover: 'DESC', position: 'ASC' },
    });
    const townName = await townNameOf(listing.townId);
    const open = await openOrderOf(m, listingId, viewer.id);
    return {
      listing: {
        id: listing.id,
        title: listing.title,
        townName,
        coverThumbUrl: cover ? photoUrl(cover.storageKey, 'thumb') : null,
      },
      seller: { id: seller.id, displayName: seller.displayName },
      currency: listing.currency,
      buyerFeeBps: rates.buyerFeeBps,
      options: checkoutOptions(listing, rates, townName),
      available: listing.state === 'listed' && listing.ownerId !== viewer.id,
      openOrderId: open?.id ?? null,
      reservationMinutes: RESERVATION_MINUTES,
      testCards: localPayments(ctx.config),
    };
  });
}

/**
 * Start buying a listed module. In one transaction: lock the listing row, reserve it, and create the order with
 * its amounts and rates fixed, held for RESERVATION_MINUTES. Of many buyers at once, the first to lock the row
 * reserves it; the others find it reserved and get 409 `listing_reserved`. A buyer who already has an unpaid
 * order for it (a double click) gets that order back.
 */
export async function createOrder(
  ctx: AppContext,
  buyer: OrderViewer,
  input: CreateOrderInput,
): Promise<{ order: OrderView; created: boolean }> {
  return ctx.transaction(async (m) => {
    const listing = saleableOrNotFound(
      await m.findOne(Listing, { where: { id: input.listingId }, lock: { mode: 'pessimistic_write' } }),
    );
    if (listing.ownerId === buyer.id) throw forbidden('This is your own listing, so you cannot buy it.');
    if (listing.state !== 'listed') {
      const open = await openOrderOf(m, listing.id, buyer.id);
      if (open) return { order: await orderViewOf(m, open, 'buyer'), created: false };
      if (listing.state === 'sold') throw conflict('listing_sold', 'This module has been sold.');
      throw conflict('listing_reserved', RESERVED_MESSAGE);
    }
    const rates = await currentFeeRates(m);
    const option = checkoutOptions(listing, rates, await townNameOf(listing.townId)).find(
      (o) => o.handover === input.handover,
    );
    if (!option) {
      throw validationFailed({
        handover: `The seller does not offer “${HANDOVER_LABELS[input.handover]}” for this module. Choose another way.`,
      });
    }
    const amounts = orderAmounts(listing.priceMinor!, option.deliveryMinor, rates);
    const now = new Date();
    const order = await m.save(
      m.create(Order, {
        kind: 'module',
        state: 'awaiting_payment',
        listingId: listing.id,
        quoteId: null,
        buyerId: buyer.id,
        sellerId: listing.ownerId,
        currency: listing.currency,
        handover: input.handover,
        deliveryAddress: option.needsAddress ? (input.deliveryAddress ?? null) : null,
        ...amounts,
        commissionBps: rates.commissionBps,
        buyerFeeBps: rates.buyerFeeBps,
        depositMinor: 0,
        payableUntil: new Date(now.getTime() + RESERVATION_MINUTES * 60_000),
        stateChangedAt: now,
      }),
    );
    await moveListing(m, listing, 'reserve', { id: buyer.id, ip: buyer.ip, as: 'orders' }, { orderId: order.id });
    await noteOrderEvent(m, order, 'create', { as: 'buyer', id: buyer.id, ip: buyer.ip }, null);
    const saved = await m.findOneByOrFail(Order, { id: order.id });
    return { order: await orderViewOf(m, saved, 'buyer'), created: true };
  });
}

/** An order as the viewer may see it (buyer, seller, or a moderator once a problem was raised), else 404. */
export async function readOrder(ctx: AppContext, viewer: OrderViewer, orderId: number): Promise<OrderView> {
  return ctx.transaction(async (m) => {
    const { order, role } = await loadOrderFor(m, viewer, orderId);
    return orderViewOf(m, order, role);
  });
}

/** The buyer gives up before paying: the order lapses and the module is offered to others at once. */
export async function giveUp(ctx: AppContext, viewer: OrderViewer, orderId: number): Promise<OrderView> {
  return ctx.transaction(async (m) => {
    const { order, role } = await loadOrderFor(m, viewer, orderId, { lock: true });
    if (role !== 'buyer') throw forbidden('Only the buyer can give up an unpaid order.');
    const outcome = await lapseUnpaidOrder(ctx, m, order, { as: 'buyer', id: viewer.id, ip: viewer.ip });
    if (outcome === 'paid_meanwhile')
      throw conflict('order_paid', 'Your payment has just gone through, so the order can no longer be given up.');
    return orderViewOf(m, order, role);
  });
}
