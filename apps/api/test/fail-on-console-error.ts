import { afterEach, beforeEach, vi, type MockInstance } from 'vitest';

// A test that logs an unexpected console.error fails (STYLE.md). Tests that
// expect one replace console.error themselves with vi.spyOn(...).mockImplementation().
let spy: MockInstance<typeof console.error> | undefined;
beforeEach(() => {
  spy = vi.spyOn(console, 'error');
});
afterEach(() => {
  const calls: unknown[][] = spy?.mock.calls ?? [];
  spy?.mockRestore();
  if (calls.length > 0) {
    throw new Error(
      `unexpected console.error: ${calls.map((call) => call.map(String).join(' ')).join('\n')}`,
    );
  }
});
