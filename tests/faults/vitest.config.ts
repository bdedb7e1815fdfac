import { defineConfig } from 'vitest/config';

// Fault tests: the built server as a child process, killed, starved of storage and restarted
// on its own throw-away data folder. One file at a time (each starts servers of its own).
// Run from the repository root with `npx vitest run --root tests/faults` after `npm run build`.
export default defineConfig({
  test: {
    include: ['**/*.test.ts'],
    exclude: ['**/node_modules/**'],
    environment: 'node',
    globalSetup: ['./support/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
