/** Manual handling guideline for one person, kg: close to the body at waist height. A guideline, not a limit. */
export const HSE_ONE_PERSON_KG = 25; // published: HSE manual handling guideline (UK, L23 / INDG143), men

/** The same guideline's figure for women, kg; pass it as the person's capacity where it applies. */
export const HSE_ONE_PERSON_WOMEN_KG = 16; // published: HSE manual handling guideline (UK, L23 / INDG143), women

/** Team lifting: the share of the sum of the lifters' capacities a team may handle. */
export const HSE_TEAM_FACTOR = {
  two: 2 / 3, // published: team lifting (HSE), two people — two-thirds of the sum of their capacities
  three: 1 / 2, // published: team lifting (HSE), three people — half the sum of their capacities
};

/** Beyond this many lifters a team lift is unlikely to work. */
export const HSE_TEAM_MAX_PEOPLE = 4; // published: team lifting (HSE), more than four unlikely to work

/** Courier volumetric divisor: L × W × H in cm / 5000 = kg. */
export const COURIER_DIVISOR_CM3_PER_KG = 5000; // published (courier convention)

/** Air cargo volumetric divisor: cm³ per kg. */
export const IATA_DIVISOR_CM3_PER_KG = 6000; // published (IATA)

/** US dimensional weight divisor: cubic inches per pound. */
export const US_DIVISOR_IN3_PER_LB = 139; // published (US, inches)

/** Padding added on every side of a board when it is packed, mm. */
export const DEFAULT_PACKING_PADDING_MM = 50; // common practice, no source
