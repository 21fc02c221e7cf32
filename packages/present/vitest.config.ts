import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['src/**/*.test.ts'],
    // The property tests run 100 000 cases each: seconds on an idle machine,
    // more on a busy one. A limit on runaway tests, not a speed target.
    testTimeout: 60_000,
  },
});
