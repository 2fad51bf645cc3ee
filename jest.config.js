// Server, shared-code and API tests run as native ES modules (oidc-provider and openid-client are
// ESM-only); swc strips the types, so jest needs no TypeScript compiler of its own.
const swc = [
  '@swc/jest',
  {
    jsc: { parser: { syntax: 'typescript' }, target: 'es2022' },
    module: { type: 'es6' },
  },
];

const common = {
  rootDir: '.',
  extensionsToTreatAsEsm: ['.ts'],
  transform: { '^.+\\.ts$': swc },
  moduleNameMapper: { '^@shared/(.*)$': '<rootDir>/shared/$1' },
  testEnvironment: 'node',
};

export default {
  projects: [
    {
      ...common,
      displayName: 'unit',
      testMatch: [
        '<rootDir>/shared/**/*.spec.ts',
        '<rootDir>/server/**/*.spec.ts',
        '<rootDir>/tools/**/*.spec.ts',
      ],
    },
    {
      ...common,
      displayName: 'api',
      testMatch: ['<rootDir>/tests/api/**/*.test.ts'],
      globalSetup: '<rootDir>/tests/api/global-setup.mjs',
    },
    {
      ...common,
      displayName: 'e2e',
      testMatch: ['<rootDir>/tests/e2e/**/*.e2e.ts'],
      // Jest reads `testTimeout` only from the top-level config, so the browser tests set theirs here.
      setupFilesAfterEnv: ['<rootDir>/tests/e2e/support/browser-test-timeout.ts'],
    },
  ],
};
