// Browser flows in Debian's Chromium through playwright-core, against the real server, database,
// mail catcher and payment fake started by the global set-up. Run through `npm test`.
module.exports = {
  displayName: 'e2e',
  rootDir: __dirname,
  testEnvironment: 'node',
  testMatch: ['<rootDir>/test/**/*.e2e.ts'],
  transform: { '^.+\\.ts$': ['@swc/jest', { jsc: { parser: { syntax: 'typescript' }, target: 'es2022' }, module: { type: 'commonjs' } }] },
  moduleNameMapper: {
    '^@tumblewise/shared$': '<rootDir>/shared/src/index.ts',
    '^@tumblewise/engine$': '<rootDir>/shared/src/engine/public-api.ts',
  },
  globalSetup: '<rootDir>/test/support/e2e-global-setup.ts',
  globalTeardown: '<rootDir>/test/support/e2e-global-teardown.ts',
  maxWorkers: 1,
  testTimeout: 120000,
};
