import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { forgetCsrfToken } from '../api/client';

// Pages are lazy modules: the first visit in a test file waits for their import and transform.
// On a busy two-core machine that can take seconds, so waits are generous (they end as soon as the
// awaited state appears).
configure({ asyncUtilTimeout: 15_000 });

// Vitest runs without globals here, so Testing Library cannot register its own cleanup.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  window.localStorage.clear();
  forgetCsrfToken();
});
