import { cleanup } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { forgetCsrfToken } from '../api/client';

// Vitest runs without globals here, so Testing Library cannot register its own cleanup.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  window.localStorage.clear();
  forgetCsrfToken();
});
