import { EnvironmentError, validateEnvironment } from './env.validation';

const complete = {
  LEASTLINE_DATABASE_URL: 'postgres://app@127.0.0.1:5432/app',
  LEASTLINE_SESSION_SECRET: 'x'.repeat(32),
  LEASTLINE_KEY_PEPPER: 'y'.repeat(16),
};

describe('validateEnvironment', () => {
  it('accepts a complete environment and fills documented defaults', () => {
    const env = validateEnvironment(complete);
    expect(env.LEASTLINE_PORT).toBe(4310);
    expect(env.LEASTLINE_HOST).toBe('127.0.0.1');
  });

  it('names the missing variable', () => {
    const { LEASTLINE_DATABASE_URL: _omitted, ...rest } = complete;
    expect(() => validateEnvironment(rest)).toThrow(/LEASTLINE_DATABASE_URL is required/);
  });

  it('names a wrong port and a wrong URL scheme together', () => {
    try {
      validateEnvironment({ ...complete, LEASTLINE_PORT: '99999', LEASTLINE_DATABASE_URL: 'mysql://x/y' });
      throw new Error('expected a failure');
    } catch (error) {
      expect(error).toBeInstanceOf(EnvironmentError);
      const problems = (error as EnvironmentError).problems.join('\n');
      expect(problems).toMatch(/LEASTLINE_PORT must be an integer/);
      expect(problems).toMatch(/LEASTLINE_DATABASE_URL must use postgres:/);
    }
  });

  it('rejects a short session secret', () => {
    expect(() => validateEnvironment({ ...complete, LEASTLINE_SESSION_SECRET: 'short' })).toThrow(
      /LEASTLINE_SESSION_SECRET must be at least 32/,
    );
  });
});
