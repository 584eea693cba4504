/** End-to-end tests: the real app against the real PostgreSQL that `npm test` starts. */
module.exports = {
  rootDir: '.',
  testRegex: '.*\\.e2e-spec\\.ts$',
  moduleFileExtensions: ['ts', 'js', 'json'],
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/../tsconfig.json' }] },
  testEnvironment: 'node',
  testTimeout: 30000,
  globalSetup: '<rootDir>/global-setup.ts',
};
