/** A conductor size the IEC table lists, mm². */
export type IecAreaMm2 = 0.5 | 0.75 | 1 | 1.5 | 2.5;

/** IEC conductor classes: 1/2 solid or stranded, 5/6 flexible. */
export type IecClass = '1/2' | '5/6';

/** An AWG size listed, solid. */
export type AwgGauge = 14 | 16 | 18 | 22;

/** Maximum DC resistance at 20 °C of plain copper conductors, Ω/km, smallest conductor first. */
export const IEC_60228_MAX_OHM_PER_KM: readonly { areaMm2: IecAreaMm2; class12: number; class56: number }[] = [
  { areaMm2: 0.5, class12: 36.0, class56: 39.0 }, // IEC 60228, class 1/2 and class 5/6
  { areaMm2: 0.75, class12: 24.5, class56: 26.0 }, // IEC 60228, class 1/2 and class 5/6
  { areaMm2: 1, class12: 18.1, class56: 19.5 }, // IEC 60228, class 1/2 and class 5/6
  { areaMm2: 1.5, class12: 12.1, class56: 13.3 }, // IEC 60228, class 1/2 and class 5/6
  { areaMm2: 2.5, class12: 7.41, class56: 7.98 }, // IEC 60228, class 1/2 and class 5/6
];

/** Resistance of solid copper AWG sizes at 20 °C, Ω/km, smallest conductor (largest number) first. */
export const AWG_SOLID_OHM_PER_KM: readonly { gauge: AwgGauge; ohmPerKm: number }[] = [
  { gauge: 22, ohmPerKm: 52.94 }, // standard AWG tables
  { gauge: 18, ohmPerKm: 20.94 }, // standard AWG tables
  { gauge: 16, ohmPerKm: 13.17 }, // standard AWG tables
  { gauge: 14, ohmPerKm: 8.28 }, // standard AWG tables
];

/** AWG diameter law: d = 0.127 mm × 92^((36 − n) / 39). */
export const AWG_DIAMETER_LAW = { d36Mm: 0.127, ratio: 92, steps: 39 }; // standard AWG tables

/** Resistivity of annealed copper at 20 °C, Ω·mm²/m: 1/58. */
export const COPPER_RESISTIVITY_OHM_MM2_PER_M = 1 / 58; // IEC 60028 — from memory

/** Temperature coefficient of copper's resistance near 20 °C, per kelvin. */
export const COPPER_TEMPERATURE_COEFFICIENT_PER_K = 0.00393; // from memory

/** The temperature the tables give resistance at, °C. */
export const REFERENCE_TEMPERATURE_C = 20; // IEC 60228

/** Wire left at each end of a bus run for making the connection, mm. */
export const DEFAULT_END_ALLOWANCE_MM = 150; // common practice, no source

/** One dropper pair per rail section of this length, mm. */
export const DEFAULT_DROPPER_SECTION_MM = 1000; // common practice, no source

/** Length of each dropper wire, from the rail down through the top to the bus, mm. */
export const DEFAULT_DROPPER_LENGTH_MM = 150; // common practice, no source

/** Clearance added to what passes through a hole in a cross member, mm. */
export const DEFAULT_HOLE_CLEARANCE_MM = 2; // common practice, no source

/** Drill sizes are rounded up to this step, mm. */
export const DRILL_STEP_MM = 0.5; // common practice, no source

/** Keep a dropper this far clear of a cross member's face so it drops past it, mm. */
export const DROPPER_CLEARANCE_MM = 10; // common practice, no source

/**
 * Holes through a cross member: at mid-depth, no wider than a quarter of the depth, centres at least three hole
 * diameters apart.
 */
export const HOLE_RULES = { maxFractionOfDepth: 0.25, minCentresInDiameters: 3 }; // from memory (house-joist guidance)
