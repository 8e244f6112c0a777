// The engine's specs sit beside each file; they need nothing but the engine itself.
module.exports = {
  testEnvironment: 'node',
  rootDir: __dirname,
  roots: ['<rootDir>/src'],
  testMatch: ['**/*.spec.ts'],
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json' }] },
  moduleFileExtensions: ['ts', 'js', 'json'],
  // fast-check runs from a fixed seed (FC_SEED overrides it); a failure prints seed and path
  setupFilesAfterEnv: ['<rootDir>/src/testing/fast-check-seed.ts'],
  // A cold run compiles the TypeScript on first import; property tests run many cases.
  testTimeout: 60_000,
};
