/// <reference types="vitest/config" />
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const fromHere = (relativePath: string) => fileURLToPath(new URL(relativePath, import.meta.url));

export default defineConfig({
  plugins: [react()],
  resolve: {
    // The UI and the API share one vocabulary (bounds, shapes, quantity kinds): the engine's.
    alias: { '@thermbay/engine/vocabulary': fromHere('../backend/engine/src/vocabulary/index.ts') },
  },
  server: {
    proxy: { '/api': 'http://localhost:3000' },
  },
  build: {
    outDir: fromHere('./dist'),
    emptyOutDir: true,
    chunkSizeWarningLimit: 700,
  },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    exclude: ['e2e/**', 'node_modules/**', 'dist/**'],
    setupFiles: ['src/test/setup.ts'],
    css: false,
    testTimeout: 20_000,
  },
});
