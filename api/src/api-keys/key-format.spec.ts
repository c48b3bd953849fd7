import { createHash } from 'node:crypto';
import {
  API_KEY_PATTERN,
  deriveDemoApiKey,
  formatApiKey,
  generateApiKey,
  hashKeySecret,
  KEY_ALPHABET,
  parseApiKey,
  secretMatches,
} from './key-format';

describe('API key format', () => {
  it('generates keys of the documented shape that parse back to their parts', () => {
    for (let index = 0; index < 50; index++) {
      const key = generateApiKey();
      expect(key.fullKey).toMatch(/^llsq1_[0-9a-hjkmnp-tv-z]{12}_[0-9a-hjkmnp-tv-z]{40}_[0-9a-hjkmnp-tv-z]{8}$/);
      expect(parseApiKey(key.fullKey)).toEqual({ ok: true, keyId: key.keyId, secret: key.secret });
    }
  });

  it('uses a 32-character alphabet without the look-alikes i, l, o and u', () => {
    expect(KEY_ALPHABET).toHaveLength(32);
    expect(new Set(KEY_ALPHABET).size).toBe(32);
    for (const lookAlike of 'ilou') expect(KEY_ALPHABET).not.toContain(lookAlike);
  });

  it('computes the checksum as the first 40 bits of SHA-256 of the rest, in the key alphabet', () => {
    const keyId = 'abcdefghjkmn';
    const secret = '0123456789abcdefghjkmnpqrstvwxyz01234567';
    // Independent re-implementation: take the first 5 bytes (40 bits) and read 5 bits at a time.
    const digest = createHash('sha256').update(`llsq1_${keyId}_${secret}`).digest();
    let bits = '';
    for (const byte of digest.subarray(0, 5)) bits += byte.toString(2).padStart(8, '0');
    const expected = Array.from({ length: 8 }, (_, index) => KEY_ALPHABET[parseInt(bits.slice(index * 5, index * 5 + 5), 2)]).join('');
    expect(formatApiKey(keyId, secret)).toBe(`llsq1_${keyId}_${secret}_${expected}`);
  });

  it('rejects every single-character typo of a key without any look-up', () => {
    const { fullKey } = generateApiKey();
    let checked = 0;
    for (let position = 6; position < fullKey.length; position++) {
      if (fullKey[position] === '_') continue;
      for (const replacement of KEY_ALPHABET) {
        if (replacement === fullKey[position]) continue;
        const typo = fullKey.slice(0, position) + replacement + fullKey.slice(position + 1);
        expect(parseApiKey(typo).ok).toBe(false);
        checked += 1;
      }
    }
    expect(checked).toBe((12 + 40 + 8) * 31);
  });

  it('rejects foreign prefixes, truncation and stray characters with a reason', () => {
    const { fullKey } = generateApiKey();
    for (const candidate of ['other_vendor_key_abc', fullKey.slice(0, -1), `${fullKey}x`, fullKey.toUpperCase(), '']) {
      const parsed = parseApiKey(candidate);
      expect(parsed.ok).toBe(false);
      if (!parsed.ok) expect(parsed.reason.length).toBeGreaterThan(10);
    }
    expect(API_KEY_PATTERN.test(fullKey)).toBe(true);
  });

  it('stores a peppered hash that matches only the right secret and pepper', () => {
    const { secret } = generateApiKey();
    const stored = hashKeySecret(secret, 'pepper-one-0000000');
    expect(stored).not.toContain(secret);
    expect(secretMatches(secret, 'pepper-one-0000000', stored)).toBe(true);
    expect(secretMatches(secret, 'pepper-two-0000000', stored)).toBe(false);
    expect(secretMatches(generateApiKey().secret, 'pepper-one-0000000', stored)).toBe(false);
  });

  it('derives the same demo key from the same pepper and a different one from another', () => {
    const first = deriveDemoApiKey('pepper-one-0000000');
    expect(deriveDemoApiKey('pepper-one-0000000').fullKey).toBe(first.fullKey);
    expect(deriveDemoApiKey('pepper-two-0000000').fullKey).not.toBe(first.fullKey);
    expect(parseApiKey(first.fullKey).ok).toBe(true);
  });
});
