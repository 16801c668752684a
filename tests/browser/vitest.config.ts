import { defineConfig } from 'vitest/config';

/** End-to-end tests: the built client served by the real server, driven in Debian's Chromium. */
export default defineConfig({
  test: {
    include: ['tests/browser/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
    pool: 'forks',
  },
});
