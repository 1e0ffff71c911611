import { defineConfig } from 'vitest/config';

// Browser tests (`npm test` runs them after the unit tests): headless Chromium against the built
// workbench. One file at a time, one browser per file; software WebGL is slow, hence the timeouts.
export default defineConfig({
  test: {
    include: ['test/e2e/**/*.e2e.test.ts'],
    globalSetup: ['test/e2e/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
