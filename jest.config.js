// Jest projects for the Node-side suites: the isomorphic shared code and the server.
// The Angular suites use jest.angular.config.js, the browser flows jest.e2e.config.js.
const swc = ['@swc/jest', { jsc: { parser: { syntax: 'typescript' }, target: 'es2022' }, module: { type: 'commonjs' } }];
const aliases = {
  '^@tumblewise/shared$': '<rootDir>/shared/src/index.ts',
  '^@tumblewise/engine$': '<rootDir>/shared/src/engine/public-api.ts',
  '^@tumblewise/engine/worker$': '<rootDir>/shared/src/engine/worker-api.ts',
  // d3-polygon ships ES modules, which these CommonJS tests cannot load, and a UMD build beside them.
  '^d3-polygon$': '<rootDir>/node_modules/d3-polygon/dist/d3-polygon.js',
};
// three.js and three-mesh-bvh (the server's mesh self-intersection check) ship ES modules only
// (three's CommonJS entry is a require(esm) shim): the server's tests compile them to CommonJS.
const swcJs = ['@swc/jest', { jsc: { parser: { syntax: 'ecmascript' }, target: 'es2022' }, module: { type: 'commonjs' } }];
const esmPackages = 'three|three-mesh-bvh';

module.exports = {
  testTimeout: 30000,
  projects: [
    {
      displayName: 'shared',
      rootDir: __dirname,
      testEnvironment: 'node',
      testMatch: ['<rootDir>/shared/**/*.spec.ts'],
      transform: { '^.+\\.ts$': swc },
      moduleNameMapper: aliases,
    },
    {
      displayName: 'server',
      rootDir: __dirname,
      testEnvironment: 'node',
      testMatch: ['<rootDir>/server/**/*.spec.ts'],
      transform: { '^.+\\.ts$': swc, [`/node_modules/(${esmPackages})/.+\\.js$`]: swcJs },
      transformIgnorePatterns: [`/node_modules/(?!(${esmPackages})/)`],
      moduleNameMapper: {
        ...aliases,
        '^three$': '<rootDir>/node_modules/three/build/three.module.js',
        '^three-mesh-bvh$': '<rootDir>/node_modules/three-mesh-bvh/src/index.js',
      },
      globalSetup: '<rootDir>/server/src/test-support/global-setup.ts',
      globalTeardown: '<rootDir>/server/src/test-support/global-teardown.ts',
      setupFiles: ['<rootDir>/server/src/test-support/env.ts'],
    },
  ],
};
