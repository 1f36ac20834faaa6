import { randomBytes } from 'node:crypto';

const ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

/** Random base62 text of the given length (rejection sampling, so no bias). */
export function randomToken(length: number): string {
  let out = '';
  while (out.length < length) {
    for (const byte of randomBytes(length * 2)) {
      if (byte < 248 && out.length < length) out += ALPHABET[byte % 62];
    }
  }
  return out;
}

/** A Stripe-looking id such as `pi_3PqRs…` (prefix, underscore, 24 characters). */
export function newId(prefix: string): string {
  return `${prefix}_${randomToken(24)}`;
}
