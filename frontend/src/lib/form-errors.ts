import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';

import { isApiError } from './api-error';

const UNEXPECTED = 'Something went wrong on our side. Try again; if it keeps happening, tell your admin.';

/**
 * Puts a failed request's messages where the person will look: a 400's field messages under
 * their fields, everything else (and fields this form does not show) in the form's root error.
 */
export function applyApiErrorToForm<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): void {
  if (!isApiError(error)) {
    setError('root.server', { type: 'server', message: UNEXPECTED });
    return;
  }
  const flat = error.status === 400 ? error.flattened : null;
  if (!flat) {
    setError('root.server', { type: 'server', message: error.message });
    return;
  }
  const leftOver = [...flat.formErrors];
  let placed = 0;
  for (const [field, messages] of Object.entries(flat.fieldErrors)) {
    if (!messages?.length) continue;
    if ((fields as readonly string[]).includes(field)) {
      setError(field as Path<T>, { type: 'server', message: messages.join(' ') });
      placed += 1;
    } else {
      leftOver.push(...messages);
    }
  }
  if (leftOver.length > 0) setError('root.server', { type: 'server', message: leftOver.join(' ') });
  else if (placed === 0) setError('root.server', { type: 'server', message: error.message });
}
