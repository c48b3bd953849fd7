import { createHash, randomBytes } from 'node:crypto';

/**
 * Single-use secrets sent to people (session cookies, reset and invitation links): 256 random bits,
 * URL-safe. Only the SHA-256 is stored; a fast hash is enough because the input is random, not chosen.
 */
export function createOpaqueToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashOpaqueToken(token) };
}

export function hashOpaqueToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** The exact length of a token from createOpaqueToken (32 bytes in unpadded base64url). */
export const OPAQUE_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;
