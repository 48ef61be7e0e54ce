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
    // Run after the engine and web projects when the root config runs them all together:
    // projects with their own worker limit need their own group.
    sequence: { groupOrder: 1 },
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
