import { defineConfig } from 'vitest/config';

// Browser end-to-end tests: a real server (built app, demo data, throwaway data folder) driven
// through Debian's Chromium with playwright-core. One file at a time: they share the server.
export default defineConfig({
  test: {
    include: ['**/*.e2e.test.ts'],
    environment: 'node',
    globalSetup: ['./global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
