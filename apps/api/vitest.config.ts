import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['src/**/*.test.ts', 'src/**/*.test.tsx'],
    globalSetup: ['./test/global-setup.ts'],
    setupFiles: ['./test/fail-on-console-error.ts'],
    testTimeout: 20_000,
    hookTimeout: 60_000,
    // Each file gets its own database, so files may run in parallel.
    fileParallelism: true,
    maxWorkers: 2,
  },
});
