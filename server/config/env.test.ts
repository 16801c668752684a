import { describe, expect, it } from 'vitest';
import { loadEnv } from './env';

describe('attempt-limit settings', () => {
  it('defaults to 10 per account, 100 per client address and 1000 per instance, and reads each from the environment', () => {
    const defaults = loadEnv({});
    expect([
      defaults.DILUTRACE_SIGNIN_LIMIT,
      defaults.DILUTRACE_SIGNIN_CLIENT_LIMIT,
      defaults.DILUTRACE_SIGNIN_INSTANCE_LIMIT,
    ]).toEqual([10, 100, 1000]);
    const set = loadEnv({
      DILUTRACE_SIGNIN_LIMIT: '3',
      DILUTRACE_SIGNIN_CLIENT_LIMIT: '20',
      DILUTRACE_SIGNIN_INSTANCE_LIMIT: '400',
    });
    expect([
      set.DILUTRACE_SIGNIN_LIMIT,
      set.DILUTRACE_SIGNIN_CLIENT_LIMIT,
      set.DILUTRACE_SIGNIN_INSTANCE_LIMIT,
    ]).toEqual([3, 20, 400]);
  });

  it('refuses a limit below one with a message naming the setting', () => {
    expect(() => loadEnv({ DILUTRACE_SIGNIN_CLIENT_LIMIT: '0' })).toThrow(/DILUTRACE_SIGNIN_CLIENT_LIMIT/);
  });
});
