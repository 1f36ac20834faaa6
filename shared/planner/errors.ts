import type { z } from 'zod';

/**
 * Thrown by `computePlan` when its input cannot be planned. `fields` maps each field at fault, by its dotted path in
 * the input (`boards.0.lengthMm`, `room.opening.offsetMm`; `''` for the input as a whole), to a message that names
 * the cause and the fix, so a form can show each message beside its field.
 */
export class PlanInputError extends Error {
  override readonly name = 'PlanInputError';

  constructor(
    /** Messages by dotted field path; the first message for a path wins. */
    readonly fields: Record<string, string>,
  ) {
    super(summary(fields));
  }

  /** The error for a failed parse: one entry per field path, an unknown key named at its own path. */
  static fromZod(error: z.ZodError): PlanInputError {
    const fields: Record<string, string> = {};
    for (const issue of error.issues) {
      const path = issue.path.map(String);
      if (issue.code === 'unrecognized_keys' && issue.keys.length > 0) path.push(issue.keys[0]!);
      const key = path.join('.');
      fields[key] ??= issue.message;
    }
    return new PlanInputError(fields);
  }

  /** The error for one field. */
  static forField(path: string, message: string): PlanInputError {
    return new PlanInputError({ [path]: message });
  }
}

function summary(fields: Record<string, string>): string {
  const messages = Object.values(fields);
  if (messages.length === 1) return messages[0]!;
  return `The plan has ${messages.length} problems: ${messages.join(' ')}`;
}
