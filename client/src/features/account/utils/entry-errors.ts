import { isApiError } from '@/lib/api-error';
import { applyServerErrors } from '@/lib/form-errors';

interface FormLike {
  setErrors(errors: Record<string, string>): void;
  setFieldError(path: string, error: string): void;
}

/**
 * Field errors go next to their fields. A 409 about the count (more than is owed, or more than are
 * alive in care) goes next to the count field in the server's own words; the rest comes back for an alert.
 */
export function applyEntryErrors(form: FormLike, error: unknown, countField = 'count'): string | null {
  if (isApiError(error) && error.statusCode === 409 && /more than|exceeds/i.test(error.message)) {
    form.setFieldError(countField, error.message);
    return null;
  }
  return applyServerErrors(form, error);
}
