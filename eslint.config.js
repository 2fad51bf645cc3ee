// @ts-check
import eslint from '@eslint/js';
import angular from 'angular-eslint';
import tseslint from 'typescript-eslint';

const typeAware = {
  languageOptions: {
    parserOptions: {
      project: ['./tsconfig.app.json', './tsconfig.spec.json', './tsconfig.server.json'],
      tsconfigRootDir: import.meta.dirname,
    },
  },
};

export default tseslint.config(
  {
    ignores: [
      'dist/',
      'node_modules/',
      '.angular/',
      'test-results/',
      'out-tsc/',
      'coverage/',
      'drizzle/meta/',
    ],
  },
  {
    files: ['**/*.mjs', '**/*.js'],
    extends: [eslint.configs.recommended],
    languageOptions: { globals: { process: 'readonly', console: 'readonly', URL: 'readonly' } },
  },
  {
    files: ['**/*.ts'],
    extends: [eslint.configs.recommended, ...tseslint.configs.recommendedTypeChecked],
    ...typeAware,
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
      // Express 5 forwards rejected promises from handlers to the error middleware.
      '@typescript-eslint/no-misused-promises': [
        'error',
        { checksVoidReturn: { arguments: false } },
      ],
    },
  },
  {
    files: ['src/**/*.ts'],
    extends: [...angular.configs.tsRecommended],
    processor: angular.processInlineTemplates,
    rules: {
      '@angular-eslint/component-selector': [
        'error',
        { type: 'element', prefix: 'app', style: 'kebab-case' },
      ],
      '@angular-eslint/directive-selector': [
        'error',
        { type: 'attribute', prefix: 'app', style: 'camelCase' },
      ],
      '@angular-eslint/prefer-on-push-component-change-detection': 'error',
    },
  },
  {
    files: ['src/**/*.html'],
    extends: [...angular.configs.templateRecommended, ...angular.configs.templateAccessibility],
  },
  {
    // The shared folder runs in the browser and on the server: no framework, no Node I/O.
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.spec.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: [
                '@angular/*',
                'express',
                'drizzle-orm*',
                'pg',
                'node:*',
                'fs',
                'path',
                'dexie',
              ],
              message: 'shared/ imports no framework and no I/O.',
            },
            {
              group: ['**/server/**', '**/src/**', '**/tools/**'],
              message: 'shared/ depends on nothing above it.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['src/app/core/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/features/**'], message: 'core never imports features.' }] },
      ],
    },
  },
  {
    files: ['**/*.spec.ts', 'tests/**/*.ts'],
    rules: {
      '@typescript-eslint/no-non-null-assertion': 'off',
      '@typescript-eslint/unbound-method': 'off',
      // Test fixtures hand back untyped DOM (`fixture.nativeElement`) and parsed JSON.
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@angular-eslint/prefer-on-push-component-change-detection': 'off',
    },
  },
);
