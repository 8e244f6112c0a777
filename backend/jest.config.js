// Two projects: fast unit specs beside the code (engine included), and e2e specs that boot
// the real app on a throwaway SQLite file.
const tsJest = { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json' }] };
// The engine package is used from its TypeScript source in specs, so they need no engine build.
const moduleNameMapper = {
  '^@thermbay/engine/(.*)$': '<rootDir>/engine/src/$1',
  '^@thermbay/engine$': '<rootDir>/engine/src',
};
module.exports = {
  projects: [
    {
      displayName: 'unit',
      testEnvironment: 'node',
      rootDir: __dirname,
      roots: ['<rootDir>/src'],
      // A cold run compiles the TypeScript on first import; property tests run many cases.
      setupFilesAfterEnv: ['<rootDir>/test/jest-timeout.ts'],
      testMatch: ['**/*.spec.ts'],
      transform: tsJest,
      moduleNameMapper,
      moduleFileExtensions: ['ts', 'js', 'json'],
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      rootDir: __dirname,
      roots: ['<rootDir>/test'],
      setupFiles: ['<rootDir>/test/jest-setup.ts'],
      // Booting the whole app on a cold cache (ts-jest compiling it first) can take several seconds.
      setupFilesAfterEnv: ['<rootDir>/test/jest-timeout.ts'],
      testMatch: ['**/*.e2e-spec.ts'],
      transform: tsJest,
      moduleNameMapper,
      moduleFileExtensions: ['ts', 'js', 'json'],
    },
  ],
};
