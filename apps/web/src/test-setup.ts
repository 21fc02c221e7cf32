import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach, beforeEach, vi, type MockInstance } from 'vitest';

// A test that logs an unexpected console.error fails (STYLE.md), as in the API's tests. React's
// act() and key warnings arrive here too. A test that expects one mocks console.error itself.
let spy: MockInstance<typeof console.error> | undefined;
beforeEach(() => {
  spy = vi.spyOn(console, 'error');
});

afterEach(() => {
  cleanup();
  const calls: unknown[][] = spy?.mock.calls ?? [];
  spy?.mockRestore();
  if (calls.length > 0) {
    throw new Error(
      `unexpected console.error: ${calls.map((call) => call.map(String).join(' ')).join('\n')}`,
    );
  }
});
