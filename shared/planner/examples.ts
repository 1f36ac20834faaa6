import type { PlanInput } from './schema';

/*
 * Example plans, used by the tests, the planner page and the benchmark. The prices are made up to show how costing
 * works; they are not anyone's quotes.
 */

/**
 * Two made-up suppliers: a timber merchant that sells everything a plan needs, delivers and cuts sheets, and a DIY
 * store that is cheaper for some things but sells less.
 */
export const EXAMPLE_SUPPLIERS = [
  {
    name: 'Example Timber Merchant',
    deliveryMinor: 2500,
    cuttingChargePerCutMinor: 50,
    items: [
      { itemKey: 'timber:uk-2x1:1800', priceMinor: 260 },
      { itemKey: 'timber:uk-2x1:2400', priceMinor: 330 },
      { itemKey: 'timber:uk-2x1:3000', priceMinor: 410 },
      { itemKey: 'timber:uk-2x1:3600', priceMinor: 490 },
      { itemKey: 'timber:uk-2x1:4200', priceMinor: 570 },
      { itemKey: 'timber:uk-2x1:4800', priceMinor: 650 },
      { itemKey: 'timber:uk-2x1:5400', priceMinor: 730 },
      { itemKey: 'timber:uk-2x2:1800', priceMinor: 420 },
      { itemKey: 'timber:uk-2x2:2400', priceMinor: 540 },
      { itemKey: 'timber:uk-2x2:3000', priceMinor: 670 },
      { itemKey: 'timber:uk-2x2:3600', priceMinor: 800 },
      { itemKey: 'timber:uk-2x2:4200', priceMinor: 930 },
      { itemKey: 'timber:uk-2x2:4800', priceMinor: 1060 },
      { itemKey: 'timber:uk-2x2:5400', priceMinor: 1190 },
      { itemKey: 'sheet:birch-ply:9:2440x1220', priceMinor: 5200 },
      { itemKey: 'sheet:birch-ply:6:2440x1220', priceMinor: 3900 },
      ...['3.5x16', '3.5x20', '3.5x25', '3.5x30', '4x35', '4x40', '4x45', '4x50', '5x60', '5x70', '5x80'].map(
        (size) => ({
          itemKey: `screw:${size}`,
          priceMinor: size.startsWith('5') ? 9 : 5,
        }),
      ),
      ...[40, 50, 60, 70, 80].map((length) => ({ itemKey: `bolt:m8x${length}`, priceMinor: 40 + length / 2 })),
      { itemKey: 'washer:m8', priceMinor: 6 },
      { itemKey: 'wing-nut:m8', priceMinor: 35 },
      { itemKey: 'dowel:alignment', priceMinor: 120 },
      { itemKey: 'dowel:pattern-makers', priceMinor: 395 },
      { itemKey: 'clamp:board-join', priceMinor: 450 },
      { itemKey: 'pva:bottle', priceMinor: 950 },
      { itemKey: 'bracket:shelf', priceMinor: 280 },
      { itemKey: 'wire:iec:1.5:1/2', priceMinor: 70 },
      { itemKey: 'wire:dropper', priceMinor: 30 },
    ],
  },
  {
    name: 'Example DIY Store',
    deliveryMinor: 0,
    items: [
      { itemKey: 'timber:uk-2x1:2400', priceMinor: 380 },
      { itemKey: 'timber:uk-2x2:2400', priceMinor: 600 },
      { itemKey: 'sheet:birch-ply:9:2440x1220', priceMinor: 5600 },
      { itemKey: 'screw:3.5x30', priceMinor: 3 },
      { itemKey: 'screw:4x35', priceMinor: 4 },
      { itemKey: 'screw:4x40', priceMinor: 4 },
      { itemKey: 'screw:4x45', priceMinor: 5 },
      { itemKey: 'screw:5x60', priceMinor: 8 },
      { itemKey: 'bolt:m8x50', priceMinor: 45 },
      { itemKey: 'washer:m8', priceMinor: 5 },
      { itemKey: 'wing-nut:m8', priceMinor: 30 },
      { itemKey: 'dowel:pattern-makers', priceMinor: 350 },
      { itemKey: 'pva:bottle', priceMinor: 899 },
      { itemKey: 'wire:iec:1.5:1/2', priceMinor: 60 },
      { itemKey: 'wire:dropper', priceMinor: 25 },
    ],
  },
];

/** One portable module, 1200 × 600 mm, on legs: the smallest whole plan. */
export const singlePortableModule: PlanInput = {
  boards: [{ id: 'module', name: 'Portable module', lengthMm: 1200, widthMm: 600 }],
  pricing: { suppliers: EXAMPLE_SUPPLIERS, mode: 'cheapest-per-item' },
  schedule: { startDate: '2025-03-01' },
};

/**
 * A 10 × 13 ft room (3048 × 3962 mm) with a 600 mm shelf round every wall on two levels: a storage yard below and
 * the scenic level 350 mm above it, on legs; a lift-out across the doorway in the fourth wall; kickboards on a floor
 * that falls 12 mm; a builder's rate card.
 */
export const tenByThirteenTwoLevel: PlanInput = {
  units: 'imperial',
  room: {
    walls: [
      { name: 'Window wall', lengthMm: 3048 },
      { name: 'Chimney wall', lengthMm: 3962 },
      { name: 'Cupboard wall', lengthMm: 3048 },
      { name: 'Door wall', lengthMm: 3962 },
    ],
    shelfDepthMm: 600,
    cornersJoined: true,
    opening: { wallIndex: 3, offsetMm: 1200, widthMm: 800, kind: 'lift-out' },
    maxBoardLengthMm: 1200,
  },
  secondLevel: { heightAboveMm: 350, which: 'same-footprint', role: 'scenic' },
  kickboards: { heightMm: 150, floorFallMm: 12 },
  construction: { supports: { kind: 'legs', sectionId: 'uk-2x2', heightMm: 800 }, yardCutsSheets: true },
  joins: 'pattern-makers-dowels',
  wiring: { feedFrom: 'centre', accessoryPairs: 2 },
  pricing: { suppliers: EXAMPLE_SUPPLIERS, mode: 'cheapest-supplier' },
  labour: {
    perMetreFrameMinor: 400,
    perSquareMetreTopMinor: 1500,
    perLegSetMinor: 2000,
    perSecondLevelMinor: 2500,
    deliveryPerKmMinor: 60,
    deliveryKm: 25,
    materialsMarkupBasisPoints: 1000,
  },
  schedule: { startDate: '2025-03-01', buildDaysPerBoard: 0.5, acclimatiseDays: 10 },
};
