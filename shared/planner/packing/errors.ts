/** Why the planner refused its input; stable so the client can pick a message or highlight a field. */
export type PlannerInputErrorCode = 'invalid-input' | 'part-too-long' | 'part-too-large' | 'too-many-pieces';

/**
 * Thrown when the planner cannot work with what it was given. The message says what is wrong and how to fix it;
 * `partId` names the part at fault when there is one.
 */
export class PlannerInputError extends Error {
  override readonly name = 'PlannerInputError';

  constructor(
    readonly code: PlannerInputErrorCode,
    message: string,
    readonly partId?: string,
  ) {
    super(message);
  }
}
