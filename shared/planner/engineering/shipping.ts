import { requireNonNegative, requirePositive } from './checks';
import { COURIER_DIVISOR_CM3_PER_KG, DEFAULT_PACKING_PADDING_MM, US_DIVISOR_IN3_PER_LB } from './weight-data';

/** A box's outside sizes, mm. */
export interface BoxSize {
  lengthMm: number;
  widthMm: number;
  heightMm: number;
}

/**
 * Volumetric ("dimensional") weight in kg from a parcel's sizes in centimetres: L × W × H / divisor. The divisor is
 * the carrier's: 5000 cm³/kg by courier convention (default), 6000 for air cargo (IATA).
 */
export function volumetricWeight(
  lengthCm: number,
  widthCm: number,
  heightCm: number,
  divisor = COURIER_DIVISOR_CM3_PER_KG,
): number {
  requirePositive(lengthCm, 'Length', 'centimetres');
  requirePositive(widthCm, 'Width', 'centimetres');
  requirePositive(heightCm, 'Height', 'centimetres');
  requirePositive(divisor, 'Volumetric divisor', 'cm³ per kg');
  return (lengthCm * widthCm * heightCm) / divisor;
}

/** Dimensional weight in pounds from sizes in inches: L × W × H / 139 in³ per lb (US). */
export function volumetricWeightLb(
  lengthIn: number,
  widthIn: number,
  heightIn: number,
  divisor = US_DIVISOR_IN3_PER_LB,
): number {
  return volumetricWeight(lengthIn, widthIn, heightIn, divisor);
}

/** The weight a carrier charges for: the greater of the actual and the volumetric weight. */
export function chargeableWeight(actual: number, volumetric: number): number {
  requireNonNegative(actual, 'Actual weight', 'kilograms');
  requireNonNegative(volumetric, 'Volumetric weight', 'kilograms');
  return Math.max(actual, volumetric);
}

/** A board's packed size: its own sizes plus padding on every side (default 50 mm). */
export function packedSize(board: BoxSize, paddingMm = DEFAULT_PACKING_PADDING_MM): BoxSize {
  requireNonNegative(paddingMm, 'Packing padding', 'millimetres');
  return {
    lengthMm: board.lengthMm + 2 * paddingMm,
    widthMm: board.widthMm + 2 * paddingMm,
    heightMm: board.heightMm + 2 * paddingMm,
  };
}

/** What it costs in weight to send one packed board by courier. */
export interface ShippingWeight {
  packed: BoxSize;
  actualKg: number;
  volumetricKg: number;
  chargeableKg: number;
}

/** Packs a board (padding each side) and works out its volumetric and chargeable weight by courier. */
export function shippingWeight(
  board: BoxSize,
  actualKg: number,
  options: { paddingMm?: number; divisor?: number } = {},
): ShippingWeight {
  const packed = packedSize(board, options.paddingMm);
  const volumetricKg = volumetricWeight(
    packed.lengthMm / 10,
    packed.widthMm / 10,
    packed.heightMm / 10,
    options.divisor,
  );
  return { packed, actualKg, volumetricKg, chargeableKg: chargeableWeight(actualKg, volumetricKg) };
}
