// Two projects: plain TypeScript (shared/ and server/, compiled by SWC, Node environment)
// and the Angular app (jest-preset-angular, jsdom). Type checking happens in `npm run typecheck`.
const { createCjsPreset } = require('jest-preset-angular/presets');

const swc = ['@swc/jest', {
  jsc: { parser: { syntax: 'typescript', decorators: true }, target: 'es2022' },
  module: { type: 'commonjs' },
}];

// `@shared/…` is the path alias of tsconfig.json for the pure domain code in shared/.
const sharedAlias = { '^@shared/(.*)$': '<rootDir>/shared/$1' };

module.exports = {
  // Integration tests send real mail through SMTP into maildev and read it back (tests/mail-catcher-setup.cjs).
  globalSetup: '<rootDir>/tests/mail-catcher-setup.cjs',
  globalTeardown: '<rootDir>/tests/mail-catcher-teardown.cjs',
  // Integration tests hash passwords and render photos; 5 s is too little on a busy 2-core machine.
  testTimeout: 30_000,
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      roots: ['<rootDir>/shared', '<rootDir>/server', '<rootDir>/tests'],
      testMatch: ['**/*.spec.ts'],
      transform: { '^.+\\.(t|j)s$': swc },
      setupFiles: ['<rootDir>/tests/setup-env.cjs'],
      moduleNameMapper: sharedAlias,
    },
    {
      displayName: 'web',
      ...createCjsPreset({ tsconfig: '<rootDir>/tsconfig.spec.json' }),
      testEnvironment: 'jest-preset-angular/environments/jest-jsdom-env',
      roots: ['<rootDir>/src'],
      testMatch: ['**/*.spec.ts'],
      setupFilesAfterEnv: ['<rootDir>/src/test-setup.ts'],
      moduleNameMapper: sharedAlias,
    },
  ],
};
