/** Integration suites under test/: real PostgreSQL, real SMTP, real sockets. */
module.exports = {
  rootDir: '.',
  testEnvironment: 'node',
  testRegex: 'test/.*\\.int-spec\\.ts$',
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json' }] },
  moduleNameMapper: { '^@covalent/shared-types$': '<rootDir>/../shared-types/src/index.ts' },
  setupFiles: ['<rootDir>/test/helpers/env.setup.ts'],
  testTimeout: 30000,
};
