import { defineConfig } from 'vitest/config';

// One run over every package's Vitest project; browser tests live in e2e/ with their own config.
export default defineConfig({
  test: {
    projects: ['packages/engine', 'packages/sheet-doc', 'packages/server', 'packages/web'],
  },
});
