import type { Conductor } from '../engineering/wiring';

/*
 * Keys of the things bought, shared by the shopping list and the suppliers' price lists. A price is for one unit:
 * one bar or sheet, one screw, bolt, washer or nut, one pair of dowels, one clamp, one bottle, one metre of wire.
 */

/** One length of timber of a section: "timber:uk-2x1:2400". */
export const timberKey = (sectionId: string, lengthMm: number) => `timber:${sectionId}:${lengthMm}`;

/** One sheet: "sheet:birch-ply:9:2440x1220". */
export const sheetKey = (material: string, thicknessMm: number, lengthMm: number, widthMm: number) =>
  `sheet:${material}:${thicknessMm}:${lengthMm}x${widthMm}`;

/** One countersunk wood screw, gauge × length in mm: "screw:4x45". */
export const screwKey = (gaugeMm: number, lengthMm: number) => `screw:${gaugeMm}x${lengthMm}`;

/** One coach bolt: "bolt:m8x50". */
export const boltKey = (diameterMm: number, lengthMm: number) => `bolt:m${diameterMm}x${lengthMm}`;

/** One washer for a coach bolt: "washer:m8". */
export const washerKey = (diameterMm: number) => `washer:m${diameterMm}`;

/** One wing nut: "wing-nut:m8". */
export const wingNutKey = (diameterMm: number) => `wing-nut:m${diameterMm}`;

/** One pair of dowels: plain alignment dowels or pattern-makers' dowels. */
export const dowelKey = (patternMakers: boolean) => (patternMakers ? 'dowel:pattern-makers' : 'dowel:alignment');

/** One clamp for a board join. */
export const CLAMP_KEY = 'clamp:board-join';

/** One bottle of PVA wood glue. */
export const PVA_KEY = 'pva:bottle';

/** One shelf bracket. */
export const BRACKET_KEY = 'bracket:shelf';

/** One metre of dropper wire (thin wire from rail to bus). */
export const DROPPER_WIRE_KEY = 'wire:dropper';

/** One metre of bus wire of a conductor: "wire:iec:1.5:1/2", "wire:awg:16", "wire:area:1.2". */
export function wireKey(conductor: Conductor): string {
  if (conductor.kind === 'iec') return `wire:iec:${conductor.areaMm2}:${conductor.class}`;
  if (conductor.kind === 'awg') return `wire:awg:${conductor.gauge}`;
  return `wire:area:${conductor.areaMm2}`;
}

/** A conductor in words: "1.5 mm² (class 1/2)", "AWG 16". */
export function conductorName(conductor: Conductor): string {
  if (conductor.kind === 'iec') return `${conductor.areaMm2} mm² (class ${conductor.class})`;
  if (conductor.kind === 'awg') return `AWG ${conductor.gauge}`;
  return `${conductor.areaMm2} mm²`;
}
