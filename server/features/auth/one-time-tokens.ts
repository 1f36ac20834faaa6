import { createHash, randomBytes } from 'node:crypto';
import { type EntityManager, IsNull, MoreThan } from 'typeorm';
import { badRequest } from '../../http/errors';
import { OneTimeToken, type TokenPurpose } from './one-time-token.entity';

/** How long each kind of e-mailed link works. */
export const TOKEN_LIFETIME_MS: Record<TokenPurpose, number> = {
  verify_email: 48 * 3_600_000,
  reset_password: 3_600_000,
  change_email: 24 * 3_600_000,
};

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** Create a token and return the secret to put in the link; only its hash is stored. */
export async function issueToken(
  manager: EntityManager,
  userId: number,
  purpose: TokenPurpose,
  newEmail: string | null = null,
): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await manager.insert(OneTimeToken, {
    tokenHash: hashToken(token),
    purpose,
    userId,
    newEmail,
    expiresAt: new Date(Date.now() + TOKEN_LIFETIME_MS[purpose]),
  });
  return token;
}

/**
 * Use a token once: marks it used in the caller's transaction and returns it, or refuses with
 * a message that says what to do. A second use, an expired or unknown token all answer the same.
 */
export async function consumeToken(
  manager: EntityManager,
  token: string,
  purpose: TokenPurpose,
): Promise<OneTimeToken> {
  const repo = manager.getRepository(OneTimeToken);
  const found = await repo.findOne({
    where: { tokenHash: hashToken(token), purpose, usedAt: IsNull(), expiresAt: MoreThan(new Date()) },
    lock: { mode: 'pessimistic_write' },
  });
  if (!found) {
    throw badRequest('token_invalid', 'This link has expired or has already been used. Ask for a new one.');
  }
  found.usedAt = new Date();
  await repo.save(found);
  return found;
}

/** Retire a user's unused tokens of one kind, e.g. older reset links once a new one is sent. */
export async function retireTokens(manager: EntityManager, userId: number, purpose: TokenPurpose): Promise<void> {
  await manager.update(OneTimeToken, { userId, purpose, usedAt: IsNull() }, { usedAt: new Date() });
}
