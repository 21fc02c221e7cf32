/// <reference types="vitest/config" />
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const apiTarget = process.env['HOOPLINE_API_URL'] ?? 'http://127.0.0.1:8081';

/**
 * @hoopline/calc is pure (no module runs for its side effects; its package
 * says nothing either way), so a page that takes one export from it, such
 * as the sign-in card's screening caution, gets that module and not the
 * whole engine. The engine proper then loads with the routes that use it.
 */
const engineWithoutSideEffects: Plugin = {
  name: 'hoopline:engine-without-side-effects',
  transform(_code, id) {
    return id.includes('/packages/calc/src/')
      ? { code: _code, map: null, moduleSideEffects: false }
      : null;
  },
};

export default defineConfig({
  plugins: [react(), tailwindcss(), engineWithoutSideEffects],
  server: {
    host: '127.0.0.1',
    port: 5173,
    strictPort: true,
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    sourcemap: true,
    // dist/.vite/manifest.json: which chunks each entry and route needs (scripts/check-bundle.ts reads it).
    manifest: true,
    chunkSizeWarningLimit: 1500,
  },
  test: {
    include: ['src/**/*.test.{ts,tsx}'],
    environment: 'jsdom',
    setupFiles: ['./src/test-setup.ts'],
  },
});
