import type { LatLon } from '../../../shared/geo';
import type { ListingInput, ModuleListingInput, ServiceListingInput } from '../../../shared/schemas/listings';
import { scaleById } from '../../../shared/scales';
import type { ModuleDetailsView, ServiceDetailsView } from '../../../shared/types/listings';
import type { ModuleDetails, ServiceDetails } from './listing-details';
import type { Listing } from './listing.entity';

/** Columns that only modules fill. */
function clearModuleColumns(l: Listing): void {
  l.scaleId = l.lengthMm = l.widthMm = l.heightMm = l.boardCount = null;
  l.joinMethod = l.finish = l.condition = l.control = l.courier = null;
  l.priceMinor = l.weightG = l.deliveryKm = l.deliveryPriceMinor = null;
  l.offersCollection = null;
  l.endProfiles = null;
}

function applyModule(l: Listing, input: ModuleListingInput): void {
  l.scaleId = input.scaleId;
  l.lengthMm = input.lengthMm;
  l.widthMm = input.widthMm;
  l.heightMm = input.heightMm;
  l.boardCount = input.boardCount;
  l.joinMethod = input.joinMethod;
  l.finish = input.finish;
  l.condition = input.condition;
  l.control = input.wiring?.control ?? null;
  l.priceMinor = input.priceMinor;
  l.weightG = Math.round(input.weightKg * 1000);
  l.offersCollection = input.handling.collection;
  l.deliveryKm = input.handling.delivery?.withinKm ?? null;
  l.deliveryPriceMinor = input.handling.delivery?.priceMinor ?? null;
  l.courier = input.handling.courier;
  l.endProfiles = input.endProfiles;
  l.serviceAreaKm = l.leadTimeWeeks = null;
  const details: ModuleDetails = {
    type: 'module',
    levels: input.levels,
    construction: input.construction,
    wiring: input.wiring
      ? { busWireMm2: input.wiring.busWireMm2, boardConnectors: input.wiring.boardConnectors }
      : null,
    conditionNotes: input.conditionNotes,
    courierPriceMinor: input.handling.courier ? (input.handling.courierPriceMinor ?? null) : null,
    weightSource: input.weightSource,
  };
  l.details = details;
}

function applyService(l: Listing, input: ServiceListingInput): void {
  clearModuleColumns(l);
  l.serviceAreaKm = input.serviceAreaKm;
  l.leadTimeWeeks = input.leadTimeWeeks;
  const details: ServiceDetails = {
    type: 'service',
    builds: input.builds,
    materialsSupplied: input.materialsSupplied,
    rateCard: input.rateCard,
  };
  l.details = details;
}

/** Write a whole listing input onto the entity; `position` is already rounded and checked against the town. */
export function applyListingInput(l: Listing, input: ListingInput, position: LatLon): void {
  l.kind = input.kind;
  l.title = input.title;
  l.description = input.description;
  l.currency = input.currency;
  l.townId = input.townId;
  l.latitude = position.lat;
  l.longitude = position.lon;
  if (input.kind === 'module') applyModule(l, input);
  else applyService(l, input);
}

/** A module's specification, read back from its columns and details. */
export function moduleDetailsOf(l: Listing): ModuleDetailsView | null {
  const d = l.details;
  const scale = l.scaleId ? scaleById(l.scaleId) : undefined;
  if (l.kind !== 'module' || d.type !== 'module' || !scale || !l.endProfiles) return null;
  return {
    scale,
    lengthMm: l.lengthMm!,
    widthMm: l.widthMm!,
    heightMm: l.heightMm!,
    boardCount: l.boardCount!,
    joinMethod: l.joinMethod!,
    levels: d.levels,
    construction: d.construction,
    wiring: d.wiring && l.control ? { control: l.control, ...d.wiring } : null,
    endProfiles: l.endProfiles,
    finish: l.finish!,
    condition: l.condition!,
    conditionNotes: d.conditionNotes,
    priceMinor: l.priceMinor!,
    handling: {
      collection: l.offersCollection ?? false,
      delivery: l.deliveryKm !== null ? { withinKm: l.deliveryKm, priceMinor: l.deliveryPriceMinor ?? 0 } : null,
      courier: l.courier,
      courierPriceMinor: l.courier ? (d.courierPriceMinor ?? null) : null,
    },
    weightKg: (l.weightG ?? 0) / 1000,
    weightSource: d.weightSource ?? 'entered',
  };
}

/** A service's offer, read back from its columns and details. */
export function serviceDetailsOf(l: Listing): ServiceDetailsView | null {
  const d = l.details;
  if (l.kind !== 'service' || d.type !== 'service') return null;
  return {
    builds: d.builds,
    serviceAreaKm: l.serviceAreaKm!,
    leadTimeWeeks: l.leadTimeWeeks!,
    materialsSupplied: d.materialsSupplied,
    rateCard: d.rateCard,
  };
}
