import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { createDataSource } from '../../server/db/data-source';
import { testConfig } from '../support/test-env';

let dataSource: DataSource;
beforeAll(async () => {
  dataSource = createDataSource(testConfig().db);
  await dataSource.initialize();
});
afterAll(() => dataSource.destroy());

describe('migrations', () => {
  it('leave nothing pending', async () => {
    expect(await dataSource.showMigrations()).toBe(false);
  });

  it('build exactly the schema the entities describe', async () => {
    const pending = await dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((q) => q.query)).toEqual([]);
  });
});
