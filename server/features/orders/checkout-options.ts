import { orderAmounts, type FeeRates } from '../../../shared/orders/money';
import { HANDOVER_LABELS, needsAddress, type HandoverMethod } from '../../../shared/orders/states';
import type { CheckoutOption } from '../../../shared/types/orders';
import type { ModuleDetails } from '../listings/listing-details';
import type { Listing } from '../listings/listing.entity';

interface Offered {
  handover: HandoverMethod;
  deliveryMinor: number;
  explanation: string;
}

/**
 * The ways a listed module can reach a buyer, from what its seller offered, with what each costs. Seller delivery
 * states its distance limit: the buyer confirms it by giving an address inside it (the seller may cancel with a
 * full refund if it is not). A courier is offered only with a price; listings saved before the price was asked
 * offer collection and delivery only.
 */
function offeredWays(listing: Listing, townName: string): Offered[] {
  const ways: Offered[] = [];
  if (listing.offersCollection)
    ways.push({
      handover: 'collection',
      deliveryMinor: 0,
      explanation: `Collect it from the seller near ${townName}; you agree a time together once you have paid.`,
    });
  if (listing.deliveryKm !== null)
    ways.push({
      handover: 'seller_delivery',
      deliveryMinor: listing.deliveryPriceMinor ?? 0,
      explanation: `The seller brings it to you if you live within ${listing.deliveryKm} km of ${townName}.`,
    });
  const courierPrice = listing.details.type === 'module' ? (listing.details as ModuleDetails).courierPriceMinor : null;
  if (listing.courier && typeof courierPrice === 'number')
    ways.push({
      handover: listing.courier,
      deliveryMinor: courierPrice,
      explanation:
        listing.courier === 'pallet'
          ? 'The seller has it strapped to a pallet and a pallet courier brings it to your door.'
          : 'The seller packs it and a parcel courier brings it to your door.',
    });
  return ways;
}

/** Each way with its full breakdown: item, delivery, buyer's fee and total. */
export function checkoutOptions(listing: Listing, rates: FeeRates, townName: string): CheckoutOption[] {
  return offeredWays(listing, townName).map((way) => {
    const a = orderAmounts(listing.priceMinor ?? 0, way.deliveryMinor, rates);
    return {
      handover: way.handover,
      label: HANDOVER_LABELS[way.handover],
      explanation: way.explanation,
      needsAddress: needsAddress(way.handover),
      itemMinor: a.itemMinor,
      deliveryMinor: a.deliveryMinor,
      buyerFeeMinor: a.buyerFeeMinor,
      totalMinor: a.totalMinor,
    };
  });
}
