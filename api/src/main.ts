import 'reflect-metadata';
import { EnvironmentError, validateEnvironment } from './config/env.validation';

/**
 * Boot: validate the environment before anything else so a wrong value stops the process with one line
 * naming the variable, then listen. A port in use is reported plainly, not as a stack trace.
 */
async function bootstrap() {
  let env;
  try {
    env = validateEnvironment(process.env);
  } catch (error) {
    if (error instanceof EnvironmentError) {
      process.stderr.write(`Leastline cannot start: ${error.problems.join('; ')}\n`);
      process.exit(78);
    }
    throw error;
  }
  const { createApp } = await import('./configure-app');
  const app = await createApp({
    logLevel: env.LEASTLINE_LOG_LEVEL,
    bodyLimitBytes: env.LEASTLINE_BODY_LIMIT_BYTES,
    consoleDist: env.LEASTLINE_CONSOLE_DIST || undefined,
  });
  try {
    await app.listen(env.LEASTLINE_PORT, env.LEASTLINE_HOST);
  } catch (error) {
    const code = (error as { code?: string }).code;
    if (code === 'EADDRINUSE' || code === 'EACCES') {
      const reason = code === 'EADDRINUSE' ? 'is already in use' : 'needs privileges this process lacks';
      process.stderr.write(
        `Leastline cannot start: port ${env.LEASTLINE_PORT} on ${env.LEASTLINE_HOST} ${reason}; set LEASTLINE_PORT to a free port.\n`,
      );
      await app.close().catch(() => undefined);
      process.exit(75);
    }
    throw error;
  }
  process.stdout.write(
    `${JSON.stringify({ level: 'info', time: new Date().toISOString(), msg: 'listening', url: await app.getUrl() })}\n`,
  );
}

void bootstrap();
