/// <reference types="vitest/config" />
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const fromHere = (relativePath: string) => fileURLToPath(new URL(relativePath, import.meta.url));

export default defineConfig({
  plugins: [react()],
  resolve: {
    // The UI's Yup schemas and the API's DTOs refuse the same values: one bounds module.
    alias: { '@bounds': fromHere('../backend/src/engine/bounds.ts') },
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
