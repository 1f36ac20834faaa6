import { z } from 'zod';
import {
  DEFAULT_ACCESSORY_VOLTAGE_V,
  DEFAULT_BUS_CURRENT_A,
  DEFAULT_DROP_LIMIT_V,
  DEFAULT_WIRE_OUTER_DIAMETER_MM,
  MAX_ACCESSORY_VOLTAGE_V,
} from '../defaults';
import { PLAN_LIMITS } from '../limits';
import { choiceField, rangeField, strictGroup, wholeNumberField } from './fields';

const iecArea = z
  .union([z.literal(0.5), z.literal(0.75), z.literal(1), z.literal(1.5), z.literal(2.5)], {
    error: 'Choose a conductor size of 0.5, 0.75, 1, 1.5 or 2.5 mm².',
  })
  .describe('Conductor cross-section, mm² (IEC 60228 sizes).');

/** The bus wire's conductor: an IEC size and class, an AWG size, or any area (resistance from resistivity). */
export const conductorSchema = z
  .discriminatedUnion(
    'kind',
    [
      strictGroup('the IEC conductor', {
        kind: z.literal('iec').describe('A metric size with IEC 60228 maximum resistance.'),
        areaMm2: iecArea,
        class: choiceField('conductor class', ['1/2', '5/6'])
          .default('1/2')
          .describe('"1/2" solid or stranded (house cable cores), "5/6" flexible.'),
      }),
      strictGroup('the AWG conductor', {
        kind: z.literal('awg').describe('An American Wire Gauge size, solid.'),
        gauge: z
          .union([z.literal(14), z.literal(16), z.literal(18), z.literal(22)], {
            error: 'Choose AWG 14, 16, 18 or 22.',
          })
          .describe('AWG number.'),
      }),
      strictGroup('the conductor', {
        kind: z.literal('area').describe('Any cross-section; resistance from copper’s resistivity.'),
        areaMm2: rangeField('Conductor area', 'mm²', 0.1, 10).describe('Conductor cross-section, mm².'),
      }),
    ],
    { error: 'Choose the bus wire: kind "iec", "awg" or "area".' },
  )
  .describe('The bus wire’s conductor.');

/** The wiring under the boards: a track bus and accessory buses through every cross member. */
export const wiringSchema = strictGroup('the wiring', {
  system: choiceField('control system', ['dc', 'dcc'])
    .default('dcc')
    .describe('"dcc": one bus carries the track signal; "dc": each section’s feed is switched, the bus is the common.'),
  busConductor: conductorSchema
    .prefault({ kind: 'iec', areaMm2: 1.5 })
    .describe('Conductor of the bus wires; default 1.5 mm² solid (cores of twin-and-earth, common practice).'),
  wireOuterDiameterMm: rangeField('Wire outside diameter', 'mm', 0.5, 10)
    .default(DEFAULT_WIRE_OUTER_DIAMETER_MM)
    .describe('Outside diameter of one insulated bus wire, mm: sizes the holes in the cross members.'),
  accessoryPairs: wholeNumberField('Accessory wire pairs', 0, PLAN_LIMITS.maxAccessoryPairs)
    .default(1)
    .describe('Pairs of accessory wires (points, signals, lights) run alongside the track bus.'),
  accessoryVoltage: rangeField('Accessory voltage', 'V', 1, MAX_ACCESSORY_VOLTAGE_V)
    .default(DEFAULT_ACCESSORY_VOLTAGE_V)
    .describe('Voltage of the accessory supply (low voltage only); the accessory drop is shown as a share of it.'),
  currentA: rangeField('Bus current', 'A', 0.1, 10)
    .default(DEFAULT_BUS_CURRENT_A)
    .describe('Current the bus is checked at, A, taken at the far end of the run (the worst case).'),
  dropLimitV: rangeField('Allowed voltage drop', 'V', 0.05, 5)
    .default(DEFAULT_DROP_LIMIT_V)
    .describe('Voltage the far end may lose, out and back; default 0.5 V (common practice, no source).'),
  feedFrom: choiceField('feed point', ['one-end', 'centre'])
    .default('one-end')
    .describe('Where power joins each run of joined boards: at its first board’s start, or halfway along.'),
});
