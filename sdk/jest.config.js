/** SDK unit tests: the client factory and its middleware, against a scripted fetch (no server needed). */
module.exports = {
  testEnvironment: 'node',
  rootDir: '.',
  testRegex: 'test/.*\\.spec\\.ts$',
  transform: { '^.+\\.(t|j)s$': require('../api/jest.swc.js') },
};
