import { defineConfig } from 'vitest/config';

// Cross-app checks on the built app: the browser flows and the API contract file.
export default defineConfig({
  test: {
    include: ['browser/**/*.spec.ts', 'contract/**/*.spec.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
    fileParallelism: false,
  },
});
