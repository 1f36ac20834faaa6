/*
 * Defaults of the planner, each one editable by the user. The comment beside each says where it comes from; "common
 * practice, no source" marks a habit of the trade rather than a published figure.
 */

/** Cross-member centres for metric plans, mm. */
export const CROSS_MEMBER_SPACING_METRIC_MM = 400; // common practice, no source

/** Cross-member centres for imperial plans: 16 in, mm. */
export const CROSS_MEMBER_SPACING_IMPERIAL_MM = 406.4; // common practice, no source (16 in × 25.4)

/** What lies on a baseboard's top (track, ballast, scenery, buildings), kg per m². */
export const DEFAULT_UNIFORM_LOAD_KG_M2 = 50; // common practice, no source

/** Someone leaning on the front edge, N (about 50 kg). */
/** No leaning load unless asked for: a layout is not a workbench. 500 N is a usual figure for someone leaning on the front edge (common practice, no source). */
export const DEFAULT_POINT_LOAD_N = 0;

/** Height of a board's top above the floor on legs, mm. */
export const DEFAULT_LEG_HEIGHT_MM = 900; // common practice, no source

/** Height above the floor of the brace between each pair of legs, mm. */
export const LEG_BRACE_HEIGHT_MM = 150; // common practice, no source

/** Centres of the shelf brackets under boards on wall battens, mm. */
export const DEFAULT_BRACKET_SPACING_MM = 600; // common practice, no source

/** Longest board a room plan is split into: what one person can carry and fit in a car, mm. */
export const DEFAULT_MAX_BOARD_LENGTH_MM = 1200; // common practice, no source

/** Thickness of the sheet a lower shelf or a kickboard is cut from, mm. */
export const DEFAULT_THIN_SHEET_MM = 6; // common practice, no source

/** Top sheet: 9 mm birch plywood. */
export const DEFAULT_TOP_SHEET = { material: 'birch-ply', thicknessMm: 9 } as const; // common practice, no source

/** Outside diameter of one insulated bus wire (a core of 1.5 mm² twin-and-earth), mm. */
export const DEFAULT_WIRE_OUTER_DIAMETER_MM = 3; // from memory

/** Distance between neighbouring wire pairs' holes across a cross member, mm. */
export const WIRE_PAIR_SPACING_MM = 50; // common practice, no source

/** Voltage the far end of a bus may lose, V. */
export const DEFAULT_DROP_LIMIT_V = 0.5; // common practice, no source

/** Current the bus is checked at, A. */
export const DEFAULT_BUS_CURRENT_A = 2; // common practice, no source

/** Voltage of the accessory supply, V. */
export const DEFAULT_ACCESSORY_VOLTAGE_V = 16; // common practice, no source

/** Highest accessory voltage accepted: layout wiring is low voltage. */
export const MAX_ACCESSORY_VOLTAGE_V = 24; // common practice, no source

/** Days of building per board, frame to wired top. */
export const DEFAULT_BUILD_DAYS_PER_BOARD = 0.5; // common practice, no source

/** Days the timber and sheets sit in the room before building: at least a week. */
export const MIN_ACCLIMATISE_DAYS = 7; // common practice, no source

/** Grams of PVA in one bottle bought. */
export const PVA_BOTTLE_G = 1000; // common practice, no source

/** Clamps holding each board-to-board join when boards are clamped rather than bolted. */
export const CLAMPS_PER_JOIN = 2; // common practice, no source

/** Clear height left under an upper level's frame, at the least, mm. */
export const MIN_LEVEL_CLEARANCE_MM = 50; // common practice, no source

/** Room left across a board between its legs, at the least, mm. */
export const MIN_ROOM_BETWEEN_LEGS_MM = 20; // common practice, no source
