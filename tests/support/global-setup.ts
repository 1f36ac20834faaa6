import { createDataSource } from '../../server/db/data-source';
import { testConfig } from './test-env';

/** Before the server tests: bring the test database up to the latest migration. */
export default async function setup(): Promise<void> {
  const dataSource = createDataSource(testConfig().db);
  await dataSource.initialize();
  try {
    await dataSource.runMigrations({ transaction: 'each' });
  } finally {
    await dataSource.destroy();
  }
}
