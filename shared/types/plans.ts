/** A saved frame plan as its owner sees it in the list. */
export interface SavedPlanSummary {
  id: number;
  name: string;
  /** ISO 8601 */
  updatedAt: string;
  /** Address of the read-only copy, when sharing is on. */
  shareUrl: string | null;
}

/** A saved plan with its planner input, for reopening in the planner. */
export interface SavedPlanView extends SavedPlanSummary {
  input: unknown;
}

/** A plan opened through its share link: read-only, with who shared it. */
export interface SharedPlanView {
  name: string;
  input: unknown;
  sharedBy: string;
  updatedAt: string;
}
