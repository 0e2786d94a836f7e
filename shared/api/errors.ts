/** The one shape of every error the API sends (server/http/errors.ts writes it). */
export interface ApiErrorBody {
  error: {
    /** Stable, machine-readable code, e.g. `not_found`, `invalid_json`, `validation_failed`. */
    code: string;
    /** A sentence for people: what happened and how to fix it. */
    message: string;
    /** Per-field messages, keyed by the field's path (`body.title`, `query.page`). */
    fields?: Record<string, string>;
  };
}
