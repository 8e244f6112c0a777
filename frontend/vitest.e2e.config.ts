import { defineConfig } from 'vitest/config';

/** Browser tests: the built backend serving the built frontend, driven through Debian's chromium. */
export default defineConfig({
  test: {
    environment: 'node',
    include: ['e2e/**/*.e2e.test.ts'],
    globalSetup: ['e2e/global-setup.ts'],
    // each file starts its own backend on a fresh demo database
    setupFiles: ['e2e/backend-per-file.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
    // One file at a time on E2E_PORT; within a file, tests run in order on that file's database.
    fileParallelism: false,
  },
});
