/** The boards of a plan: boards given by size, shelves round a room split into boards, and a second level. */
export { generateBoards, type LayoutInput, ROW_GAP_MM } from './generate-boards';
export { outlineOf, rectToRoom, splitEvenly, toRoom, wallCorners } from './geometry';
export { runPieces, type RoomShape, type RunPiece, wallAfter, wallBefore, wallRun } from './room-runs';
export type * from './types';
