/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// In development the Sheaf server (packages/server) answers everything that is not the web app
// itself; the page then still talks to one origin only.
const serverTarget = process.env.SHEAF_SERVER_URL ?? 'http://localhost:3000';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
  },
  server: {
    port: 5173,
    strictPort: true,
    proxy: {
      '/api': { target: serverTarget },
      '/auth': { target: serverTarget },
      '/fake-oauth': { target: serverTarget },
      '/dev': { target: serverTarget },
      // Trailing slash: '/fonts' alone would also catch the page's own /sheaf-fonts.css.
      '/fonts/': { target: serverTarget },
      '/collab': { target: serverTarget, ws: true },
    },
  },
  test: {
    name: 'web',
    environment: 'happy-dom',
    include: ['src/**/*.test.{ts,tsx}'],
    restoreMocks: true,
    setupFiles: ['src/test/setup.ts'],
    testTimeout: 30_000,
  },
});
