import type { ParsedPlanInput } from '@shared/planner';

type Parsed = ParsedPlanInput;
type Legs = Extract<Parsed['construction']['supports'], { kind: 'legs' }>;
type Battens = Extract<Parsed['construction']['supports'], { kind: 'wall-battens' }>;

/** One board given by its size, as the form edits it. */
export type DraftBoard = Parsed['boards'][number];

/** The room, as the form edits it: the opening is kept while switched off, so switching it back restores it. */
export type DraftRoom = Omit<NonNullable<Parsed['room']>, 'opening'> & {
  opening: NonNullable<NonNullable<Parsed['room']>['opening']>;
};

/** The parts of a plan that can be switched on and off; each keeps its values while off. */
export interface DraftSwitches {
  secondLevel: boolean;
  lowerShelf: boolean;
  kickboards: boolean;
  opening: boolean;
  pricing: boolean;
  labour: boolean;
  schedule: boolean;
}

/**
 * The planner form's state. It mirrors the plan input field by field, so a field's dotted path in the input
 * (`room.opening.offsetMm`) is its path here too and errors from `computePlan` land beside their fields. Lengths are
 * millimetres; a length or number being typed that does not read as one is `NaN` until it is fixed.
 */
export interface PlannerDraft {
  /** Boards given by size, or shelves round a room. */
  layout: 'boards' | 'room';
  boards: DraftBoard[];
  room: DraftRoom;
  on: DraftSwitches;
  secondLevel: NonNullable<Parsed['secondLevel']>;
  lowerShelf: NonNullable<Parsed['lowerShelf']>;
  kickboards: NonNullable<Parsed['kickboards']>;
  construction: Omit<Parsed['construction'], 'supports'>;
  /** What carries the boards; both kinds keep their settings so switching back restores them. */
  supportKind: 'legs' | 'wall-battens';
  legs: Omit<Legs, 'kind'>;
  battens: Omit<Battens, 'kind'>;
  joins: Parsed['joins'];
  wiring: Parsed['wiring'];
  loads: Parsed['loads'];
  pricing: NonNullable<Parsed['pricing']>;
  labour: NonNullable<Parsed['labour']>;
  schedule: NonNullable<Parsed['schedule']>;
}
