import type { ApiErrorBody, FieldError } from '@broodsilk/shared';

/** The one error type every failed API call becomes. */
export class ApiError extends Error {
  readonly statusCode: number;
  readonly details: FieldError[];

  constructor(body: ApiErrorBody) {
    super(body.message);
    this.name = 'ApiError';
    this.statusCode = body.statusCode;
    this.details = body.details ?? [];
  }

  /** Field errors as `{ field: message }` for `form.setErrors`. */
  fieldErrors(): Record<string, string> {
    return Object.fromEntries(this.details.map((d) => [d.field, d.message]));
  }
}

export function isApiError(e: unknown): e is ApiError {
  return e instanceof ApiError;
}
