import { EngineeringInputError, requireFinite, requireNonNegative, requirePositive } from './checks';
import {
  AWG_DIAMETER_LAW,
  AWG_SOLID_OHM_PER_KM,
  type AwgGauge,
  COPPER_RESISTIVITY_OHM_MM2_PER_M,
  COPPER_TEMPERATURE_COEFFICIENT_PER_K,
  IEC_60228_MAX_OHM_PER_KM,
  type IecAreaMm2,
  type IecClass,
  REFERENCE_TEMPERATURE_C,
} from './wiring-data';

/** A copper conductor: by IEC size and class (maximum resistance), by AWG, or by area from resistivity. */
export type Conductor =
  | { kind: 'iec'; areaMm2: IecAreaMm2; class: IecClass }
  | { kind: 'awg'; gauge: AwgGauge }
  | { kind: 'area'; areaMm2: number };

/** A family of conductor sizes to choose from, smallest first. */
export type ConductorFamily = 'iec-1/2' | 'iec-5/6' | 'awg';

/** Diameter of a solid AWG conductor, mm: 0.127 mm × 92^((36 − n) / 39). */
export function awgDiameterMm(gauge: number): number {
  requireFinite(gauge, 'AWG size', 'gauge numbers');
  const { d36Mm, ratio, steps } = AWG_DIAMETER_LAW;
  return d36Mm * ratio ** ((36 - gauge) / steps);
}

/** Resistance of a copper conductor of `areaMm2` at 20 °C from resistivity, Ω/m. */
export function resistanceFromAreaOhmPerM(areaMm2: number): number {
  requirePositive(areaMm2, 'Conductor area', 'mm²');
  return COPPER_RESISTIVITY_OHM_MM2_PER_M / areaMm2;
}

function at20OhmPerM(conductor: Conductor): number {
  if (conductor.kind === 'area') return resistanceFromAreaOhmPerM(conductor.areaMm2);
  if (conductor.kind === 'awg') {
    const row = AWG_SOLID_OHM_PER_KM.find((r) => r.gauge === conductor.gauge);
    if (row === undefined) throw new EngineeringInputError(`AWG ${conductor.gauge} is not listed.`, 'conductor');
    return row.ohmPerKm / 1000;
  }
  const row = IEC_60228_MAX_OHM_PER_KM.find((r) => r.areaMm2 === conductor.areaMm2);
  if (row === undefined) throw new EngineeringInputError(`${conductor.areaMm2} mm² is not listed.`, 'conductor');
  return (conductor.class === '1/2' ? row.class12 : row.class56) / 1000;
}

/** Resistance of one conductor per metre, Ω/m, corrected from 20 °C to `temperatureC` (default 20 °C). */
export function resistanceOhmPerM(conductor: Conductor, temperatureC = REFERENCE_TEMPERATURE_C): number {
  requireFinite(temperatureC, 'Temperature', '°C');
  const factor = 1 + COPPER_TEMPERATURE_COEFFICIENT_PER_K * (temperatureC - REFERENCE_TEMPERATURE_C);
  return at20OhmPerM(conductor) * factor;
}

/** A run of two conductors (out and back) carrying a current. */
export interface VoltageDropInput {
  /** One-way length of the run, m. */
  lengthM: number;
  currentA: number;
  conductor: Conductor;
  /** Conductor temperature, °C; default 20. */
  temperatureC?: number;
}

/** Voltage lost over the loop, out and back: 2 × L × R × I, in volts. */
export function voltageDrop(input: VoltageDropInput): number {
  requireNonNegative(input.lengthM, 'Run length', 'metres');
  requireNonNegative(input.currentA, 'Current', 'amperes');
  return 2 * input.lengthM * resistanceOhmPerM(input.conductor, input.temperatureC) * input.currentA;
}

/** The sizes of a family, smallest conductor first. */
export function conductorsOf(family: ConductorFamily): Conductor[] {
  if (family === 'awg') return AWG_SOLID_OHM_PER_KM.map((r) => ({ kind: 'awg', gauge: r.gauge }));
  const cls: IecClass = family === 'iec-1/2' ? '1/2' : '5/6';
  return IEC_60228_MAX_OHM_PER_KM.map((r) => ({ kind: 'iec', areaMm2: r.areaMm2, class: cls }));
}

/** The smallest conductor of a family whose loop drop stays within `limitV`, with that drop; `null` if none does. */
export function smallestPassingConductor(
  limitV: number,
  run: Omit<VoltageDropInput, 'conductor'> & { family: ConductorFamily },
): { conductor: Conductor; dropV: number } | null {
  requireNonNegative(limitV, 'Allowed voltage drop', 'volts');
  for (const conductor of conductorsOf(run.family)) {
    const dropV = voltageDrop({ ...run, conductor });
    if (dropV <= limitV) return { conductor, dropV };
  }
  return null;
}
