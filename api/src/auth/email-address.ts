/** E-mail addresses are compared trimmed and lower-cased everywhere (storage, look-up, throttling). */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}
