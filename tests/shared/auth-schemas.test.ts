import { describe, expect, it } from 'vitest';
import { changePasswordSchema } from '../../shared/schemas/account';
import { signInSchema, signUpSchema } from '../../shared/schemas/auth';

describe('signUpSchema', () => {
  it('trims and lower-cases the e-mail address', () => {
    const parsed = signUpSchema.parse({
      email: '  Owen@Example.TEST ',
      displayName: ' Owen ',
      password: 'twelve-chars-ok',
    });
    expect(parsed).toEqual({ email: 'owen@example.test', displayName: 'Owen', password: 'twelve-chars-ok' });
  });

  it('states the password length rule in its message', () => {
    const result = signUpSchema.safeParse({ email: 'a@example.test', displayName: 'Al', password: 'elevenchars' });
    expect(result.error?.issues[0]?.message).toBe('Password must be at least 12 characters.');
  });

  it('refuses fields it does not know, such as a role', () => {
    const result = signUpSchema.safeParse({
      email: 'a@example.test',
      displayName: 'Al',
      password: 'twelve-chars-ok',
      role: 'admin',
    });
    expect(result.success).toBe(false);
  });

  it('asks for an address in a recognisable form', () => {
    const result = signUpSchema.safeParse({ email: 'not an address', displayName: 'Al', password: 'twelve-chars-ok' });
    expect(result.error?.issues[0]?.message).toBe('Enter an e-mail address like name@example.org.');
  });
});

describe('signInSchema', () => {
  it('accepts an existing password of any length up to the cap', () => {
    expect(signInSchema.safeParse({ email: 'a@example.test', password: 'short' }).success).toBe(true);
    expect(signInSchema.safeParse({ email: 'a@example.test', password: 'x'.repeat(129) }).success).toBe(false);
  });
});

describe('changePasswordSchema', () => {
  it('puts "choose a different password" on the new-password field', () => {
    const result = changePasswordSchema.safeParse({
      currentPassword: 'same-password-twice',
      newPassword: 'same-password-twice',
    });
    expect(result.error?.issues[0]?.path).toEqual(['newPassword']);
  });
});
