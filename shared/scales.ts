/**
 * Scales and track gauges a module can be built to, from the open standards: the European NEM 010 (scales, gauges,
 * and the m / e / i rule for narrow gauge), the NMRA's scale ratios (S-1.2), and the UK's OO and OO9, which are facts
 * of the trade rather than of a standard. A listing stores the `id`; the ratio and gauge come from here.
 */

/** Where a scale's figures come from. */
export type ScaleStandard = 'NEM 010' | 'NMRA' | 'UK trade';

/** The prototype track a model gauge stands for. */
export type PrototypeTrack = 'standard' | 'metre' | 'narrow-e' | 'narrow-i';

export interface ScaleGauge {
  /** Stable identifier stored on listings and used in search URLs. */
  id: string;
  /** What modellers write, e.g. "H0m" or "OO". */
  label: string;
  /** The scale as its denominator: 87 means 1:87. */
  ratio: number;
  /** Distance between the rails' inner faces, mm. */
  gaugeMm: number;
  standard: ScaleStandard;
  prototype: PrototypeTrack;
}

interface BaseScale {
  id: string;
  label: string;
  ratio: number;
  gaugeMm: number;
}

/** NEM 010, standard-gauge scales, largest first: the order the m / e / i rule steps down. */
const NEM_STANDARD: readonly BaseScale[] = [
  { id: 'ii', label: 'II (G)', ratio: 22.5, gaugeMm: 64 }, // NEM 010
  { id: 'i', label: 'I', ratio: 32, gaugeMm: 45 }, // NEM 010
  { id: '0', label: '0', ratio: 45, gaugeMm: 32 }, // NEM 010
  { id: 's', label: 'S', ratio: 64, gaugeMm: 22.5 }, // NEM 010
  { id: 'h0', label: 'H0', ratio: 87, gaugeMm: 16.5 }, // NEM 010
  { id: 'tt', label: 'TT', ratio: 120, gaugeMm: 12 }, // NEM 010
  { id: 'n', label: 'N', ratio: 160, gaugeMm: 9 }, // NEM 010
  { id: 'z', label: 'Z', ratio: 220, gaugeMm: 6.5 }, // NEM 010
];

/**
 * NEM 010's narrow-gauge rule: a scale's "m" (metre), "e" and "i" variants run on the gauge of the next, second and
 * third smaller standard scale. So H0m is 1:87 on TT's 12 mm and H0e on N's 9 mm.
 */
const NARROW_STEPS: readonly { suffix: 'm' | 'e' | 'i'; steps: number; prototype: PrototypeTrack }[] = [
  { suffix: 'm', steps: 1, prototype: 'metre' },
  { suffix: 'e', steps: 2, prototype: 'narrow-e' },
  { suffix: 'i', steps: 3, prototype: 'narrow-i' },
];

function nemNarrowGauges(): ScaleGauge[] {
  return NEM_STANDARD.flatMap((scale, index) =>
    NARROW_STEPS.flatMap(({ suffix, steps, prototype }) => {
      const smaller = NEM_STANDARD[index + steps];
      if (!smaller) return [];
      const label = `${scale.label.replace(' (G)', '')}${suffix}`;
      return [
        {
          id: `${scale.id}-${suffix}`,
          label,
          ratio: scale.ratio,
          gaugeMm: smaller.gaugeMm,
          standard: 'NEM 010' as const,
          prototype,
        },
      ];
    }),
  );
}

/**
 * NMRA scale ratios (S-1.2). HO is 3.5 mm to the foot, which is 1:87.1. The gauges are the NMRA's nominal ones:
 * HO 16.5 mm and N 9 mm as in NEM 010; S 7/8 in (22.2 mm) and O 1¼ in (31.75 mm), from memory.
 */
const NMRA: readonly ScaleGauge[] = [
  { id: 'nmra-o', label: 'O (NMRA)', ratio: 48, gaugeMm: 31.75, standard: 'NMRA', prototype: 'standard' },
  { id: 'nmra-s', label: 'S (NMRA)', ratio: 64, gaugeMm: 22.2, standard: 'NMRA', prototype: 'standard' },
  { id: 'nmra-ho', label: 'HO (NMRA)', ratio: 87.1, gaugeMm: 16.5, standard: 'NMRA', prototype: 'standard' },
  { id: 'nmra-n', label: 'N (NMRA)', ratio: 160, gaugeMm: 9, standard: 'NMRA', prototype: 'standard' },
];

/** British outline: 4 mm to the foot (304.8 / 4 = 1:76.2) on H0's 16.5 mm track, and OO9 on N's 9 mm. */
const UK_TRADE: readonly ScaleGauge[] = [
  { id: 'oo', label: 'OO', ratio: 76.2, gaugeMm: 16.5, standard: 'UK trade', prototype: 'standard' },
  { id: 'oo9', label: 'OO9 (009)', ratio: 76.2, gaugeMm: 9, standard: 'UK trade', prototype: 'narrow-e' },
];

/** Every scale and gauge a listing may name. */
export const SCALES: readonly ScaleGauge[] = [
  ...NEM_STANDARD.map((s) => ({ ...s, standard: 'NEM 010' as const, prototype: 'standard' as const })),
  ...nemNarrowGauges(),
  ...NMRA,
  ...UK_TRADE,
];

/** The ids, for schemas (`z.enum`). */
export const SCALE_IDS = SCALES.map((s) => s.id) as [string, ...string[]];

const BY_ID = new Map(SCALES.map((s) => [s.id, s]));

/** The scale with this id, or undefined. */
export const scaleById = (id: string): ScaleGauge | undefined => BY_ID.get(id);

/** Every distinct gauge in the table, mm, smallest first: the values the gauge filter offers. */
export const GAUGES_MM: readonly number[] = [...new Set(SCALES.map((s) => s.gaugeMm))].sort((a, b) => a - b);

/** Ids of the scales that run on any of `gauges` (mm). */
export const scaleIdsOnGauges = (gauges: readonly number[]): string[] =>
  SCALES.filter((s) => gauges.includes(s.gaugeMm)).map((s) => s.id);

/** "H0m — 1:87 on 12 mm", for lists and specs tables. */
export const describeScale = (s: ScaleGauge): string => `${s.label} — 1:${s.ratio} on ${s.gaugeMm} mm`;
