/** Unit suites: colocated *.spec.ts under src/, no database. */
module.exports = {
  rootDir: 'src',
  testEnvironment: 'node',
  testRegex: '.*\\.spec\\.ts$',
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/../tsconfig.json' }] },
  moduleNameMapper: { '^@covalent/shared-types$': '<rootDir>/../../shared-types/src/index.ts' },
};
