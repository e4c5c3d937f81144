// One jest run covers every TypeScript suite except the web app's (Vitest).
// Each project is a room of the repo; `test/run.ts` picks which ones to run.
const swc = [
  '@swc/jest',
  {
    jsc: {
      parser: { syntax: 'typescript', decorators: true },
      transform: { legacyDecorator: true, decoratorMetadata: true },
      target: 'es2022',
    },
    module: { type: 'commonjs' },
  },
];

const shared = {
  transform: { '^.+\\.ts$': swc },
  moduleNameMapper: {
    '^@tallyloom/core$': '<rootDir>/packages/core/src/index.ts',
    '^@tallyloom/reports$': '<rootDir>/reports/src/index.ts',
  },
  testEnvironment: 'node',
  rootDir: __dirname,
};

/** @type {import('jest').Config} */
module.exports = {
  projects: [
    { ...shared, displayName: 'core', testMatch: ['<rootDir>/packages/core/src/**/*.spec.ts'] },
    { ...shared, displayName: 'reports', testMatch: ['<rootDir>/reports/src/**/*.spec.ts'] },
    { ...shared, displayName: 'api', testMatch: ['<rootDir>/services/api/src/**/*.spec.ts'] },
    { ...shared, displayName: 'db', testMatch: ['<rootDir>/db/**/*.spec.ts'] },
    {
      ...shared,
      displayName: 'e2e',
      testMatch: ['<rootDir>/test/e2e/**/*.e2e-spec.ts'],
      // Starting a test app (Nest, MariaDB pool, Redis) can take more than jest's 5 s when the
      // two cores are shared with the other suites; a suite may still ask for more.
      testTimeout: 60_000,
    },
    {
      ...shared,
      displayName: 'browser',
      testMatch: ['<rootDir>/test/browser/**/*.browser-spec.ts'],
    },
  ],
};
