import type Stripe from 'stripe';
import type { EntityManager } from 'typeorm';
import type { PayoutAccountView } from '../../../shared/types/order-aftercare';
import type { AppContext } from '../../app-context';
import { User } from '../users/user.entity';
import { PayoutAccount } from './payout-account.entity';
import { payOutSeller } from './payouts.service';

/** An account can receive transfers once onboarding is done and the transfers capability is active. */
export const accountIsReady = (account: Stripe.Account): boolean =>
  account.payouts_enabled === true && account.capabilities?.transfers === 'active';

const present = (row: PayoutAccount | null): PayoutAccountView => ({
  connected: row !== null,
  ready: row?.ready ?? false,
});

/**
 * The seller's payout account, made at the provider the first time they connect one. The provider call carries a
 * key per seller, so two clicks (or a retry after a lost answer) make one account; the unique user id keeps one row.
 */
async function accountFor(ctx: AppContext, userId: number): Promise<PayoutAccount> {
  const existing = await ctx.dataSource.manager.findOneBy(PayoutAccount, { userId });
  if (existing) return existing;
  const user = await ctx.dataSource.manager.findOneByOrFail(User, { id: userId });
  const account = await ctx.payments.accounts.create(
    {
      type: 'express',
      country: 'GB',
      email: user.email,
      capabilities: { transfers: { requested: true } },
      metadata: { user_id: String(userId) },
    },
    { idempotencyKey: `payout-account-user-${userId}` },
  );
  await ctx.dataSource
    .createQueryBuilder()
    .insert()
    .into(PayoutAccount)
    .values({ userId, accountId: account.id, ready: accountIsReady(account) })
    .orIgnore()
    .execute();
  return ctx.dataSource.manager.findOneByOrFail(PayoutAccount, { userId });
}

/** Start (or continue) onboarding: the address of the provider's page, which comes back to the balances page. */
export async function connectPayoutAccount(ctx: AppContext, userId: number): Promise<{ url: string }> {
  const row = await accountFor(ctx, userId);
  const back = `${ctx.config.appOrigin}/my/balances`;
  const link = await ctx.payments.accountLinks.create({
    account: row.accountId,
    type: 'account_onboarding',
    return_url: `${back}?connected=1`,
    refresh_url: `${back}?connected=0`,
  });
  return { url: link.url };
}

/**
 * Note what the provider says about an account; when it has just become ready, pay out the seller's orders that
 * were waiting for it. Used by the account.updated event and by a seller looking at their balances.
 */
export async function noteAccount(
  ctx: AppContext,
  account: Stripe.Account,
  m: EntityManager = ctx.dataSource.manager,
): Promise<PayoutAccount | null> {
  const row = await m.findOneBy(PayoutAccount, { accountId: account.id });
  if (!row) return null;
  const ready = accountIsReady(account);
  if (row.ready !== ready) await m.update(PayoutAccount, row.id, { ready });
  row.ready = ready;
  if (ready) await payOutSeller(ctx, row);
  return row;
}

/** The seller's payout account, asking the provider for its latest state (onboarding may just have finished). */
export async function payoutAccountStatus(ctx: AppContext, userId: number): Promise<PayoutAccountView> {
  const row = await ctx.dataSource.manager.findOneBy(PayoutAccount, { userId });
  if (!row || row.ready) return present(row);
  try {
    return present(await noteAccount(ctx, await ctx.payments.accounts.retrieve(row.accountId)));
  } catch (error) {
    ctx.logger.warn({ err: error, userId }, 'payout account state not refreshed');
    return present(row);
  }
}
