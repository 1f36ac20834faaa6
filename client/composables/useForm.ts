import { nextTick, reactive, watch } from 'vue';
import type { z } from 'zod';
import type { ApiError } from '@/api/errors';
import { formatWait } from '@/utils/format';
import { useAsync } from './useAsync';

/** Form-level message shown when fields fail the client's own check. */
export const CHECK_FIELDS_MESSAGE = 'Some answers need changing. Each one is explained next to its field.';

/** Options for {@link useForm}. */
export interface FormOptions {
  /** Prefix for field element ids, unique on the page, e.g. `sign-in`. */
  id: string;
}

/** Props that `AppField` takes for one field. */
export interface FieldBinding {
  id: string;
  error: string | undefined;
  onBlur: () => void;
}

/**
 * A form checked with the same zod schema the server uses.
 * A field is checked when the person leaves it (once they have typed in it), its error clears as soon
 * as it is fixed, server `fields` errors appear next to their fields, other failures go in `formError`,
 * and entered values are never cleared by a failed submit.
 */
export function useForm<TValues extends Record<string, string>, TOutput>(
  schema: z.ZodType<TOutput, TValues>,
  initial: TValues,
  options: FormOptions,
) {
  type Field = keyof TValues & string;
  const values = reactive({ ...initial }) as TValues;
  const errors = reactive<Partial<Record<string, string>>>({});
  const edited = new Set<string>();

  /** The first message per field for the current values. */
  function currentIssues(): Record<string, string> {
    const result = schema.safeParse(values);
    const found: Record<string, string> = {};
    if (result.success) return found;
    for (const issue of result.error.issues) {
      const key = String(issue.path[0] ?? '');
      if (key && !(key in found)) found[key] = issue.message;
    }
    return found;
  }

  /** Check one field now; true when it passes. */
  function validateField(name: Field): boolean {
    const message = currentIssues()[name];
    if (message) errors[name] = message;
    else delete errors[name];
    return !message;
  }

  for (const name of Object.keys(initial)) {
    watch(
      () => values[name],
      () => {
        edited.add(name);
        if (errors[name]) validateField(name);
      },
    );
  }

  /** Element id for a field's input. */
  function fieldId(name: Field): string {
    return `${options.id}-${name}`;
  }

  /** Props for `AppField`: its id, its error and the check to run on leaving it. */
  function field(name: Field): FieldBinding {
    return {
      id: fieldId(name),
      error: errors[name],
      onBlur: () => {
        if (edited.has(name) || errors[name]) validateField(name);
      },
    };
  }

  async function focusFirstError(): Promise<void> {
    await nextTick();
    for (const name of Object.keys(initial)) {
      const input = errors[name] ? document.getElementById(fieldId(name)) : null;
      if (input) return input.focus();
    }
  }

  /** Put the server's per-field messages next to their fields; true when any matched a field. */
  function showServerErrors(error: ApiError): boolean {
    let matched = false;
    for (const [name, message] of Object.entries(error.fields)) {
      if (!(name in initial)) continue;
      errors[name] = message;
      matched = true;
    }
    return matched;
  }

  /** The server's sentence, with the wait spelled out when it asks us to slow down. */
  function describeFailure(error: ApiError): string {
    if (error.kind !== 'rate_limited' || !error.retryAfterSeconds) return error.message;
    return `${error.message} You can try again in ${formatWait(error.retryAfterSeconds)}.`;
  }

  const state = reactive({
    values,
    errors,
    /** Message for the whole form, shown in its alert region. */
    formError: '',
    /** The last failure from the server, so a page can offer a way out (e.g. "send the link again"). */
    submitError: null as ApiError | null,
    submitting: false,
    field,
    fieldId,
    validateField,
    handleSubmit,
  });
  // Once every flagged field is fixed, the "some answers need changing" summary goes too.
  watch(
    () => Object.keys(errors).length,
    (count) => {
      if (count === 0 && state.formError === CHECK_FIELDS_MESSAGE) state.formError = '';
    },
  );

  const { run, error: runError } = useAsync(async (data: TOutput, action: (data: TOutput) => Promise<void>) => {
    await action(data);
    return true;
  });

  /** Make a submit handler: check every field, then run `action` with the parsed values. */
  function handleSubmit(action: (data: TOutput) => Promise<void>): () => Promise<void> {
    return async () => {
      if (state.submitting) return;
      state.formError = '';
      state.submitError = null;
      const result = schema.safeParse(values);
      if (!result.success) {
        const issues = currentIssues();
        for (const name of Object.keys(initial)) {
          if (issues[name]) errors[name] = issues[name];
        }
        state.formError = CHECK_FIELDS_MESSAGE;
        await focusFirstError();
        return;
      }
      state.submitting = true;
      const ok = await run(result.data, action);
      state.submitting = false;
      const failure = runError.value;
      if (ok || !failure) return;
      state.submitError = failure;
      state.formError = describeFailure(failure);
      if (failure.kind === 'validation' && showServerErrors(failure)) await focusFirstError();
    };
  }

  return state;
}
