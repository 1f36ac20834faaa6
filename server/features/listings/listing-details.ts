import type { ModuleListingInput, ServiceListingInput } from '../../../shared/schemas/listings';

/** What a module keeps in `listings.details`: the specification nobody filters on. */
export interface ModuleDetails {
  type: 'module';
  levels: ModuleListingInput['levels'];
  construction: ModuleListingInput['construction'];
  /** Bus wire and connectors; the control system is a column. NULL when unwired. */
  wiring: { busWireMm2: number; boardConnectors: string } | null;
  conditionNotes: string;
  /** What a buyer pays for the courier; absent on rows saved before it was asked. */
  courierPriceMinor?: number | null;
  /** Whether the seller weighed the board or took the planner's estimate; absent on rows saved before it was asked. */
  weightSource?: ModuleListingInput['weightSource'];
}

/** What a service keeps in `listings.details`. */
export interface ServiceDetails {
  type: 'service';
  builds: ServiceListingInput['builds'];
  materialsSupplied: ServiceListingInput['materialsSupplied'];
  rateCard: ServiceListingInput['rateCard'];
}

export type ListingDetails = ModuleDetails | ServiceDetails;
