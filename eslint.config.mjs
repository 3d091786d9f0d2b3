// @ts-check
// Lint for the whole tree (`npm run lint`, and the first step of `npm test`). Formatting is
// Prettier's job (`npm run format:check`); eslint-config-prettier turns off the rules it owns.
// Rules that still fire as warnings are listed in DEVELOPERS.md ("Lint and format") with the plan
// to turn them into errors.
import eslint from '@eslint/js';
import angular from 'angular-eslint';
import prettier from 'eslint-config-prettier';
import globals from 'globals';
import tseslint from 'typescript-eslint';

/** Every TypeScript program of the repository, so each file is linted with the types it is compiled with. */
const programs = [
  './tsconfig.json',
  './test/tsconfig.json',
  './apps/designer/tsconfig.spec.json',
  './apps/admin/tsconfig.spec.json',
  './libs/ui/tsconfig.spec.json',
  './libs/api-client/tsconfig.spec.json',
  './libs/viewer/tsconfig.spec.json',
];

/** Rules of the strict sets that would need sweeping changes: warnings for now (DEVELOPERS.md says when each turns on). */
const laterRules = {
  '@typescript-eslint/no-non-null-assertion': 'warn',
  '@typescript-eslint/restrict-template-expressions': 'warn',
  '@typescript-eslint/no-unnecessary-condition': 'warn',
  '@typescript-eslint/no-confusing-void-expression': 'warn',
  '@typescript-eslint/no-unsafe-assignment': 'warn',
  '@typescript-eslint/no-unsafe-member-access': 'warn',
  '@typescript-eslint/no-unsafe-argument': 'warn',
  '@typescript-eslint/no-unsafe-call': 'warn',
  '@typescript-eslint/no-unsafe-return': 'warn',
  '@typescript-eslint/no-unnecessary-type-parameters': 'warn',
  '@typescript-eslint/no-unnecessary-type-conversion': 'warn',
  '@typescript-eslint/no-unnecessary-type-assertion': 'warn',
  '@typescript-eslint/no-unnecessary-boolean-literal-compare': 'warn',
  '@typescript-eslint/restrict-plus-operands': 'warn',
  '@typescript-eslint/no-extraneous-class': 'warn',
  '@typescript-eslint/no-dynamic-delete': 'warn',
  '@typescript-eslint/no-invalid-void-type': 'warn',
  '@typescript-eslint/use-unknown-in-catch-callback-variable': 'warn',
  '@typescript-eslint/no-base-to-string': 'warn',
  '@typescript-eslint/unbound-method': 'warn',
  '@typescript-eslint/no-deprecated': 'warn',
  '@typescript-eslint/require-await': 'warn',
  '@typescript-eslint/no-empty-function': 'warn',
  '@typescript-eslint/only-throw-error': 'warn',
  '@typescript-eslint/prefer-promise-reject-errors': 'warn',
  '@typescript-eslint/no-redundant-type-constituents': 'warn',
  '@typescript-eslint/no-unused-expressions': 'warn',
  '@typescript-eslint/no-this-alias': 'warn',
  '@typescript-eslint/related-getter-setter-pairs': 'warn',
  '@typescript-eslint/no-meaningless-void-operator': 'warn',
  '@typescript-eslint/no-misused-spread': 'warn',
  '@typescript-eslint/prefer-reduce-type-parameter': 'warn',
  '@typescript-eslint/prefer-return-this-type': 'warn',
  '@typescript-eslint/no-unsafe-enum-comparison': 'warn',
  '@typescript-eslint/no-unsafe-unary-minus': 'warn',
  '@typescript-eslint/no-array-delete': 'warn',
  '@typescript-eslint/await-thenable': 'warn',
  '@typescript-eslint/no-unsafe-function-type': 'warn',
  '@typescript-eslint/no-empty-object-type': 'warn',
  '@typescript-eslint/no-require-imports': 'warn',
  'no-empty': 'warn',
  'no-control-regex': 'warn',
  'no-useless-escape': 'warn',
  'no-case-declarations': 'warn',
  'no-constant-condition': 'warn',
  'prefer-const': 'warn',
};

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', '.angular/', '.data/', 'coverage/', 'test-results/'] },
  {
    files: ['**/*.ts'],
    extends: [eslint.configs.recommended, ...tseslint.configs.strictTypeChecked],
    languageOptions: { parserOptions: { project: programs, tsconfigRootDir: import.meta.dirname } },
    rules: {
      // The two that catch real bugs in Node code: a promise nobody awaits, a promise where a callback is expected.
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', ignoreRestSiblings: true },
      ],
      // Angular Material documents its config classes (MatDialogConfig) as plain object literals.
      '@typescript-eslint/no-unsafe-class-instance-assignment': 'off',
      ...laterRules,
    },
  },
  {
    files: ['apps/**/*.ts', 'libs/**/*.ts'],
    extends: [...angular.configs.tsRecommended],
    processor: angular.processInlineTemplates,
    rules: {
      '@angular-eslint/component-selector': ['error', { type: 'element', prefix: 'tw', style: 'kebab-case' }],
      '@angular-eslint/directive-selector': ['error', { type: 'attribute', prefix: 'tw', style: 'camelCase' }],
    },
  },
  {
    files: ['apps/**/*.html', 'libs/**/*.html'],
    extends: [...angular.configs.templateRecommended, ...angular.configs.templateAccessibility],
  },
  {
    files: ['**/*.js', '**/*.mjs', '**/*.cjs'],
    extends: [eslint.configs.recommended],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    // Scripts the benchmarks install in the page.
    files: ['**/*-probe.js'],
    languageOptions: { globals: { ...globals.browser } },
  },
  prettier,
);
