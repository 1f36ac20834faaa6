import { nextTick, reactive, watch } from 'vue';
import type { z } from 'zod';
import type { ApiError } from '@/api/errors';
import { CHECK_FIELDS_MESSAGE } from './useForm';
import { useAsync } from './useAsync';

/** A form's entries, one per field, keyed by the field's path in the schema (`construction.topMaterial`). */
export type Draft = Record<string, unknown>;

/** The draft turned into the schema's input, with messages for boxes that could not be read at all. */
export interface ReadDraft {
  input: unknown;
  problems: Record<string, string>;
}

export interface DraftFormOptions<D extends Draft, O> {
  /** Prefix for element ids, unique on the page. */
  id: string;
  draft: D;
  read: (draft: D) => ReadDraft;
  schema: z.ZodType<O>;
  /** Put a schema message in the words of the box (e.g. pounds where the schema says pence). */
  reword?: (field: string, message: string) => string;
}

/** Which field an issue belongs to: the longest field key its path starts with, or the first under it. */
export function fieldForPath(keys: readonly string[], path: readonly PropertyKey[]): string {
  const joined = path.map(String).join('.');
  let best = '';
  for (const key of keys) if ((joined === key || joined.startsWith(`${key}.`)) && key.length > best.length) best = key;
  return best || keys.find((key) => joined !== '' && key.startsWith(`${joined}.`)) || 'form';
}

/**
 * A form over a flat draft whose keys are the schema's field paths, checked with the shared zod schema: a field is
 * checked when the person leaves it after typing, its error clears as soon as it is fixed, server field errors
 * land beside their fields, and nothing typed is lost when saving fails. Like `useForm`, for forms with lists,
 * switches, lengths and money rather than plain text.
 */
export function useDraftForm<D extends Draft, O>(options: DraftFormOptions<D, O>) {
  const keys = Object.keys(options.draft);
  const draft = reactive({ ...options.draft }) as D;
  const errors = reactive<Record<string, string>>({});
  const edited = new Set<string>();

  function issues(): { found: Record<string, string>; data?: O } {
    const { input, problems } = options.read(draft);
    const found: Record<string, string> = { ...problems };
    const result = options.schema.safeParse(input);
    if (result.success) return Object.keys(found).length ? { found } : { found, data: result.data };
    for (const issue of result.error.issues) {
      const key = fieldForPath(keys, issue.path);
      found[key] ??= options.reword ? options.reword(key, issue.message) : issue.message;
    }
    return { found };
  }

  function check(key: string): void {
    const message = issues().found[key];
    if (message) errors[key] = message;
    else delete errors[key];
  }

  for (const key of keys)
    watch(
      () => draft[key],
      () => {
        edited.add(key);
        if (errors[key]) check(key);
      },
      { deep: true },
    );

  const fieldId = (key: string) => `${options.id}-${key.replace(/\./g, '-')}`;

  async function focusFirstError(): Promise<void> {
    await nextTick();
    for (const key of [...keys, 'form']) {
      const el = errors[key] ? document.getElementById(fieldId(key)) : null;
      if (el) return el.focus();
    }
  }

  const state = reactive({
    draft,
    errors,
    formError: '',
    submitting: false,
    fieldId,
    /** Props for a field wrapper: its id, its error, and the check on leaving it. */
    field: (key: string) => ({
      id: fieldId(key),
      error: errors[key],
      onBlur: () => {
        if (edited.has(key) || errors[key]) check(key);
      },
    }),
    /** Check everything; the parsed input, or null with every problem shown and the first focused. */
    validateAll(): O | null {
      const { found, data } = issues();
      for (const key of Object.keys(errors)) delete errors[key];
      Object.assign(errors, found);
      if (data !== undefined) return data;
      state.formError = CHECK_FIELDS_MESSAGE;
      void focusFirstError();
      return null;
    },
    /** Show a failed save: field errors beside their fields, the server's sentence for the whole form. */
    showFailure(error: ApiError): void {
      state.formError = error.message;
      let matched = false;
      for (const [path, message] of Object.entries(error.fields)) {
        const key = fieldForPath(keys, path.split('.'));
        errors[key] = message;
        matched ||= key !== 'form';
      }
      if (matched) void focusFirstError();
    },
    /** Run a save with the parsed input, once at a time. */
    submit,
  });

  watch(
    () => Object.keys(errors).length,
    (n) => {
      if (n === 0 && state.formError === CHECK_FIELDS_MESSAGE) state.formError = '';
    },
  );

  const { run, error: runError } = useAsync((action: () => Promise<void>) => action().then(() => true));

  async function submit(action: (data: O) => Promise<void>): Promise<boolean> {
    if (state.submitting) return false;
    state.formError = '';
    const data = state.validateAll();
    if (data === null) return false;
    state.submitting = true;
    const ok = await run(() => action(data));
    state.submitting = false;
    if (!ok && runError.value) state.showFailure(runError.value);
    return ok === true;
  }

  return state;
}
