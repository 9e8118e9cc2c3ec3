import type { PlausibilityWarningCode } from './plausibility.js';

/** One field's problem, as the server's validation reports it. */
export interface FieldError {
  field: string;
  message: string;
  /** Set on plausibility warnings (422): which warning this row is, to acknowledge it. */
  code?: PlausibilityWarningCode;
  /** The catalogue key of `message` and its values, so it can be said in the reader's language. */
  key?: string;
  values?: Record<string, string | number>;
}

/** The single JSON shape of every error the API returns. */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  details?: FieldError[];
  /** A machine-readable reason where the client offers a next step (e.g. `EMAIL_NOT_CONFIRMED`). */
  reason?: string;
  /** The catalogue key of `message` and its values (see `FieldError.key`). */
  key?: string;
  values?: Record<string, string | number>;
}

/** The `reason` of a 403 for a stale CSRF token: the client fetches a fresh token and sends the write once more. */
export const CSRF_OUT_OF_DATE = 'csrf-out-of-date';
