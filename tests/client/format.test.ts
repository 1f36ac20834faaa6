import { describe, expect, it } from 'vitest';
import { formatDate, formatDateTime, formatMoney, formatWait } from '@/utils/format';
import { safeRedirect } from '@/utils/safe-redirect';

describe('British formats', () => {
  it('writes dates day first with a short month name', () => {
    expect(formatDate('2026-03-07T10:00:00')).toBe('7 Mar 2026');
  });

  it('writes times on the 24-hour clock', () => {
    expect(formatDateTime('2026-11-21T16:45:00')).toBe('21 Nov 2026, 16:45');
  });

  it('writes pence as pounds', () => {
    expect(formatMoney(12345)).toBe('£123.45');
    expect(formatMoney(250000, 'EUR')).toBe('€2,500.00');
  });

  it('spells out a wait in the largest sensible unit, rounded up', () => {
    expect(formatWait(1)).toBe('1 second');
    expect(formatWait(90)).toBe('2 minutes');
    expect(formatWait(3600)).toBe('1 hour');
  });
});

describe('the sign-in redirect', () => {
  it('keeps a path inside the site', () => {
    expect(safeRedirect('/account?tab=email')).toBe('/account?tab=email');
  });

  it('falls back to the front page for anything that could leave the site', () => {
    expect(safeRedirect('https://elsewhere.example')).toBe('/');
    expect(safeRedirect('//elsewhere.example')).toBe('/');
    expect(safeRedirect('/\\elsewhere.example')).toBe('/');
    expect(safeRedirect(['/account'])).toBe('/');
  });
});
