import { z } from 'zod';
import { LISTING_LIMITS as L } from '../listings/limits';
import { BUILD_KINDS, SUPPLIED_MATERIALS } from '../listings/vocabulary';
import {
  choiceList,
  currencyField,
  descriptionField,
  minorUnits,
  positionField,
  titleField,
  townIdField,
  wholeNumber,
} from './listing-fields';

const rate = (what: string) => minorUnits(what, 0, L.rateMinor.max);

/** A builder's prices, in minor units of the listing's currency. */
export const rateCardSchema = z.strictObject({
  perMetreFrameMinor: rate('price per metre of frame'),
  perSquareMetreTopMinor: rate('price per square metre of top'),
  perLegSetMinor: rate('price per set of legs'),
  perSecondLevelMinor: rate('price per second level'),
  deliveryPerKmMinor: rate('delivery price per km'),
  /** Added to the cost of materials the builder supplies, in basis points (1000 = 10 %). */
  materialsMarkupBp: wholeNumber('materials mark-up', 'basis points (100 = 1 %)', 0, L.markupBp.max),
});
export type RateCard = z.infer<typeof rateCardSchema>;

/** A benchwork-building service, offered by a builder around a town. */
export const serviceListingSchema = z.strictObject({
  kind: z.literal('service'),
  title: titleField,
  description: descriptionField,
  builds: choiceList(BUILD_KINDS, 'kinds of work you take on', 1),
  townId: townIdField,
  position: positionField.optional(),
  serviceAreaKm: wholeNumber('service area', 'km', L.serviceAreaKm.min, L.serviceAreaKm.max),
  leadTimeWeeks: wholeNumber('lead time', 'weeks', L.leadTimeWeeks.min, L.leadTimeWeeks.max),
  materialsSupplied: choiceList(SUPPLIED_MATERIALS, 'materials you supply', 0),
  currency: currencyField,
  rateCard: rateCardSchema,
});
export type ServiceListingInput = z.infer<typeof serviceListingSchema>;
