import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/roles';
import { hashPassword } from '../../server/features/auth/password-hash';
import { User } from '../../server/features/users/user.entity';

/** An address no other test uses, on the reserved .test domain. */
export const uniqueEmail = (label = 'member') => `${label}-${randomBytes(5).toString('hex')}@example.test`;

/** A password that passes the policy. */
export const GOOD_PASSWORD = 'sturdy-ply-on-2x1-frames';

let cachedHash: Promise<string> | null = null;

export interface UserOverrides {
  email?: string;
  displayName?: string;
  role?: Role;
  verified?: boolean;
  password?: string;
  suspendedReason?: string;
}

/** Insert an account directly (arrange step); signs in with GOOD_PASSWORD unless told otherwise. */
export async function buildUser(dataSource: DataSource, overrides: UserOverrides = {}): Promise<User> {
  cachedHash ??= hashPassword(GOOD_PASSWORD);
  const passwordHash = overrides.password ? await hashPassword(overrides.password) : await cachedHash;
  const repo = dataSource.getRepository(User);
  return repo.save(
    repo.create({
      email: overrides.email ?? uniqueEmail(overrides.role ?? 'member'),
      displayName: overrides.displayName ?? 'Test Modeller',
      passwordHash,
      role: overrides.role ?? 'member',
      emailVerifiedAt: overrides.verified === false ? null : new Date(),
      suspendedAt: overrides.suspendedReason ? new Date() : null,
      suspendedReason: overrides.suspendedReason ?? null,
    }),
  );
}
