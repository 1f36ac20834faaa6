import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/db/seeds/demo-accounts';
import { passwordProblem } from '../../server/features/auth/password-policy';
import { signUpSchema } from '../../shared/schemas/auth';

const someone = { email: 'owen.pellby@example.test', displayName: 'Owen Pellby' };

/** NIST SP 800-63B §3.1.1.2: compare new passwords with commonly used ones and context-specific words. */
describe('passwordProblem', () => {
  it.each(['password', 'qwertyuiop', 'iloveyou'])('refuses the common password "%s"', (pw) => {
    expect(passwordProblem(pw, someone)).toMatch(/most commonly used/);
  });

  it.each(['qwertyuiop123', '1234password!!', 'dragondragondragon', 'abcabcabcabc'])(
    'refuses "%s", a common password padded or repeated',
    (pw) => {
      expect(passwordProblem(pw, someone)).toMatch(/most commonly used/);
    },
  );

  it('refuses a password containing the name, the address or the site name', () => {
    expect(passwordProblem('owenpellby-layout', someone)).toMatch(/must not contain/);
    expect(passwordProblem('my owen.pellby secret', someone)).toMatch(/must not contain/);
    expect(passwordProblem('benchwright-rules-ok', someone)).toMatch(/must not contain/);
  });

  it('accepts a passphrase of unrelated words', () => {
    expect(passwordProblem('kettle-gradient-orchard', someone)).toBeNull();
  });

  it('accepts every demo account password, so the seed always works', () => {
    for (const a of DEMO_ACCOUNTS) {
      expect(signUpSchema.safeParse({ email: a.email, displayName: a.displayName, password: a.password }).success).toBe(
        true,
      );
      expect(passwordProblem(a.password, a)).toBeNull();
    }
  });
});
