import { defineConfig } from 'vitest/config';

/** Browser tests: the built backend serving the built frontend, driven through Debian's chromium. */
export default defineConfig({
  test: {
    environment: 'node',
    include: ['e2e/**/*.e2e.test.ts'],
    globalSetup: ['e2e/global-setup.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
    // One browser at a time against one backend: tests share the demo database.
    fileParallelism: false,
  },
});
