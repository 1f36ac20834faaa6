import { handlingAdvice, type LiftBy } from '@shared/planner/engineering/handling';
import { shippingWeight, type BoxSize } from '@shared/planner/engineering/shipping';
import type { Currency } from '@shared/listings/vocabulary';
import type { ModuleDetailsView } from '@shared/types/listings';
import { formatMoney } from '@/utils/format';

/** What the handling box says about moving one board and getting the module home. */
export interface HandlingSummary {
  weightKg: number;
  lift: { by: LiftBy; headline: string; explanation: string; caution: string };
  /** How the board travels without the buyer's own car: a parcel (with its sizes), a pallet, or not at all. */
  carriage:
    | { kind: 'parcel'; packed: BoxSize; volumetricKg: number; chargeableKg: number }
    | { kind: 'pallet' }
    | { kind: 'collect' };
  /** Each way offered, with what it costs the buyer. */
  ways: { label: string; cost: string }[];
}

const LIFT_HEADLINES: Record<LiftBy, string> = {
  'one-person': 'One person can lift it',
  'two-person': 'A two-person lift',
  'three-person': 'A three-person lift',
  'mechanical-or-dismantle': 'Too heavy to lift by hand',
};

/** Kilograms to one decimal place: "9.5 kg". */
export const kgText = (kg: number) => `${kg.toLocaleString('en-GB', { maximumFractionDigits: 1 })} kg`;

/**
 * Lift advice by the HSE manual handling guideline (via the planner's `handlingAdvice`), the packed parcel and
 * its volumetric weight by the courier convention (L × W × H cm / 5000, via `shippingWeight`), and the ways home.
 */
export function handlingSummary(m: ModuleDetailsView, currency: Currency, townName: string): HandlingSummary {
  const advice = handlingAdvice(m.weightKg);
  const lift = {
    by: advice.liftBy,
    headline: LIFT_HEADLINES[advice.liftBy],
    explanation: advice.explanation,
    caution: advice.caution,
  };
  const { handling } = m;
  let carriage: HandlingSummary['carriage'] = { kind: 'collect' };
  if (handling.courier === 'parcel') {
    const w = shippingWeight({ lengthMm: m.lengthMm, widthMm: m.widthMm, heightMm: m.heightMm }, m.weightKg);
    carriage = { kind: 'parcel', packed: w.packed, volumetricKg: w.volumetricKg, chargeableKg: w.chargeableKg };
  } else if (handling.courier === 'pallet') carriage = { kind: 'pallet' };

  const ways: HandlingSummary['ways'] = [];
  if (handling.collection) ways.push({ label: `Collect it from near ${townName}`, cost: 'No charge' });
  if (handling.delivery) {
    const price = handling.delivery.priceMinor;
    ways.push({
      label: `The seller delivers within ${handling.delivery.withinKm} km of ${townName}`,
      cost: price === 0 ? 'Free' : formatMoney(price, currency),
    });
  }
  const courierPrice = handling.courierPriceMinor;
  const courierCost = (unpriced: string) =>
    typeof courierPrice === 'number' ? (courierPrice === 0 ? 'Free' : formatMoney(courierPrice, currency)) : unpriced;
  if (carriage.kind === 'parcel')
    ways.push({
      label: `Parcel courier, charged on ${kgText(carriage.chargeableKg)}`,
      cost: courierCost('The courier’s price'),
    });
  if (carriage.kind === 'pallet')
    ways.push({ label: 'Pallet courier', cost: courierCost('The pallet service’s price') });
  return { weightKg: m.weightKg, lift, carriage, ways };
}
