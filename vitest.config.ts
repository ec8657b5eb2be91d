import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    setupFiles: ['test/helpers/fastCheckSeed.ts'],
    testTimeout: 30000,
    hookTimeout: 60000,
  },
});
