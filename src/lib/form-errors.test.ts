import { describe, expect, it, vi } from 'vitest';
import { ApiError } from './api-error';
import { applyApiError } from './form-errors';

type Values = { email: string; password: string };

describe('applyApiError', () => {
  it('puts field issues on their fields and shows no banner when all found a home', () => {
    const setError = vi.fn();
    const error = new ApiError(400, 'validation_failed', 'Check the form.', [
      { path: 'email', message: 'Not an e-mail.' },
    ]);
    expect(applyApiError<Values>(error, setError, ['email', 'password'])).toBeNull();
    expect(setError).toHaveBeenCalledWith('email', { type: 'server', message: 'Not an e-mail.' });
  });

  it('shows the server message for errors without field issues', () => {
    const setError = vi.fn();
    const error = new ApiError(401, 'invalid_credentials', 'That e-mail and password do not match.');
    expect(applyApiError<Values>(error, setError, ['email', 'password'])).toBe(
      'That e-mail and password do not match.',
    );
    expect(setError).not.toHaveBeenCalled();
  });

  it('adds issues for fields the form lacks to the banner', () => {
    const error = new ApiError(400, 'validation_failed', 'Check the form.', [
      { path: 'labId', message: 'Unknown lab.' },
    ]);
    expect(applyApiError<Values>(error, vi.fn(), ['email'])).toBe('Check the form. Unknown lab.');
  });

  it('says the server message once when it is also the unplaced issue (a malformed reset link)', () => {
    const error = new ApiError(400, 'validation_failed', 'This link is not valid.', [
      { path: 'params.token', message: 'This link is not valid.' },
    ]);
    expect(applyApiError<Values>(error, vi.fn(), ['password'])).toBe('This link is not valid.');
  });

  it('has a plain message for errors that are not from the API', () => {
    expect(applyApiError<Values>(new Error('boom'), vi.fn(), ['email'])).toBe('Something went wrong. Try again.');
  });
});
