/**
 * Whole-system tests: the built API (serving the built console) in a child process, a fake SMTP server
 * and headless Chromium. Run from the repository root with the environment .scripts/test.mjs provides.
 */
module.exports = {
  testEnvironment: 'node',
  rootDir: '..',
  testRegex: 'test/.*\\.system-spec\\.ts$',
  testPathIgnorePatterns: ['/node_modules/', '<rootDir>/test/bench/'],
  transform: {
    '^.+\\.(t|j)s$': [
      '@swc/jest',
      {
        jsc: { parser: { syntax: 'typescript' }, target: 'es2022' },
        module: { type: 'commonjs' },
      },
    ],
  },
  moduleFileExtensions: ['ts', 'js', 'json'],
  testTimeout: 60000,
};
