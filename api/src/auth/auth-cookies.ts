import type { CookieSerializeOptions } from '@fastify/cookie';

/**
 * Cookie names and the one header name of the console's CSRF defence. The session cookie is httpOnly and
 * SameSite=Strict; the CSRF secret lives in its own httpOnly cookie and the token derived from it must come
 * back in the X-Leastline-Csrf header (a double-submit check that a cross-site form cannot satisfy).
 */
export const SESSION_COOKIE = 'leastline_session';
export const CSRF_COOKIE = 'leastline_csrf';
export const CSRF_HEADER = 'x-leastline-csrf';
export const SESSION_LIFETIME_MS = 12 * 60 * 60 * 1000;

export function sessionCookieOptions(secure: boolean, expiresAt?: Date): CookieSerializeOptions {
  return { path: '/', httpOnly: true, sameSite: 'strict', secure, ...(expiresAt ? { expires: expiresAt } : {}) };
}

export function csrfCookieOptions(secure: boolean): CookieSerializeOptions {
  return { path: '/', httpOnly: true, sameSite: 'strict', secure };
}
