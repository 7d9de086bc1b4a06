import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    setupFiles: ['test/setup-fast-check.ts'],
    testTimeout: 30000,
    hookTimeout: 60000,
  },
});
