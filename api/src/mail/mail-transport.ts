import nodemailer, { Transporter } from 'nodemailer';

const LOOPBACK_HOSTS = new Set(['127.0.0.1', 'localhost', '::1', '[::1]']);

/**
 * A nodemailer SMTP transport from LEASTLINE_SMTP_URL (`smtp://` or `smtps://`, optional user:password).
 * Short timeouts: a hung mail server must fail an attempt quickly so the retry loop can move on. A local
 * fake on a loopback address is spoken to without STARTTLS.
 */
export function createMailTransport(smtpUrl: string): Transporter {
  const url = new URL(smtpUrl);
  const secure = url.protocol === 'smtps:';
  return nodemailer.createTransport({
    host: url.hostname,
    port: url.port ? Number(url.port) : secure ? 465 : 587,
    secure,
    ignoreTLS: !secure && LOOPBACK_HOSTS.has(url.hostname),
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
}
