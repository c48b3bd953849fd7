/** API end-to-end tests: the real app on a migrated PostgreSQL (see .scripts/test.mjs for the set-up). */
module.exports = {
  testEnvironment: 'node',
  rootDir: '.',
  testRegex: 'test/.*\\.e2e-spec\\.ts$',
  transform: { '^.+\\.(t|j)s$': require('./jest.swc.js') },
  moduleFileExtensions: ['ts', 'js', 'json'],
  testTimeout: 30000,
};
