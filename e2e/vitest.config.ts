import { defineConfig } from 'vitest/config';

// Browser tests: one server for the whole run (globalSetup), one Chromium per test file.
export default defineConfig({
  test: {
    name: 'browser',
    root: new URL('..', import.meta.url).pathname,
    include: ['e2e/**/*.e2e.ts'],
    globalSetup: ['e2e/support/globalSetup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    // A page's data arrives over the network and through lazy modules: polls wait for it, and end
    // as soon as the expected state shows.
    expect: { poll: { timeout: 20_000, interval: 100 } },
  },
});
