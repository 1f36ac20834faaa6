import { createServer } from 'node:http';
import type { TestProject } from 'vitest/node';
import { build } from 'vite';
import { createApp } from '../../server/app';
import { createDataSource } from '../../server/db/data-source';
import { testConfig } from './test-env';

/**
 * Before the browser tests: build the client, bring the test database up to date, and serve the
 * real app on the test profile's port, as `npm start` would.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  await build({ logLevel: 'warn', configFile: 'vite.config.ts' });
  const config = testConfig({ clientDist: 'dist/client' });
  const dataSource = createDataSource(config.db);
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  await dataSource.destroy();

  const instance = await createApp(config);
  instance.start();
  const server = createServer(instance.app);
  await new Promise<void>((resolve) => server.listen(config.port, config.host, resolve));
  project.provide('appUrl', config.appOrigin);
  project.provide('inboxUrl', config.mail.inboxUrl ?? '');

  return async () => {
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeAllConnections();
    await closed;
    await instance.close();
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    appUrl: string;
    inboxUrl: string;
  }
}
