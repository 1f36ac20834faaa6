import { loadConfig } from '../config';
import { createDataSource } from './data-source';

/** `npm run db:migrate`: apply every pending migration, then exit. */
async function main(): Promise<void> {
  const dataSource = createDataSource(loadConfig().db);
  await dataSource.initialize();
  try {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    console.log(applied.length ? `Applied ${applied.map((m) => m.name).join(', ')}` : 'Database is up to date.');
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
