import type { AppContext } from '../../app-context';
import { hashPassword, verifyPassword } from '../../features/auth/password-hash';
import { BuilderProfile } from '../../features/builders/builder-profile.entity';
import { User } from '../../features/users/user.entity';
import { DEMO_ACCOUNTS, DEMO_SELLERS, type DemoAccount } from './demo-accounts';
import { DEMO_BUILDER_PROFILES } from './demo-builders';
import { seedDemoListings, type DemoListingsReport } from './demo-listings';
import { seedDemoQuoteRequest } from './demo-quotes';

/** The moderator who decides on the demo's listings. */
const DEMO_MODERATOR = 'tobias@hollinbridge-modellers.test';

export interface DemoSeedReport {
  accounts: number;
  accountsChanged: number;
  listings: DemoListingsReport;
}

/**
 * Create a demo account, or put it back as the scenario describes it (role, name, password, not suspended). An
 * account that already matches is left untouched, so a second run writes nothing.
 */
async function ensureAccount(ctx: AppContext, account: DemoAccount): Promise<{ user: User; changed: boolean }> {
  const repo = ctx.dataSource.getRepository(User);
  const existing = await repo.findOneBy({ email: account.email });
  const passwordHolds = existing ? await verifyPassword(existing.passwordHash, account.password) : false;
  if (
    existing &&
    passwordHolds &&
    existing.displayName === account.displayName &&
    existing.role === account.role &&
    existing.emailVerifiedAt !== null &&
    existing.suspendedAt === null
  )
    return { user: existing, changed: false };
  const user = await repo.save(
    repo.create({
      ...existing,
      email: account.email,
      displayName: account.displayName,
      role: account.role,
      passwordHash: passwordHolds ? existing!.passwordHash : await hashPassword(account.password),
      emailVerifiedAt: existing?.emailVerifiedAt ?? new Date(),
      suspendedAt: null,
      suspendedReason: null,
    }),
  );
  return { user, changed: true };
}

/** Each demo builder's profile, approved by the demo moderator; an approved one is left as it is. */
async function ensureBuilderProfiles(ctx: AppContext, users: ReadonlyMap<string, User>, moderator: User) {
  const repo = ctx.dataSource.getRepository(BuilderProfile);
  for (const demo of DEMO_BUILDER_PROFILES) {
    const user = users.get(demo.email)!;
    const profile = await repo.findOneBy({ userId: user.id });
    if (profile?.state === 'approved') continue;
    const { email: _email, ...fields } = demo;
    await repo.save(
      repo.create({
        ...profile,
        ...fields,
        userId: user.id,
        state: 'approved',
        decidedBy: moderator.id,
        decidedAt: new Date(),
        decisionNote: null,
      }),
    );
  }
}

/**
 * The demo scenario: the four demo sign-ins, the invented sellers, the builders' approved profiles, and every demo
 * listing with its drawings and its history of moves. Safe to run again: nothing that is already in place changes.
 */
export async function seedDemo(ctx: AppContext): Promise<DemoSeedReport> {
  const accounts = [...DEMO_ACCOUNTS, ...DEMO_SELLERS];
  const results = await Promise.all(accounts.map((account) => ensureAccount(ctx, account)));
  const users = new Map(results.map(({ user }) => [user.email, user]));
  const moderator = users.get(DEMO_MODERATOR)!;
  await ensureBuilderProfiles(ctx, users, moderator);
  const listings = await seedDemoListings(ctx, users, moderator);
  await seedDemoQuoteRequest(ctx, users);
  return {
    accounts: accounts.length,
    accountsChanged: results.filter((r) => r.changed).length,
    listings,
  };
}
