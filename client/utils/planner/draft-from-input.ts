import { EXAMPLE_SUPPLIERS, planInputSchema, tenByThirteenTwoLevel, type ParsedPlanInput } from '@shared/planner';
import type { DraftRoom, PlannerDraft } from './draft-types';

/** A plain copy, so the form never edits the example or saved input it started from. */
const copy = <T>(value: T): T => structuredClone(value);

/** Today as an ISO date in the person's own time zone. */
function today(): string {
  const now = new Date();
  const local = new Date(now.getTime() - now.getTimezoneOffset() * 60_000);
  return local.toISOString().slice(0, 10);
}

/** The room a plan starts with when the person switches to a room: the two-level example's walls. */
function fallbackRoom(): DraftRoom {
  const parsed = planInputSchema.parse({ room: tenByThirteenTwoLevel.room });
  return roomDraft(parsed.room!);
}

function roomDraft(room: NonNullable<ParsedPlanInput['room']>): DraftRoom {
  const lastWall = room.useWalls[room.useWalls.length - 1] ?? 0;
  const opening = room.opening ?? { wallIndex: lastWall, offsetMm: 0, widthMm: 800, kind: 'lift-out' as const };
  return { ...copy(room), opening: copy(opening) };
}

/**
 * The form state for a plan input: parsed first, so every default is filled in and every section has its sizes, then
 * laid out with each optional part present (switched off when the input left it out). Null when the input does not
 * parse (a saved plan from an older planner, say).
 */
export function draftFromInput(input: unknown): PlannerDraft | null {
  const result = planInputSchema.safeParse(input);
  if (!result.success) return null;
  const p = result.data;
  const { supports, ...construction } = p.construction;
  const legsDefaults = planInputSchema.parse({ boards: [{ lengthMm: 1200, widthMm: 600 }] }).construction.supports;
  const legs = supports.kind === 'legs' ? supports : legsDefaults;
  if (legs.kind !== 'legs') return null;
  const { kind: _legsKind, ...legsFields } = legs;
  return {
    layout: p.room === undefined ? 'boards' : 'room',
    boards: copy(p.boards),
    room: p.room === undefined ? fallbackRoom() : roomDraft(p.room),
    on: {
      secondLevel: p.secondLevel !== undefined,
      lowerShelf: p.lowerShelf !== undefined,
      kickboards: p.kickboards !== undefined,
      opening: p.room?.opening !== undefined,
      pricing: p.pricing !== undefined,
      labour: p.labour !== undefined,
      schedule: p.schedule !== undefined,
    },
    secondLevel: copy(p.secondLevel ?? { heightAboveMm: 350, which: 'same-footprint', role: 'scenic' }),
    lowerShelf: copy(p.lowerShelf ?? { heightMm: 200, sheetThicknessMm: 6 }),
    kickboards: copy(p.kickboards ?? { heightMm: 150, floorFallMm: 0, sheetThicknessMm: 6 }),
    construction: copy(construction),
    supportKind: supports.kind,
    legs: copy(legsFields),
    battens: { bracketSpacingMm: supports.kind === 'wall-battens' ? supports.bracketSpacingMm : 600 },
    joins: p.joins,
    wiring: copy(p.wiring),
    loads: copy(p.loads),
    pricing: copy(p.pricing ?? { suppliers: EXAMPLE_SUPPLIERS, mode: 'cheapest-per-item', currency: 'GBP' }),
    labour: copy(
      p.labour ?? {
        perMetreFrameMinor: 0,
        perSquareMetreTopMinor: 0,
        perLegSetMinor: 0,
        perSecondLevelMinor: 0,
        deliveryPerKmMinor: 0,
        deliveryKm: 0,
        materialsMarkupBasisPoints: 0,
      },
    ),
    schedule: copy(p.schedule ?? { startDate: today(), buildDaysPerBoard: 0.5, acclimatiseDays: 7 }),
  };
}
