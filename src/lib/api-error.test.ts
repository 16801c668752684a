import { describe, expect, it } from 'vitest';
import { apiErrorFromResponse } from './api-error';

describe('apiErrorFromResponse', () => {
  it('reads code, message and field issues from the server error body', () => {
    const body = JSON.stringify({
      error: {
        code: 'validation_failed',
        message: 'Some fields need attention.',
        details: [{ path: 'email', message: 'Enter an e-mail address.' }],
      },
    });
    const error = apiErrorFromResponse(400, body);
    expect(error).toMatchObject({ status: 400, code: 'validation_failed', message: 'Some fields need attention.' });
    expect(error.details).toEqual([{ path: 'email', message: 'Enter an e-mail address.' }]);
  });

  it('passes the server message through unchanged for wrong credentials', () => {
    const body = JSON.stringify({
      error: { code: 'invalid_credentials', message: 'That e-mail and password do not match.' },
    });
    const error = apiErrorFromResponse(401, body);
    expect(error.code).toBe('invalid_credentials');
    expect(error.message).toBe('That e-mail and password do not match.');
    expect(error.details).toEqual([]);
  });

  it('ignores details that are not a list of field issues', () => {
    const body = JSON.stringify({ error: { code: 'conflict', message: 'Taken.', details: { retryAfter: 3 } } });
    expect(apiErrorFromResponse(409, body).details).toEqual([]);
  });

  it('still gives a typed error for an HTML or empty body', () => {
    for (const body of ['<html>Bad gateway</html>', '']) {
      const error = apiErrorFromResponse(502, body);
      expect(error.status).toBe(502);
      expect(error.code).toBe('unexpected_response');
      expect(error.message).toContain('502');
    }
  });
});
