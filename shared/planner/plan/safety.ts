import { cautionsFor, FOLLOW_LOCAL_RULES, type WorkActivity } from '../engineering/safety';

/** The cautions that apply to this plan's work. */
export interface SafetyPlan {
  /** Each caution once, the reminder to follow local rules last. */
  cautions: string[];
  followLocalRules: string;
}

/** Cautions for cutting, drilling, sanding, lifting and wiring, and for fixing to the wall when boards hang on it. */
export function planSafety(options: { fixedToWall: boolean }): SafetyPlan {
  const activities: WorkActivity[] = ['cutting', 'drilling', 'sanding', 'lifting', 'wiring'];
  if (options.fixedToWall) activities.push('fixing-to-wall');
  return { cautions: cautionsFor(activities), followLocalRules: FOLLOW_LOCAL_RULES };
}
