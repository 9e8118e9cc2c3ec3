import type { ApiErrorBody, FieldError } from '@broodsilk/shared';

/** The one error type every failed API call becomes. */
export class ApiError extends Error {
  readonly statusCode: number;
  readonly details: FieldError[];
  /** Set where the server offers a next step (e.g. `EMAIL_NOT_CONFIRMED`). */
  readonly reason: string | null;

  constructor(body: ApiErrorBody) {
    super(body.message);
    this.name = 'ApiError';
    this.statusCode = body.statusCode;
    this.details = body.details ?? [];
    this.reason = body.reason ?? null;
  }

  /** Field errors as `{ field: message }` for `form.setErrors`. */
  fieldErrors(): Record<string, string> {
    return Object.fromEntries(this.details.map((d) => [d.field, d.message]));
  }
}

export function isApiError(e: unknown): e is ApiError {
  return e instanceof ApiError;
}
