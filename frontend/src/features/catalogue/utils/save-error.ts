import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';

import { ApiError, isApiError } from '../../../lib/api-error';
import { applyApiErrorToForm } from '../../../lib/form-errors';

/** What a stale save (409) says: nothing is lost, and what to do next. */
export const conflictMessage = (noun: string) =>
  `Someone else saved this ${noun} first; reload to see their changes — your edits are still in the form.`;

/**
 * A failed save, placed where the person will look: a conflict as the form's own problem (values
 * untouched), field messages of a 400 — or of a 422 naming a field, such as a missing ink — under
 * their fields, anything else at the top of the form.
 */
export function applySaveError<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly Path<T>[], noun: string): void {
  if (isApiError(error, 409)) {
    setError('root.server', { type: 'conflict', message: conflictMessage(noun) });
    return;
  }
  const asFieldError = isApiError(error, 422) && error.flattened ? new ApiError(400, error.code, error.message, error.details) : error;
  applyApiErrorToForm(asFieldError, setError, fields);
}
