import { isApiError } from './api-error';

interface FormLike {
  setErrors(errors: Record<string, string>): void;
}

/** Puts the server's field errors next to the fields; returns the message for the rest. */
export function applyServerErrors(form: FormLike, error: unknown): string {
  if (isApiError(error)) {
    if (error.details.length) form.setErrors(error.fieldErrors());
    return error.message;
  }
  return 'Something went wrong. Please try again.';
}
