import { createApp } from '../../app';
import { loadConfig } from '../../config';
import { DEMO_LISTINGS } from './data';
import { seedDemo } from './demo-seed';

/**
 * `npm run db:seed`: add the demo scenario (again safely: what is already there is left alone). It runs on a real
 * app instance, so listings, pictures and moderation go through the same services as a seller's and a moderator's.
 * E-mails the moderation sends to the demo sellers are queued and go out when the app next runs.
 */
async function main(): Promise<void> {
  const config = loadConfig();
  if (config.env === 'production') throw new Error('The demo scenario is never seeded in production.');
  const started = Date.now();
  const app = await createApp({ ...config, logLevel: 'warn' });
  try {
    const { accounts, accountsChanged, listings } = await seedDemo(app.ctx);
    console.log(`Demo accounts: ${accounts} (${accountsChanged} created or reset).`);
    console.log(
      `Demo listings: ${DEMO_LISTINGS.length} (${listings.created} created, ${listings.photos} pictures drawn, ` +
        `${listings.moves} moves) in ${((Date.now() - started) / 1000).toFixed(1)} s.`,
    );
    if (listings.skipped.length)
      console.log(`Left as they are (moved off the demo's path): ${listings.skipped.join(', ')}`);
  } finally {
    await app.close();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
