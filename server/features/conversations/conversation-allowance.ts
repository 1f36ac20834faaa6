import type { EntityManager } from 'typeorm';
import { MESSAGE_BURST, NEW_THREADS_PER_DAY } from '../../../shared/schemas/conversations';
import { tooManyRequests } from '../../http/errors';
import { lockUser } from '../users/user.repository';

type CountRow = { n: number | string; oldest: Date | null };

/**
 * Refuse a message once the sender has used the allowance of MESSAGE_BURST. Counted from the messages themselves
 * (indexed by sender and time) under the sender's row lock, so parallel requests cannot slip past the count and
 * every app server agrees without a separate store.
 */
export async function assertMessageAllowance(m: EntityManager, senderId: number): Promise<void> {
  await lockUser(m, senderId);
  const [row] = (await m.query(
    `SELECT COUNT(*) AS n, MIN(created_at) AS oldest FROM conversation_messages
     WHERE sender_id = ? AND created_at > NOW(3) - INTERVAL ? MINUTE`,
    [senderId, MESSAGE_BURST.minutes],
  )) as CountRow[];
  if (Number(row?.n ?? 0) < MESSAGE_BURST.count) return;
  throw tooManyRequests(
    waitSeconds(row?.oldest ?? null, MESSAGE_BURST.minutes * 60),
    `You have sent ${MESSAGE_BURST.count} messages in ${MESSAGE_BURST.minutes} minutes, the most we allow. Wait a few minutes before sending more.`,
  );
}

/** Refuse a new question thread once the member has started NEW_THREADS_PER_DAY of them in 24 hours. */
export async function assertNewThreadAllowance(m: EntityManager, buyerId: number): Promise<void> {
  const [row] = (await m.query(
    `SELECT COUNT(*) AS n, MIN(created_at) AS oldest FROM conversations
     WHERE buyer_id = ? AND kind = 'listing' AND created_at > NOW(3) - INTERVAL 1 DAY`,
    [buyerId],
  )) as CountRow[];
  if (Number(row?.n ?? 0) < NEW_THREADS_PER_DAY) return;
  throw tooManyRequests(
    waitSeconds(row?.oldest ?? null, 24 * 3600),
    `You have asked about ${NEW_THREADS_PER_DAY} listings today, the most we allow in a day. Carry on in your existing conversations, or ask again tomorrow.`,
  );
}

/** Seconds until the oldest counted item leaves the window. */
function waitSeconds(oldest: Date | null, windowSeconds: number): number {
  if (!oldest) return windowSeconds;
  const leaves = new Date(oldest).getTime() + windowSeconds * 1000;
  return Math.max(1, Math.ceil((leaves - Date.now()) / 1000));
}
