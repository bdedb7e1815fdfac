/**
 * Jest runs the server as native ESM (NestJS 12 is ESM-only):
 * `NODE_OPTIONS=--experimental-vm-modules` (see package.json) + ts-jest in ESM mode.
 * @type {import('jest').Config}
 */
export default {
  rootDir: '.',
  testEnvironment: 'node',
  testMatch: ['<rootDir>/src/**/*.spec.ts', '<rootDir>/test/**/*.e2e-spec.ts'],
  extensionsToTreatAsEsm: ['.ts'],
  moduleFileExtensions: ['ts', 'js', 'json'],
  transform: {
    '^.+\\.ts$': ['ts-jest', { useESM: true, tsconfig: '<rootDir>/tsconfig.spec.json' }],
  },
  moduleNameMapper: {
    // `.js` on relative imports (nodenext) → the `.ts` source.
    '^(\\.{1,2}/.*)\\.js$': '$1',
    // Use the shared package's source, so no build is needed before the tests.
    '^@tacet/vibration$': '<rootDir>/../vibration/src/index.ts',
    // @nestjs/throttler is CommonJS and does not load in ESM jest; the real limit is tested
    // over HTTP against the running server.
    '^@nestjs/throttler$': '<rootDir>/test/stubs/throttler.stub.ts',
  },
  testTimeout: 30000,
};
