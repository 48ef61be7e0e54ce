import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { forgetCsrfToken } from '../api/client';

// Pages are lazy modules: the first visit in a test file waits for their import and transform.
configure({ asyncUtilTimeout: 3000 });

// Vitest runs without globals here, so Testing Library cannot register its own cleanup.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  window.localStorage.clear();
  forgetCsrfToken();
});
