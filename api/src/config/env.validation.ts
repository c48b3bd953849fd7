/**
 * Validates the process environment once at boot. Every problem is reported with the variable's name so
 * that a wrong deployment stops with one clear line instead of a stack trace deep inside a module.
 */
export interface LeastlineEnvironment {
  LEASTLINE_DATABASE_URL: string;
  LEASTLINE_PORT: number;
  LEASTLINE_HOST: string;
  LEASTLINE_PUBLIC_URL: string;
  LEASTLINE_SESSION_SECRET: string;
  LEASTLINE_KEY_PEPPER: string;
  LEASTLINE_SMTP_URL: string;
  LEASTLINE_MAIL_FROM: string;
  LEASTLINE_CONSOLE_DIST: string;
  LEASTLINE_LOG_LEVEL: 'fatal' | 'error' | 'warn' | 'info' | 'debug' | 'silent';
  LEASTLINE_BODY_LIMIT_BYTES: number;
  LEASTLINE_UPLOAD_LIMIT_BYTES: number;
  LEASTLINE_PASSWORD_HASH_COST: number;
  LEASTLINE_API_KEY_CACHE_TTL_MS: number;
  LEASTLINE_MAIL_POLL_MS: number;
  LEASTLINE_MAIL_RETRY_BASE_MS: number;
}

export class EnvironmentError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid environment: ${problems.join('; ')}`);
    this.name = 'EnvironmentError';
  }
}

const LOG_LEVELS = ['fatal', 'error', 'warn', 'info', 'debug', 'silent'] as const;

function readString(env: Record<string, unknown>, name: string, problems: string[], fallback?: string): string {
  const raw = env[name];
  if (raw === undefined || raw === '') {
    if (fallback !== undefined) return fallback;
    problems.push(`${name} is required but not set`);
    return '';
  }
  return String(raw);
}

function readInteger(
  env: Record<string, unknown>,
  name: string,
  problems: string[],
  range: { min: number; max: number; fallback?: number },
): number {
  const raw = env[name];
  if (raw === undefined || raw === '') {
    if (range.fallback !== undefined) return range.fallback;
    problems.push(`${name} is required but not set`);
    return 0;
  }
  const value = Number(raw);
  if (!Number.isInteger(value) || value < range.min || value > range.max) {
    problems.push(`${name} must be an integer from ${range.min} to ${range.max} (got "${String(raw)}")`);
  }
  return value;
}

function readUrl(env: Record<string, unknown>, name: string, problems: string[], protocols: string[], fallback?: string) {
  const value = readString(env, name, problems, fallback);
  if (value === '') return value;
  try {
    const url = new URL(value);
    if (!protocols.includes(url.protocol)) {
      problems.push(`${name} must use ${protocols.join(' or ')} (got "${url.protocol}")`);
    }
  } catch {
    problems.push(`${name} must be a URL (got "${value}")`);
  }
  return value;
}

/** Used as ConfigModule's `validate`: returns the typed environment or throws EnvironmentError. */
export function validateEnvironment(env: Record<string, unknown>): LeastlineEnvironment {
  const problems: string[] = [];
  const port = readInteger(env, 'LEASTLINE_PORT', problems, { min: 0, max: 65535, fallback: 4310 });
  const result: LeastlineEnvironment = {
    LEASTLINE_DATABASE_URL: readUrl(env, 'LEASTLINE_DATABASE_URL', problems, ['postgres:', 'postgresql:']),
    LEASTLINE_PORT: port,
    LEASTLINE_HOST: readString(env, 'LEASTLINE_HOST', problems, '127.0.0.1'),
    LEASTLINE_PUBLIC_URL: readUrl(env, 'LEASTLINE_PUBLIC_URL', problems, ['http:', 'https:'], `http://127.0.0.1:${port}`),
    LEASTLINE_SESSION_SECRET: readString(env, 'LEASTLINE_SESSION_SECRET', problems),
    LEASTLINE_KEY_PEPPER: readString(env, 'LEASTLINE_KEY_PEPPER', problems),
    LEASTLINE_SMTP_URL: readUrl(env, 'LEASTLINE_SMTP_URL', problems, ['smtp:', 'smtps:'], 'smtp://127.0.0.1:4325'),
    LEASTLINE_MAIL_FROM: readString(env, 'LEASTLINE_MAIL_FROM', problems, 'Leastline <no-reply@leastline.invalid>'),
    LEASTLINE_CONSOLE_DIST: readString(env, 'LEASTLINE_CONSOLE_DIST', problems, ''),
    LEASTLINE_LOG_LEVEL: readString(env, 'LEASTLINE_LOG_LEVEL', problems, 'info') as LeastlineEnvironment['LEASTLINE_LOG_LEVEL'],
    LEASTLINE_BODY_LIMIT_BYTES: readInteger(env, 'LEASTLINE_BODY_LIMIT_BYTES', problems, {
      min: 1024,
      max: 2 ** 31 - 1,
      fallback: 64 * 1024 * 1024,
    }),
    LEASTLINE_UPLOAD_LIMIT_BYTES: readInteger(env, 'LEASTLINE_UPLOAD_LIMIT_BYTES', problems, {
      min: 1024,
      max: Number.MAX_SAFE_INTEGER,
      fallback: 2 * 1024 * 1024 * 1024,
    }),
    // bcrypt work factor: 12 costs about 0.3 s per hash here; below 10 is too cheap for stored passwords.
    LEASTLINE_PASSWORD_HASH_COST: readInteger(env, 'LEASTLINE_PASSWORD_HASH_COST', problems, { min: 10, max: 15, fallback: 12 }),
    // How long an API process may keep answering from its key cache after a change made elsewhere.
    LEASTLINE_API_KEY_CACHE_TTL_MS: readInteger(env, 'LEASTLINE_API_KEY_CACHE_TTL_MS', problems, {
      min: 0,
      max: 300_000,
      fallback: 30_000,
    }),
    LEASTLINE_MAIL_POLL_MS: readInteger(env, 'LEASTLINE_MAIL_POLL_MS', problems, { min: 50, max: 600_000, fallback: 5_000 }),
    LEASTLINE_MAIL_RETRY_BASE_MS: readInteger(env, 'LEASTLINE_MAIL_RETRY_BASE_MS', problems, {
      min: 10,
      max: 3_600_000,
      fallback: 5_000,
    }),
  };
  // A short session secret makes the signed cookie guessable; 32 bytes is what the session plugin requires.
  if (result.LEASTLINE_SESSION_SECRET && result.LEASTLINE_SESSION_SECRET.length < 32) {
    problems.push('LEASTLINE_SESSION_SECRET must be at least 32 characters');
  }
  if (result.LEASTLINE_KEY_PEPPER && result.LEASTLINE_KEY_PEPPER.length < 16) {
    problems.push('LEASTLINE_KEY_PEPPER must be at least 16 characters');
  }
  if (!LOG_LEVELS.includes(result.LEASTLINE_LOG_LEVEL)) {
    problems.push(`LEASTLINE_LOG_LEVEL must be one of ${LOG_LEVELS.join(', ')}`);
  }
  if (problems.length > 0) throw new EnvironmentError(problems);
  return result;
}
