import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'server',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
    environment: 'node',
    // Creates (when DATABASE_URL is unset) and migrates the database every test file shares.
    globalSetup: ['./test/globalSetup.ts'],
    // Each file starts a real server with its own connection pools; two at a time fit two cores.
    maxWorkers: 2,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
