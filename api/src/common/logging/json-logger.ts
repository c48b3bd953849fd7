import { LoggerService } from '@nestjs/common';

type Level = 'fatal' | 'error' | 'warn' | 'info' | 'debug';
const ORDER: Record<Level | 'silent', number> = { silent: 0, fatal: 1, error: 2, warn: 3, info: 4, debug: 5 };

/**
 * Structured logs: one JSON object per line on stdout, the same shape as the HTTP layer's request logs
 * (level as a word, ISO time, msg, plus fields such as reqId), so one tool can read both.
 */
export class JsonLogger implements LoggerService {
  constructor(private readonly threshold: Level | 'silent' = 'info') {}

  log(message: unknown, context?: string) {
    this.write('info', message, context);
  }
  error(message: unknown, stackOrContext?: string, context?: string) {
    this.write('error', message, context ?? stackOrContext);
  }
  warn(message: unknown, context?: string) {
    this.write('warn', message, context);
  }
  debug(message: unknown, context?: string) {
    this.write('debug', message, context);
  }
  verbose(message: unknown, context?: string) {
    this.write('debug', message, context);
  }
  fatal(message: unknown, context?: string) {
    this.write('fatal', message, context);
  }

  private write(level: Level, message: unknown, context?: string) {
    if (ORDER[level] > ORDER[this.threshold]) return;
    const fields = message && typeof message === 'object' ? (message as Record<string, unknown>) : { msg: String(message) };
    process.stdout.write(`${JSON.stringify({ level, time: new Date().toISOString(), context, ...fields })}\n`);
  }
}
