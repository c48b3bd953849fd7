/** Unit tests: `*.spec.ts` beside the code they test (engine, pure helpers, services with fakes). */
module.exports = {
  testEnvironment: 'node',
  rootDir: 'src',
  testRegex: '.*\\.spec\\.ts$',
  transform: { '^.+\\.(t|j)s$': require('./jest.swc.js') },
  moduleFileExtensions: ['ts', 'js', 'json'],
};
