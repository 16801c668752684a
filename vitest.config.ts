import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: [
      'shared/**/*.test.ts',
      'server/**/*.test.ts',
      'src/**/*.test.{ts,tsx}',
      'tests/unit/**/*.test.ts',
      'tests/system/**/*.test.ts',
    ],
    exclude: ['tests/browser/**', 'node_modules/**'],
    environment: 'node',
    testTimeout: 20000,
    pool: 'forks',
  },
});
