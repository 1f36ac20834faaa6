import type { BoardPart } from '../cutting/types';
import { SCREWS_PER_BUTT_JOINT, TOP_SCREW_SPACING_MM } from '../engineering/fixings-data';
import { type ScrewChoice, screwFor } from '../engineering/screws';
import type { FrameLayout } from '../frame/types';
import type { ResolvedSection } from '../schema/sections';

/** The joints beyond the frame itself: braces, the lower shelf and kickboards, each screwed to the legs. */
export type ExtraJointKind = 'leg-brace' | 'diagonal-brace' | 'shelf-bearer' | 'lower-shelf' | 'kickboard';

/** A joint and its screws, in the form the frame's own schedule uses. */
export interface ExtraJoint {
  joint: ExtraJointKind;
  description: string;
  screw: ScrewChoice;
  perJoint: number;
  joints: number;
  total: number;
  note?: string;
}

/** One kind of joint: what is fixed, how thick it is, how deep the wood it goes into, and how many. */
interface JointSpec {
  joint: ExtraJointKind;
  description: string;
  fixedMm: number;
  baseMm: number;
  perJoint: number;
  joints: number;
}

/**
 * Screws for the parts a board's own legs carry: each brace end (two screws) into a leg, each shelf bearer into
 * every leg it passes, the shelf into its bearers every top-screw spacing, and a kickboard into each front leg.
 */
export function extraJoints(
  frame: FrameLayout,
  parts: readonly BoardPart[],
  sections: { frame: ResolvedSection; legs?: ResolvedSection },
): ExtraJoint[] {
  const legs = sections.legs;
  if (frame.support !== 'legs' || legs === undefined) return [];
  const count = (kind: BoardPart['kind']) => parts.filter((p) => p.kind === kind).reduce((n, p) => n + p.quantity, 0);
  const t = sections.frame.thicknessMm;
  const pairs = frame.legPairCentresMm.length;
  const specs: JointSpec[] = [
    {
      joint: 'leg-brace',
      description: 'Leg brace to leg, each end',
      fixedMm: t,
      baseMm: legs.widthMm,
      perJoint: SCREWS_PER_BUTT_JOINT,
      joints: 2 * count('leg-brace'),
    },
    {
      joint: 'diagonal-brace',
      description: 'Diagonal brace to leg, each end',
      fixedMm: t,
      baseMm: legs.thicknessMm,
      perJoint: SCREWS_PER_BUTT_JOINT,
      joints: 2 * count('diagonal-brace'),
    },
  ];
  const shelf = parts.find((p) => p.kind === 'lower-shelf');
  if (shelf !== undefined) {
    specs.push(
      {
        joint: 'shelf-bearer',
        description: 'Shelf bearer to each leg it passes',
        fixedMm: t,
        baseMm: legs.thicknessMm,
        perJoint: SCREWS_PER_BUTT_JOINT,
        joints: 2 * pairs,
      },
      {
        joint: 'lower-shelf',
        description: 'Lower shelf to its bearers',
        fixedMm: shelf.material.thicknessMm,
        baseMm: frame.railDepthMm,
        perJoint: 1,
        joints: 2 * Math.ceil(shelf.lengthMm / TOP_SCREW_SPACING_MM),
      },
    );
  }
  const kick = parts.find((p) => p.kind === 'kickboard');
  if (kick !== undefined) {
    specs.push({
      joint: 'kickboard',
      description: 'Kickboard to each front leg',
      fixedMm: kick.material.thicknessMm,
      baseMm: legs.thicknessMm,
      perJoint: 2,
      joints: pairs,
    });
  }
  return specs
    .filter((s) => s.joints > 0)
    .map(({ fixedMm, baseMm, ...s }) => ({
      ...s,
      screw: screwFor({ fixedThicknessMm: fixedMm, baseDepthMm: baseMm }),
      total: s.perJoint * s.joints,
    }));
}
