import { registerAs } from '@nestjs/config';
import { validateEnvironment } from './env.validation';

/**
 * Typed configuration namespaces. Only this folder reads `process.env`; the rest of the code injects
 * these with `@Inject(appConfig.KEY)`.
 */
const env = () => validateEnvironment(process.env);

export const appConfig = registerAs('app', () => {
  const values = env();
  return {
    port: values.LEASTLINE_PORT,
    host: values.LEASTLINE_HOST,
    publicUrl: values.LEASTLINE_PUBLIC_URL.replace(/\/$/, ''),
    consoleDist: values.LEASTLINE_CONSOLE_DIST,
    logLevel: values.LEASTLINE_LOG_LEVEL,
    bodyLimitBytes: values.LEASTLINE_BODY_LIMIT_BYTES,
    uploadLimitBytes: values.LEASTLINE_UPLOAD_LIMIT_BYTES,
  };
});

export const databaseConfig = registerAs('database', () => ({ url: env().LEASTLINE_DATABASE_URL }));

export const securityConfig = registerAs('security', () => {
  const values = env();
  return {
    sessionSecret: values.LEASTLINE_SESSION_SECRET,
    keyPepper: values.LEASTLINE_KEY_PEPPER,
    passwordHashCost: values.LEASTLINE_PASSWORD_HASH_COST,
    apiKeyCacheTtlMs: values.LEASTLINE_API_KEY_CACHE_TTL_MS,
    /** Cookies get the Secure flag whenever the public origin is HTTPS. */
    secureCookies: values.LEASTLINE_PUBLIC_URL.startsWith('https:'),
  };
});

export const mailConfig = registerAs('mail', () => {
  const values = env();
  return {
    smtpUrl: values.LEASTLINE_SMTP_URL,
    from: values.LEASTLINE_MAIL_FROM,
    pollIntervalMs: values.LEASTLINE_MAIL_POLL_MS,
    retryBaseMs: values.LEASTLINE_MAIL_RETRY_BASE_MS,
  };
});

export type AppConfig = ReturnType<typeof appConfig>;
export type DatabaseConfig = ReturnType<typeof databaseConfig>;
export type SecurityConfig = ReturnType<typeof securityConfig>;
export type MailConfig = ReturnType<typeof mailConfig>;

export const CONFIG_NAMESPACES = [appConfig, databaseConfig, securityConfig, mailConfig];
