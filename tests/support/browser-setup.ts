import { CreateBucketCommand, HeadBucketCommand } from '@aws-sdk/client-s3';
import { createServer } from 'node:http';
import type { TestProject } from 'vitest/node';
import { build } from 'vite';
import { createApp } from '../../server/app';
import type { Config } from '../../server/config';
import { createDataSource } from '../../server/db/data-source';
import { createStorage } from '../../server/lib/storage';
import { BROWSER_PHOTO_BUCKET, testConfig } from './test-env';

/**
 * Before the browser tests: build the client, bring the test database up to date, and serve the
 * real app on the test profile's port, as `npm start` would.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  await build({ logLevel: 'warn', configFile: 'vite.config.ts' });
  const base = testConfig({ clientDist: 'dist/client' });
  // Its own photo bucket, so server tests that compare the whole bucket before and after never see its uploads.
  const config = { ...base, s3: { ...base.s3, bucket: BROWSER_PHOTO_BUCKET } };
  await createBucket(config.s3);
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

async function createBucket(s3: Config['s3']): Promise<void> {
  const client = createStorage(s3);
  try {
    await client.send(new HeadBucketCommand({ Bucket: s3.bucket }));
  } catch {
    await client.send(new CreateBucketCommand({ Bucket: s3.bucket }));
  } finally {
    client.destroy();
  }
}

declare module 'vitest' {
  export interface ProvidedContext {
    appUrl: string;
    inboxUrl: string;
  }
}
