import { z } from 'zod';
import { DEFAULT_MAX_BOARD_LENGTH_MM, DEFAULT_THIN_SHEET_MM } from '../defaults';
import { PLAN_LIMITS } from '../limits';
import { choiceField, nameField, rangeField, strictGroup, wholeMmField } from './fields';

const { minBoardLengthMm, minBoardWidthMm, maxWallLengthMm, maxWalls, maxBoards } = PLAN_LIMITS;

/** The two levels of a plan; a one-level plan uses only the lower. */
export const LEVELS = ['lower', 'upper'] as const;

/** One board given by its size: a portable module, or any rectangle of baseboard. */
export const explicitBoardSchema = strictGroup('a board', {
  id: z
    .string({ error: 'Give the board id as text.' })
    .trim()
    .regex(/^[A-Za-z0-9_-]{1,40}$/, {
      error: 'A board id is 1 to 40 letters, digits, "-" or "_"; leave it out to number boards.',
    })
    .optional()
    .describe('Unique id of the board in the plan; default board-1, board-2, … in the order given.'),
  name: nameField('Board name')
    .optional()
    .describe('Name shown on drawings and lists; default "Board 1", "Board 2", ….'),
  lengthMm: wholeMmField('Board length', minBoardLengthMm, maxWallLengthMm).describe(
    'Length of the board, mm: the direction its top sheet’s face grain runs. At most the sheet’s length.',
  ),
  widthMm: wholeMmField('Board width', minBoardWidthMm, maxWallLengthMm).describe(
    'Width of the board, mm. At most the sheet’s width, so the top is one piece.',
  ),
  level: choiceField('level', LEVELS)
    .default('lower')
    .describe('Level the board is on; "upper" needs secondLevel for its height above the lower level.'),
});

/** A wall of the room, in order going clockwise round the room seen from above. */
export const wallSchema = strictGroup('a wall', {
  name: nameField('Wall name').describe('Name of the wall, e.g. "Window wall"; board names start with it.'),
  lengthMm: wholeMmField('Wall length', minBoardLengthMm, maxWallLengthMm).describe('Length of the wall, mm.'),
});

/** A doorway or other gap along one wall's shelf. */
export const openingSchema = strictGroup('the opening', {
  wallIndex: z
    .number({ error: 'Choose the wall the opening is in.' })
    .int({ error: 'Choose the wall the opening is in.' })
    .min(0, { error: 'Choose the wall the opening is in.' })
    .describe('Index of the wall the opening is in, 0 for the first; it must be one of useWalls.'),
  offsetMm: wholeMmField('Opening offset', 0, maxWallLengthMm).describe(
    'Distance from the wall’s starting corner (going clockwise) to the near side of the opening, mm.',
  ),
  widthMm: wholeMmField('Opening width', minBoardLengthMm, maxWallLengthMm).describe('Width of the opening, mm.'),
  kind: choiceField('kind of opening', ['gap', 'lift-out'])
    .default('lift-out')
    .describe('"gap" leaves the opening clear; "lift-out" bridges it with its own small board that lifts out.'),
});

/**
 * A room with shelves round its walls, split into boards. Every corner is taken as a square inside corner, as in a
 * rectangular room. Each used wall's shelf runs into the corner at its end; the next wall's shelf starts clear of it.
 */
export const roomSchema = strictGroup('the room', {
  walls: z
    .array(wallSchema, { error: 'List the walls of the room in order.' })
    .min(1, { error: 'List at least one wall of the room.' })
    .max(maxWalls, { error: `A room may have at most ${maxWalls} walls.` })
    .describe('The walls in order going clockwise round the room seen from above, each meeting the next at a corner.'),
  closed: z
    .boolean({ error: 'Say whether the last wall meets the first (true or false).' })
    .optional()
    .describe('Whether the last wall meets the first at a corner; default yes when four or more walls are listed.'),
  shelfDepthMm: wholeMmField('Shelf depth', minBoardWidthMm, maxWallLengthMm).describe(
    'Depth of the shelf out from the wall: the width of each board, mm.',
  ),
  useWalls: z
    .array(
      z
        .number({ error: 'Choose the walls to put a shelf on.' })
        .int({ error: 'Choose the walls to put a shelf on.' })
        .min(0, { error: 'Choose the walls to put a shelf on.' }),
    )
    .min(1, { error: 'Choose at least one wall to put a shelf on.' })
    .max(maxWalls, { error: `Choose at most ${maxWalls} walls.` })
    .optional()
    .describe('Indexes of the walls that carry a shelf (0 for the first wall); default every wall.'),
  cornersJoined: z
    .boolean({ error: 'Say whether boards meeting at a corner are fixed together (true or false).' })
    .default(true)
    .describe('Whether the boards that meet at a corner are fixed together (and wired through) or only butt up.'),
  opening: openingSchema.optional().describe('A doorway along one of the used walls.'),
  maxBoardLengthMm: wholeMmField('Longest board', minBoardLengthMm, maxWallLengthMm)
    .default(DEFAULT_MAX_BOARD_LENGTH_MM)
    .describe('Longest board a wall’s shelf is split into, mm (default 1200: portable). Boards on a wall are equal.'),
});

/** A second level over the same footprint, e.g. a scenic level over a hidden storage ("fiddle") yard. */
export const secondLevelSchema = strictGroup('the second level', {
  heightAboveMm: wholeMmField('Height between levels', 50, 2000).describe(
    'Height of the upper level’s top above the lower level’s top, mm.',
  ),
  which: choiceField('boards copied', ['same-footprint', 'selected'])
    .default('same-footprint')
    .describe('"same-footprint": every lower board has a board above it; "selected": only the boards in boardIds.'),
  boardIds: z
    .array(z.string({ error: 'Choose the boards to build over.' }), { error: 'Choose the boards to build over.' })
    .max(maxBoards, { error: `List at most ${maxBoards} boards.` })
    .optional()
    .describe('With which "selected": ids of the lower boards that get a board above them.'),
  role: choiceField('role of the second level', ['storage', 'scenic'])
    .default('scenic')
    .describe('What the upper level is for; the lower level takes the other role ("scenic" upper: storage below).'),
});

/** A shelf low down between each board's legs, for storage; a thinner sheet with no wiring. */
export const lowerShelfSchema = strictGroup('the lower shelf', {
  heightMm: wholeMmField('Lower shelf height', 50, 2000).describe('Height of the shelf’s top above the floor, mm.'),
  sheetThicknessMm: rangeField('Lower shelf sheet thickness', 'mm', 3, 25)
    .default(DEFAULT_THIN_SHEET_MM)
    .describe('Thickness of the shelf’s sheet (same material as the top), mm; default 6.'),
});

/**
 * Kickboards (plinths) along the front of boards on legs, floor to `heightMm`. On an uneven floor each is cut
 * `floorFallMm` taller and scribed down to the floor on site, so it meets the floor wherever it falls.
 */
export const kickboardsSchema = strictGroup('the kickboards', {
  heightMm: wholeMmField('Kickboard height', 50, 600).describe('Height of a kickboard where the floor is highest, mm.'),
  floorFallMm: wholeMmField('Floor fall', 0, 100)
    .default(0)
    .describe('How much lower the floor is at its lowest point along the boards, mm; added to each kickboard.'),
  sheetThicknessMm: rangeField('Kickboard sheet thickness', 'mm', 3, 25)
    .default(DEFAULT_THIN_SHEET_MM)
    .describe('Thickness of the kickboards’ sheet (same material as the top), mm; default 6.'),
});
