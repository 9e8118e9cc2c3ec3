import { isApiError } from './api-error';

interface FormLike {
  setErrors(errors: Record<string, string>): void;
}

/** Puts the server's field errors next to the fields; returns the message for the rest. */
export function applyServerErrors(form: FormLike, error: unknown): string {
  if (isApiError(error) && error.details.length) form.setErrors(error.fieldErrors());
  return errorMessage(error);
}

/** The server's message for a refused request without fields. */
export function errorMessage(error: unknown): string {
  return isApiError(error) ? error.message : 'Something went wrong. Please try again.';
}
