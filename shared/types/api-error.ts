/** The one JSON shape of every error the API answers with. */
export interface ApiErrorBody {
  error: {
    /** Stable machine-readable code, e.g. `validation_failed`, `rate_limited`. */
    code: string;
    /** A sentence for people: what went wrong and how to fix it. */
    message: string;
    /** Per-field messages, keyed by the input field's name. */
    fields?: Record<string, string>;
    /** Seconds to wait before trying again (rate limits). */
    retryAfterSeconds?: number;
  };
}
