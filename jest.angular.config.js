// Jest projects for the Angular code: both apps and the libraries, in jsdom, zoneless.
// Run with: npx jest -c jest.angular.config.js
const { createCjsPreset } = require('jest-preset-angular/presets');

const aliases = {
  '^@tumblewise/shared$': '<rootDir>/shared/src/index.ts',
  '^@tumblewise/engine$': '<rootDir>/shared/src/engine/public-api.ts',
  '^@tumblewise/engine/stl$': '<rootDir>/shared/src/engine/stl-api.ts',
  // jsdom has no Worker, and the worker's URL uses import.meta, which these CommonJS tests cannot load.
  '^\\./mesh-arrays-thread$': '<rootDir>/libs/viewer/src/scene/mesh-arrays-thread.stub.ts',
  '^@tumblewise/api-client$': '<rootDir>/libs/api-client/src/public-api.ts',
  '^@tumblewise/ui$': '<rootDir>/libs/ui/src/public-api.ts',
  '^@tumblewise/viewer$': '<rootDir>/libs/viewer/src/public-api.ts',
  '^three$': '<rootDir>/node_modules/three/build/three.module.js',
};

/** One jest project per app or library folder, each with its own tsconfig.spec.json and set-up file. */
function angularProject(displayName, folder) {
  const preset = createCjsPreset({
    tsconfig: `<rootDir>/${folder}/tsconfig.spec.json`,
    testEnvironment: 'jest-preset-angular/environments/jest-jsdom-env',
  });
  return {
    ...preset,
    displayName,
    rootDir: __dirname,
    roots: [`<rootDir>/${folder}`],
    testMatch: [`<rootDir>/${folder}/**/*.spec.ts`],
    setupFilesAfterEnv: [`<rootDir>/${folder}/src/test-setup.ts`],
    moduleNameMapper: aliases,
    // three, echarts and zrender ship ESM only: let the preset's transformer process them.
    transformIgnorePatterns: ['node_modules/(?!(.*\\.mjs$|three/|echarts/|zrender/|@angular/common/locales/.*\\.js$))'],
  };
}

module.exports = {
  // A loaded two-core CI machine runs some component tests for seconds; a timeout is not a speed target.
  testTimeout: 30000,
  projects: [
    angularProject('designer', 'apps/designer'),
    angularProject('admin', 'apps/admin'),
    angularProject('ui', 'libs/ui'),
    angularProject('api-client', 'libs/api-client'),
    angularProject('viewer', 'libs/viewer'),
  ],
};
