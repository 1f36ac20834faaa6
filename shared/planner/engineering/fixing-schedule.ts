import { lengthText as len } from '../text/lengths';
import { requireNonNegative, requirePositive } from './checks';
import { SCREWS_PER_BUTT_JOINT, SCREWS_PER_LEG, TOP_SCREW_SPACING_MM } from './fixings-data';
import type { SectionSize } from './materials';
import { type ScrewChoice, screwFor } from './screws';

/** The joints of one ladder-frame board: side rails full length, end rails and cross members between them. */
export interface FrameFixingInput {
  boardLengthMm: number;
  boardWidthMm: number;
  /** Section of the rails and cross members, on edge (e.g. 2x1, 44 × 18). */
  rail: SectionSize;
  crossMemberCount: number;
  topSheetThicknessMm: number;
  /** Legs screwed into the corner of the frame, if any. */
  legs?: { count: number; section: SectionSize };
  /** Wall battens the board rests on, if any. */
  wallBattenCount?: number;
}

/** What holds one kind of joint, and how many fixings it takes. */
export interface JointFixing {
  joint: 'frame-corner' | 'cross-member' | 'top-sheet' | 'leg' | 'wall-batten';
  description: string;
  /** The screw, or why no screw will do; `null` where the fixing is another maker's to specify. */
  screw: ScrewChoice | null;
  perJoint: number;
  joints: number;
  total: number;
  note?: string;
}

const END_GRAIN_NOTE = 'Screws hold poorly in end grain: glue the joint as well.';

/** Screws around the top's edge and along each cross member, at no more than the spacing apart. */
export function topSheetScrewCount(lengthMm: number, widthMm: number, crossMembers: number): number {
  const along = Math.ceil(lengthMm / TOP_SCREW_SPACING_MM);
  const across = Math.ceil(widthMm / TOP_SCREW_SPACING_MM);
  return 2 * along + 2 * across + crossMembers * (across - 1);
}

function butt(joint: 'frame-corner' | 'cross-member', input: FrameFixingInput, joints: number): JointFixing {
  const { rail, boardWidthMm } = input;
  const what = joint === 'frame-corner' ? 'end rail' : 'cross member';
  return {
    joint,
    description: `Side rail to ${what}: through the side rail into the ${what}'s end`,
    screw: screwFor({ fixedThicknessMm: rail.thicknessMm, baseDepthMm: boardWidthMm - 2 * rail.thicknessMm }),
    perJoint: SCREWS_PER_BUTT_JOINT,
    joints,
    total: SCREWS_PER_BUTT_JOINT * joints,
    note: END_GRAIN_NOTE,
  };
}

function topSheet(input: FrameFixingInput): JointFixing {
  const count = topSheetScrewCount(input.boardLengthMm, input.boardWidthMm, input.crossMemberCount);
  return {
    joint: 'top-sheet',
    description: `Top sheet to frame: through the ${len(input.topSheetThicknessMm)} sheet into the rails' top edges`,
    screw: screwFor({ fixedThicknessMm: input.topSheetThicknessMm, baseDepthMm: input.rail.widthMm }),
    perJoint: 1,
    joints: count,
    total: count,
    note: `Every ${len(TOP_SCREW_SPACING_MM)} around the edge and along each cross member; countersink so no head stands proud.`,
  };
}

function legs(input: FrameFixingInput, legs: { count: number; section: SectionSize }): JointFixing {
  const screw = screwFor({ fixedThicknessMm: input.rail.thicknessMm, baseDepthMm: legs.section.thicknessMm });
  return {
    joint: 'leg',
    description: 'Leg to frame: through each rail at the corner into the leg',
    screw,
    perJoint: SCREWS_PER_LEG,
    joints: legs.count,
    total: SCREWS_PER_LEG * legs.count,
    note: screw.ok ? undefined : 'Bolt the leg instead: two coach bolts through rail and leg.',
  };
}

function wallBattens(count: number): JointFixing {
  return {
    joint: 'wall-batten',
    description: 'Wall batten to wall',
    screw: null,
    perJoint: 0,
    joints: count,
    total: 0,
    note:
      "Follow the wall plug maker's instructions for screw, plug and hole depth for your wall, " +
      'and check for hidden pipes and cables before drilling.',
  };
}

/** Every kind of joint in one board's frame with its screw and how many it takes. */
export function fixingSchedule(input: FrameFixingInput): JointFixing[] {
  requirePositive(input.boardLengthMm, 'Board length', 'millimetres');
  requirePositive(input.boardWidthMm, 'Board width', 'millimetres');
  requireNonNegative(input.crossMemberCount, 'Number of cross members', 'pieces');
  const schedule = [
    butt('frame-corner', input, 4),
    butt('cross-member', input, 2 * input.crossMemberCount),
    topSheet(input),
  ];
  if (input.legs !== undefined && input.legs.count > 0) schedule.push(legs(input, input.legs));
  if (input.wallBattenCount !== undefined && input.wallBattenCount > 0)
    schedule.push(wallBattens(input.wallBattenCount));
  return schedule;
}
