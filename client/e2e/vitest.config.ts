import { defineConfig } from 'vitest/config';

// Browser tests: real Chromium (Debian's) driven by playwright-core against the served app.
export default defineConfig({
  test: {
    root: new URL('.', import.meta.url).pathname,
    environment: 'node',
    include: ['**/*.e2e.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
