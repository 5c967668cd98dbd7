import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { format } from 'node:util';
import { afterEach, beforeEach, vi } from 'vitest';

// An unexpected console.error (React act() warnings, prop-type mistakes, failed renders) fails the test.
// A test that expects one replaces the spy: vi.spyOn(console, 'error').mockImplementation(() => {}).
let consoleErrors: string[] = [];

beforeEach(() => {
  consoleErrors = [];
  vi.spyOn(console, 'error').mockImplementation((...args: unknown[]) => {
    consoleErrors.push(format(...args));
  });
  // jsdom does not implement scrolling; the router's scroll restoration calls it.
  window.scrollTo = vi.fn() as unknown as typeof window.scrollTo;
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  const errors = consoleErrors;
  consoleErrors = [];
  if (errors.length > 0) {
    throw new Error(`console.error was called during the test:\n${errors.join('\n---\n')}`);
  }
});
