import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';

/**
 * Leastline API keys look like
 *
 *     llsq1_<key id: 12>_<secret: 40>_<checksum: 8>
 *
 * in a lower-case base-32 alphabet without the look-alike letters i, l, o and u. "llsq" names the product
 * (least squares) so secret scanners can match it; "1" is the format version. The key id (60 random bits)
 * finds the row; the secret (200 random bits) proves possession and is stored only as an HMAC-SHA-256
 * under the server's pepper. The checksum is the first 40 bits of SHA-256 over everything before it, so a
 * scanner, the SDK or our API can reject a mistyped or truncated key without a database lookup (a random
 * change passes with probability 2^-40).
 */
export const KEY_PREFIX = 'llsq1';
export const KEY_ALPHABET = '0123456789abcdefghjkmnpqrstvwxyz';
export const KEY_ID_LENGTH = 12;
export const KEY_SECRET_LENGTH = 40;
export const KEY_CHECKSUM_LENGTH = 8;

const CHARACTER = `[${KEY_ALPHABET}]`;
export const API_KEY_PATTERN = new RegExp(
  `^${KEY_PREFIX}_(${CHARACTER}{${KEY_ID_LENGTH}})_(${CHARACTER}{${KEY_SECRET_LENGTH}})_(${CHARACTER}{${KEY_CHECKSUM_LENGTH}})$`,
);

/** Base-32 encoding of bytes, most significant bit first, exactly `length` characters. */
function toKeyAlphabet(bytes: Buffer, length: number): string {
  let output = '';
  let buffer = 0;
  let bits = 0;
  for (const byte of bytes) {
    buffer = (buffer << 8) | byte;
    bits += 8;
    while (bits >= 5 && output.length < length) {
      output += KEY_ALPHABET[(buffer >>> (bits - 5)) & 31];
      bits -= 5;
    }
    buffer &= (1 << bits) - 1;
    if (output.length === length) break;
  }
  if (output.length < length) throw new Error(`not enough bytes for ${length} key characters`);
  return output;
}

export function keyChecksum(keyId: string, secret: string): string {
  const digest = createHash('sha256').update(`${KEY_PREFIX}_${keyId}_${secret}`, 'utf8').digest();
  return toKeyAlphabet(digest, KEY_CHECKSUM_LENGTH);
}

export function formatApiKey(keyId: string, secret: string): string {
  return `${KEY_PREFIX}_${keyId}_${secret}_${keyChecksum(keyId, secret)}`;
}

export interface GeneratedApiKey {
  keyId: string;
  secret: string;
  fullKey: string;
}

export function generateApiKey(random: (size: number) => Buffer = randomBytes): GeneratedApiKey {
  const keyId = toKeyAlphabet(random(8), KEY_ID_LENGTH);
  const secret = toKeyAlphabet(random(25), KEY_SECRET_LENGTH);
  return { keyId, secret, fullKey: formatApiKey(keyId, secret) };
}

/**
 * The demo key is derived from the pepper so `npm start` can print it again on every run without storing
 * its plaintext anywhere; a different pepper gives a different demo key.
 */
export function deriveDemoApiKey(pepper: string): GeneratedApiKey {
  const derive = (label: string) => createHmac('sha256', pepper).update(`leastline demo key ${label}`).digest();
  const keyId = toKeyAlphabet(derive('id'), KEY_ID_LENGTH);
  const secret = toKeyAlphabet(derive('secret'), KEY_SECRET_LENGTH);
  return { keyId, secret, fullKey: formatApiKey(keyId, secret) };
}

export type ParsedApiKey = { ok: true; keyId: string; secret: string } | { ok: false; reason: string };

/** Checks shape and checksum only: no I/O, so a mistyped key costs nothing. */
export function parseApiKey(candidate: string): ParsedApiKey {
  const trimmed = candidate.trim();
  if (!trimmed.startsWith(`${KEY_PREFIX}_`)) {
    return { ok: false, reason: `A Leastline key starts with "${KEY_PREFIX}_".` };
  }
  const match = API_KEY_PATTERN.exec(trimmed);
  if (!match) {
    return {
      ok: false,
      reason: `A Leastline key has the form ${KEY_PREFIX}_<12 characters>_<40 characters>_<8 characters>; this one does not.`,
    };
  }
  const [, keyId = '', secret = '', checksum = ''] = match;
  if (keyChecksum(keyId, secret) !== checksum) {
    return { ok: false, reason: 'The checksum at the end of the key does not match: the key was mistyped or truncated.' };
  }
  return { ok: true, keyId, secret };
}

export function hashKeySecret(secret: string, pepper: string): string {
  return createHmac('sha256', pepper).update(secret, 'utf8').digest('hex');
}

export function secretMatches(secret: string, pepper: string, storedHash: string): boolean {
  const candidate = Buffer.from(hashKeySecret(secret, pepper), 'hex');
  const stored = Buffer.from(storedHash, 'hex');
  return candidate.length === stored.length && timingSafeEqual(candidate, stored);
}

/** What the console shows for a key after creation: enough to recognise it, nothing to use it. */
export function displayPrefix(keyId: string): string {
  return `${KEY_PREFIX}_${keyId}_…`;
}
