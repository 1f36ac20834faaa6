import type { BoardLayout, LayoutBoard } from '../boards/types';
import { boardParts, type PartSettings } from '../cutting/board-parts';
import type { BoardPart } from '../cutting/types';
import { frameLayout, type FrameSettings } from '../frame/frame-layout';
import type { FrameLayout, SupportKind } from '../frame/types';
import type { ParsedPlanInput } from '../schema';
import type { ResolvedSection } from '../schema/sections';

/** A board with its frame and parts. */
export interface BuiltBoard {
  board: LayoutBoard;
  frame: FrameLayout;
  parts: BoardPart[];
}

/** The sections the plan builds with. */
export function planSections(input: ParsedPlanInput): { frame: ResolvedSection; legs?: ResolvedSection } {
  const { frameSection, supports } = input.construction;
  if (supports.kind !== 'legs') return { frame: frameSection };
  const { sectionId, widthMm, thicknessMm } = supports;
  return { frame: frameSection, legs: { sectionId, widthMm: widthMm!, thicknessMm: thicknessMm! } };
}

/** What holds a board up: a lift-out rests on its neighbours; an upper board over legs is carried by them. */
export function supportOf(board: LayoutBoard, input: ParsedPlanInput): SupportKind {
  if (board.source === 'lift-out') return 'ends';
  if (input.construction.supports.kind === 'wall-battens') return 'brackets';
  return board.carriedBy === undefined ? 'legs' : 'carried';
}

/** Every board's frame and parts. */
export function buildBoards(layout: BoardLayout, input: ParsedPlanInput): BuiltBoard[] {
  const { construction } = input;
  const { supports } = construction;
  const sections = planSections(input);
  const base: Omit<FrameSettings, 'support'> = {
    frame: sections.frame,
    crossMemberSpacingMm: construction.crossMemberSpacingMm,
    ...(sections.legs === undefined ? {} : { legs: sections.legs }),
    ...(supports.kind === 'legs' && supports.maxSpanMm !== undefined ? { maxLegSpanMm: supports.maxSpanMm } : {}),
    ...(supports.kind === 'wall-battens' ? { bracketSpacingMm: supports.bracketSpacingMm } : {}),
  };
  const parts: PartSettings = {
    ...sections,
    top: construction.topSheet,
    ...(supports.kind === 'legs' ? { legHeightMm: supports.heightMm } : {}),
    ...(input.secondLevel === undefined ? {} : { heightAboveMm: input.secondLevel.heightAboveMm }),
    ...(input.lowerShelf === undefined ? {} : { lowerShelf: input.lowerShelf }),
    ...(input.kickboards === undefined ? {} : { kickboards: input.kickboards }),
  };
  return layout.boards.map((board) => {
    const frame = frameLayout(board, { ...base, support: supportOf(board, input) });
    return { board, frame, parts: boardParts(board, frame, parts) };
  });
}
