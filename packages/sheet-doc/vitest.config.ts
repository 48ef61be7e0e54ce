import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: { name: 'sheet-doc', include: ['src/**/*.test.ts'], environment: 'node' },
});
