import { defineConfig } from 'vitest/config';

// Run from the repository root with `vitest run --root tests/reference`.
export default defineConfig({
  test: {
    include: ['**/*.test.ts'],
    exclude: ['**/node_modules/**'],
    environment: 'node',
  },
});
