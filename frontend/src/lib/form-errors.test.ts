import { describe, expect, it, vi } from 'vitest';

import { ApiError } from './api-error';
import { applyApiErrorToForm } from './form-errors';

type Form = { email: string; password: string };

describe('applyApiErrorToForm', () => {
  it('when a 400 names known and unknown fields, then known ones go to their field and the rest to the form', () => {
    const setError = vi.fn();
    const error = new ApiError(400, 'VALIDATION_FAILED', 'Check the fields.', {
      formErrors: ['Change at least one thing.'],
      fieldErrors: { email: ['Enter a valid e-mail address.', 'It is too long.'], tenant: ['Unknown tenant.'] },
    });

    applyApiErrorToForm<Form>(error, setError, ['email', 'password']);

    expect(setError.mock.calls).toEqual([
      ['email', { type: 'server', message: 'Enter a valid e-mail address. It is too long.' }],
      ['root.server', { type: 'server', message: 'Change at least one thing. Unknown tenant.' }],
    ]);
  });

  it('when the error is not a 400, then its message goes to the form', () => {
    const setError = vi.fn();

    applyApiErrorToForm<Form>(new ApiError(429, 'RATE_LIMITED', 'Too many tries.'), setError, ['email']);

    expect(setError).toHaveBeenCalledExactlyOnceWith('root.server', { type: 'server', message: 'Too many tries.' });
  });

  it('when a 400 has no details, then the server message still reaches the person', () => {
    const setError = vi.fn();

    applyApiErrorToForm<Form>(new ApiError(400, 'VALIDATION_FAILED', 'Bad input.'), setError, ['email']);

    expect(setError).toHaveBeenCalledExactlyOnceWith('root.server', { type: 'server', message: 'Bad input.' });
  });
});
