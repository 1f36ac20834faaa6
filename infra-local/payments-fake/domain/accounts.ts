import type { ApiContext } from '../http/context';
import type { Account } from '../types';

export const INITIAL_REQUIREMENTS = ['business_type', 'external_account', 'tos_acceptance.date', 'tos_acceptance.ip'];

export function defaultCurrencyFor(country: string): string {
  if (country === 'GB') return 'gbp';
  if (country === 'US') return 'usd';
  return 'eur';
}

/** What finishing Stripe's hosted onboarding does: details submitted, requested capabilities active. */
export function completeOnboarding(ctx: ApiContext, account: Account): Account {
  const previous = {
    capabilities: { ...account.capabilities },
    charges_enabled: account.charges_enabled,
    details_submitted: account.details_submitted,
    payouts_enabled: account.payouts_enabled,
    requirements: structuredClone(account.requirements),
  };
  const alreadyComplete = account.details_submitted && account.payouts_enabled && account.charges_enabled;
  account.details_submitted = true;
  account.charges_enabled = true;
  account.payouts_enabled = true;
  for (const capability of Object.keys(account.capabilities)) account.capabilities[capability] = 'active';
  account.requirements = {
    current_deadline: null,
    currently_due: [],
    disabled_reason: null,
    errors: [],
    eventually_due: [],
    past_due: [],
    pending_verification: [],
  };
  if (!alreadyComplete) ctx.emit('account.updated', account, previous);
  return account;
}
