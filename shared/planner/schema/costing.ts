import { z } from 'zod';
import { DEFAULT_BUILD_DAYS_PER_BOARD, MIN_ACCLIMATISE_DAYS } from '../defaults';
import { PLAN_LIMITS } from '../limits';
import { choiceField, nameField, rangeField, strictGroup, wholeNumberField } from './fields';

/** Largest single price or rate accepted, minor units (£100,000): catches a price typed in the wrong unit. */
const MAX_MINOR = 10_000_000;

const minor = (label: string) => wholeNumberField(label, 0, MAX_MINOR, 'minor units (pence)');

/** One priced item: see the shopping list's item keys (e.g. "timber:uk-2x1:2400", "sheet:birch-ply:9:2440x1220"). */
export const priceSchema = strictGroup('a price', {
  itemKey: z
    .string({ error: 'Enter the item key the price is for.' })
    .trim()
    .min(1, { error: 'Enter the item key the price is for.' })
    .max(80, { error: 'An item key must be at most 80 characters.' })
    .describe('Key of a shopping-list item, e.g. "timber:uk-2x1:2400" or "screw:4x45".'),
  priceMinor: minor('Price').describe('Price of one unit of the item (one bar, sheet, screw, metre…), minor units.'),
});

/** A supplier and the prices it charges. */
export const supplierSchema = strictGroup('a supplier', {
  name: nameField('Supplier name').describe('Name of the supplier, shown on the shopping list.'),
  deliveryMinor: minor('Delivery charge').default(0).describe('Delivery charge for one order, minor units.'),
  cuttingChargePerCutMinor: minor('Cutting charge')
    .optional()
    .describe('Charge for each saw cut when the supplier cuts the sheets, minor units; none when left out.'),
  items: z
    .array(priceSchema, { error: 'List the supplier’s prices.' })
    .max(PLAN_LIMITS.maxItemsPerSupplier, {
      error: `List at most ${PLAN_LIMITS.maxItemsPerSupplier} prices per supplier.`,
    })
    .default([])
    .describe('The supplier’s prices, one per item key.'),
});

/** Where the materials are bought and how suppliers are chosen. */
export const pricingSchema = strictGroup('the pricing', {
  suppliers: z
    .array(supplierSchema, { error: 'List the suppliers.' })
    .min(1, { error: 'List at least one supplier.' })
    .max(PLAN_LIMITS.maxSuppliers, { error: `List at most ${PLAN_LIMITS.maxSuppliers} suppliers.` })
    .describe('Suppliers to buy from.'),
  mode: choiceField('way of choosing suppliers', ['cheapest-per-item', 'cheapest-supplier'])
    .default('cheapest-per-item')
    .describe('"cheapest-per-item": each item from whoever sells it cheapest; "cheapest-supplier": all from one.'),
  currency: z
    .literal('GBP', { error: 'Prices are in pounds for now: use currency "GBP".' })
    .default('GBP')
    .describe('Currency of every price; minor units are pence.'),
});

/** A builder's rate card: what building the boards costs on top of the materials. */
export const labourSchema = strictGroup('the rate card', {
  perMetreFrameMinor: minor('Rate per metre of frame')
    .default(0)
    .describe('Per metre of frame timber (rails, cross members, braces, battens; not legs), minor units.'),
  perSquareMetreTopMinor: minor('Rate per square metre of top')
    .default(0)
    .describe('Per square metre of sheet fitted (tops, lower shelves, kickboards), minor units.'),
  perLegSetMinor: minor('Rate per set of legs').default(0).describe('Per board standing on its own legs, minor units.'),
  perSecondLevelMinor: minor('Rate per second-level board')
    .default(0)
    .describe('Per board on the upper level of a two-level plan, minor units.'),
  deliveryPerKmMinor: minor('Delivery rate per km').default(0).describe('Builder’s delivery per km, minor units.'),
  deliveryKm: rangeField('Delivery distance', 'km', 0, 2000).default(0).describe('Distance to deliver, km.'),
  materialsMarkupBasisPoints: wholeNumberField('Materials markup', 0, 10_000, 'basis points')
    .default(0)
    .describe('Markup on everything paid to suppliers, in hundredths of a percent (1000 = 10 %).'),
});

/** When the work happens. */
export const scheduleSchema = strictGroup('the schedule', {
  startDate: z.iso
    .date({ error: 'Enter the delivery date as YYYY-MM-DD, e.g. 2025-03-01.' })
    .describe('Day the materials are delivered to the room, ISO date.'),
  buildDaysPerBoard: rangeField('Build days per board', 'days', 0.05, 10)
    .default(DEFAULT_BUILD_DAYS_PER_BOARD)
    .describe('Days to build one board, frame to wired top; default 0.5 (common practice, no source).'),
  acclimatiseDays: wholeNumberField('Days to acclimatise', MIN_ACCLIMATISE_DAYS, 90, 'days')
    .default(MIN_ACCLIMATISE_DAYS)
    .describe('Days the timber and sheets sit in the room before building; at least 7 (common practice).'),
});
