import { loadConfig } from '../../config';
import { hashPassword } from '../../features/auth/password-hash';
import { User } from '../../features/users/user.entity';
import { createDataSource } from '../data-source';
import { DEMO_ACCOUNTS } from './demo-accounts';
import { seedDemoListings } from './demo-listings';

/** `npm run db:seed`: add the demo scenario's accounts (again safely: existing ones are reset). */
async function main(): Promise<void> {
  const config = loadConfig();
  if (config.env === 'production') throw new Error('The demo scenario is never seeded in production.');
  const dataSource = createDataSource(config.db);
  await dataSource.initialize();
  try {
    const repo = dataSource.getRepository(User);
    for (const account of DEMO_ACCOUNTS) {
      const existing = await repo.findOneBy({ email: account.email });
      await repo.save(
        repo.create({
          ...existing,
          email: account.email,
          displayName: account.displayName,
          role: account.role,
          passwordHash: await hashPassword(account.password),
          emailVerifiedAt: existing?.emailVerifiedAt ?? new Date(),
          suspendedAt: null,
          suspendedReason: null,
        }),
      );
    }
    console.log(`Seeded ${DEMO_ACCOUNTS.length} demo accounts.`);
    console.log(`Seeded ${await seedDemoListings(dataSource)} demo listings.`);
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
