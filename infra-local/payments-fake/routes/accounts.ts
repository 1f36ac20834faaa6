import { Router } from 'express';
import { completeOnboarding, defaultCurrencyFor, INITIAL_REQUIREMENTS } from '../domain/accounts';
import { invalidRequest, noSuchParam, notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import type { ApiContext } from '../http/context';
import { LIST_PARAMS, newestFirst, paginate } from '../http/list';
import { newId } from '../ids';
import { Params } from '../params';
import type { Runtime } from '../runtime';
import type { Account, AccountLink, CapabilityStatus } from '../types';

const CAPABILITIES = ['transfers', 'card_payments'] as const;
const BUSINESS_PROFILE_FIELDS = ['name', 'url', 'mcc', 'product_description', 'support_email'] as const;

function findAccount(ctx: ApiContext): Account {
  const id = ctx.path.id ?? '';
  const account = ctx.store.state.accounts[id];
  if (!account) throw notFound('account', id, 'account');
  return account;
}

function readEmail(p: Params): string | null | undefined {
  const email = p.nullableString('email', 800);
  if (email && !/^[^@\s]+@[^@\s]+\.[^@\s]+$/.test(email)) {
    throw invalidRequest(`Invalid email address: ${email}`, { param: 'email', code: 'email_invalid' });
  }
  return email;
}

function readCapabilities(p: Params): string[] | undefined {
  const capabilities = p.object('capabilities', CAPABILITIES);
  if (!capabilities) return undefined;
  return CAPABILITIES.filter((name) => capabilities.object(name, ['requested'])?.bool('requested') === true);
}

function readBusinessProfile(p: Params): Record<string, string | null> | undefined {
  const profile = p.object('business_profile', BUSINESS_PROFILE_FIELDS);
  if (!profile) return undefined;
  const out: Record<string, string | null> = {};
  for (const field of BUSINESS_PROFILE_FIELDS) {
    const value = profile.nullableString(field);
    if (value !== undefined) out[field] = value;
  }
  return out;
}

export function validUrl(p: Params, key: string, required: boolean): string | undefined {
  const value = required ? p.requiredString(key) : p.string(key);
  if (value === undefined) return undefined;
  let ok = false;
  try {
    const url = new URL(value);
    ok = url.protocol === 'http:' || url.protocol === 'https:';
  } catch {
    ok = false;
  }
  if (!ok) throw invalidRequest(`Not a valid URL`, { param: p.name(key), code: 'url_invalid' });
  return value;
}

function create(ctx: ApiContext): Account {
  const p = new Params(ctx.raw, [
    'type',
    'country',
    'email',
    'capabilities',
    'metadata',
    'business_type',
    'business_profile',
    'default_currency',
  ]);
  const type = p.oneOf('type', ['express', 'custom', 'standard'] as const);
  if (!type) throw invalidRequest('Missing required param: type.', { param: 'type', code: 'parameter_missing' });
  const country = (p.string('country') ?? 'GB').toUpperCase();
  if (!/^[A-Z]{2}$/.test(country)) throw invalidRequest(`Invalid country: ${country}`, { param: 'country' });
  const email = readEmail(p) ?? null;
  const requested = readCapabilities(p) ?? [];
  const businessType =
    p.oneOf('business_type', ['individual', 'company', 'non_profit', 'government_entity'] as const) ?? null;
  const businessProfile = readBusinessProfile(p) ?? {};
  const defaultCurrency = p.has('default_currency') ? p.currency('default_currency') : defaultCurrencyFor(country);
  const capabilities: Record<string, CapabilityStatus> = {};
  for (const name of requested) capabilities[name] = 'inactive';
  const account: Account = {
    id: newId('acct'),
    object: 'account',
    business_type: businessType,
    business_profile: businessProfile,
    capabilities,
    charges_enabled: false,
    country,
    created: ctx.now(),
    default_currency: defaultCurrency,
    details_submitted: false,
    email,
    metadata: p.metadata() ?? {},
    payouts_enabled: false,
    requirements: {
      current_deadline: null,
      currently_due: [...INITIAL_REQUIREMENTS],
      disabled_reason: 'requirements.past_due',
      errors: [],
      eventually_due: [...INITIAL_REQUIREMENTS],
      past_due: [...INITIAL_REQUIREMENTS],
      pending_verification: [],
    },
    type,
  };
  ctx.store.state.accounts[account.id] = account;
  return account;
}

function retrieve(ctx: ApiContext): Account {
  new Params(ctx.raw, []);
  return findAccount(ctx);
}

function update(ctx: ApiContext): Account {
  const account = findAccount(ctx);
  const p = new Params(ctx.raw, ['email', 'metadata', 'business_profile', 'capabilities']);
  const email = readEmail(p);
  const metadata = p.metadata(account.metadata);
  const profile = readBusinessProfile(p);
  const requested = readCapabilities(p);
  const previous: Record<string, unknown> = {};
  if (email !== undefined) {
    previous.email = account.email;
    account.email = email;
  }
  if (metadata !== undefined) {
    previous.metadata = account.metadata;
    account.metadata = metadata;
  }
  if (profile !== undefined) {
    previous.business_profile = account.business_profile;
    account.business_profile = { ...account.business_profile, ...profile };
  }
  if (requested !== undefined) {
    previous.capabilities = { ...account.capabilities };
    for (const name of requested) {
      account.capabilities[name] ??= account.details_submitted ? 'active' : 'inactive';
    }
  }
  if (Object.keys(previous).length > 0) ctx.emit('account.updated', account, previous);
  return account;
}

function list(ctx: ApiContext): object {
  const p = new Params(ctx.raw, [...LIST_PARAMS]);
  return paginate(newestFirst(ctx.store.state.accounts), p, '/v1/accounts', 'account');
}

function createLink(ctx: ApiContext): AccountLink {
  const p = new Params(ctx.raw, ['account', 'refresh_url', 'return_url', 'type']);
  const accountId = p.requiredString('account');
  const type = p.oneOf('type', ['account_onboarding', 'account_update'] as const);
  if (!type) throw invalidRequest('Missing required param: type.', { param: 'type', code: 'parameter_missing' });
  const refreshUrl = validUrl(p, 'refresh_url', true) ?? '';
  const returnUrl = validUrl(p, 'return_url', true) ?? '';
  if (!ctx.store.state.accounts[accountId]) throw noSuchParam('account', accountId, 'account');
  const query = new URLSearchParams({ return_url: returnUrl, refresh_url: refreshUrl });
  const created = ctx.now();
  return {
    object: 'account_link',
    created,
    expires_at: created + 300,
    url: `${ctx.baseUrl}/_fake/onboarding/${encodeURIComponent(accountId)}?${query.toString()}`,
  };
}

/** Fake-only: what a seller finishing the hosted onboarding does, without the browser. */
function fakeComplete(ctx: ApiContext): Account {
  new Params(ctx.raw, []);
  return completeOnboarding(ctx, findAccount(ctx));
}

export function accountRoutes(runtime: Runtime): Router {
  const router = Router();
  router.post('/v1/accounts', apiRoute(runtime, create));
  router.get('/v1/accounts', apiRoute(runtime, list));
  router.get('/v1/accounts/:id', apiRoute(runtime, retrieve));
  router.post('/v1/accounts/:id', apiRoute(runtime, update));
  router.post('/v1/account_links', apiRoute(runtime, createLink));
  router.post('/_fake/accounts/:id/complete', apiRoute(runtime, fakeComplete));
  return router;
}
