import { requireNonNegative, requirePositive } from './checks';
import { HSE_ONE_PERSON_KG, HSE_ONE_PERSON_WOMEN_KG, HSE_TEAM_FACTOR, HSE_TEAM_MAX_PEOPLE } from './weight-data';

/** Who should lift a board. */
export type LiftBy = 'one-person' | 'two-person' | 'three-person' | 'mechanical-or-dismantle';

/** Advice on moving one board, in plain words. */
export interface HandlingAdvice {
  liftBy: LiftBy;
  massKg: number;
  /** The guideline figure for the advised team, kg; absent when no team size fits. */
  guidelineKg?: number;
  explanation: string;
  /** Always shown: these are guidelines, and local rules come first. */
  caution: string;
}

/** Options for {@link handlingAdvice}. */
export interface HandlingOptions {
  /** One lifter's guideline capacity, kg; default 25 (16 is the figure given for women). */
  personCapacityKg?: number;
}

const kg = (value: number): string => `${value.toFixed(1)} kg`;

function caution(): string {
  return (
    'These are guidelines, not safe limits. They assume the board is held close to the body at waist height; ' +
    `lift less if it is awkward, held away from the body, raised high or carried far. The one-person figure is ` +
    `${HSE_ONE_PERSON_KG} kg for men and ${HSE_ONE_PERSON_WOMEN_KG} kg for women. Follow your local rules.`
  );
}

/** Team capacities by the manual handling guideline: one person, two, and three lifting together. */
export function teamCapacitiesKg(personCapacityKg = HSE_ONE_PERSON_KG): { one: number; two: number; three: number } {
  requirePositive(personCapacityKg, 'Capacity of one lifter', 'kilograms');
  return {
    one: personCapacityKg,
    two: HSE_TEAM_FACTOR.two * 2 * personCapacityKg,
    three: HSE_TEAM_FACTOR.three * 3 * personCapacityKg,
  };
}

/**
 * Advises who should lift a board of `massKg` by the UK HSE manual handling guideline (L23 / INDG143): one person up
 * to 25 kg; two people up to two-thirds of their combined capacity (33.3 kg); three up to half of theirs (37.5 kg);
 * beyond that a lifting aid, or take the board apart, as teams of more than four are unlikely to work.
 */
export function handlingAdvice(massKg: number, options: HandlingOptions = {}): HandlingAdvice {
  requireNonNegative(massKg, 'Board mass', 'kilograms');
  const c = teamCapacitiesKg(options.personCapacityKg);
  const base = { massKg, caution: caution() };
  const at = `At ${kg(massKg)} this board is`;
  if (massKg <= c.one) {
    return {
      ...base,
      liftBy: 'one-person',
      guidelineKg: c.one,
      explanation: `${at} within the ${kg(c.one)} guideline for one person.`,
    };
  }
  if (massKg <= c.two) {
    return {
      ...base,
      liftBy: 'two-person',
      guidelineKg: c.two,
      explanation:
        `${at} over the ${kg(c.one)} guideline for one person; two people can lift up to ${kg(c.two)} ` +
        `together (two-thirds of their combined ${kg(2 * c.one)}).`,
    };
  }
  if (massKg <= c.three) {
    return {
      ...base,
      liftBy: 'three-person',
      guidelineKg: c.three,
      explanation:
        `${at} over the ${kg(c.two)} guideline for two people; three can lift up to ${kg(c.three)} ` +
        `together (half of their combined ${kg(3 * c.one)}).`,
    };
  }
  return {
    ...base,
    liftBy: 'mechanical-or-dismantle',
    explanation:
      `${at} over the ${kg(c.three)} guideline for three people, and teams of more than ${HSE_TEAM_MAX_PEOPLE} ` +
      'seldom work. Use a trolley or other lifting aid, or take the board apart (top, legs, scenery) to lighten it.',
  };
}
