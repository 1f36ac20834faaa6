import type { RequestHandler, Response } from 'express';
import type { ZodType } from 'zod';
import { AppError, validationFailed } from '../errors';

type Source = 'body' | 'query' | 'params';

/** Turn zod issues into one message per field, named by the input's field name. */
export function fieldErrors(
  issues: readonly { path: PropertyKey[]; code: string; message: string; keys?: string[] }[],
) {
  const fields: Record<string, string> = {};
  for (const issue of issues) {
    if (issue.code === 'unrecognized_keys' && issue.keys) {
      for (const key of issue.keys) fields[key] ??= 'This field is not accepted here.';
      continue;
    }
    const name = issue.path.map(String).join('.') || 'form';
    fields[name] ??= issue.message;
  }
  return fields;
}

/**
 * Check `req[source]` against a shared schema; the parsed value goes to `res.locals[source]`
 * (Express 5's `req.query` is read-only). Failures answer 422 with a message per field.
 */
export function validate(schema: ZodType, source: Source = 'body'): RequestHandler {
  return (req, res, next) => {
    const raw: unknown = req[source];
    if (source === 'body' && (raw === undefined || typeof raw !== 'object' || raw === null || Array.isArray(raw))) {
      throw new AppError(
        415,
        'unsupported_media_type',
        'Send the form as a JSON object (Content-Type: application/json).',
      );
    }
    const result = schema.safeParse(raw ?? {});
    if (!result.success) throw validationFailed(fieldErrors(result.error.issues));
    res.locals[source] = result.data;
    next();
  };
}

/** Read what `validate` parsed, typed by the caller. */
export function input<T>(res: Response, source: Source = 'body'): T {
  return res.locals[source] as T;
}
