import { randomBytes } from 'node:crypto';
import mysql from 'mysql2/promise';
import type { Config } from '../../../server/config';
import { createDataSource } from '../../../server/db/data-source';
import { testConfig } from '../../support/test-env';

/**
 * A database of its own on the test MariaDB server, migrated to the latest schema and dropped afterwards.
 *
 * Mail tests need it: every running app's dispatcher sends whatever is pending in its database's outbox, so on the
 * shared test database another test's app (the browser tests' server, say) would send an e-mail this test means to
 * hold back. Here the test's own app is the only dispatcher that can see its outbox.
 */
export interface PrivateDatabase {
  db: Config['db'];
  drop(): Promise<void>;
}

/** The test server's administrator, as infra-local/mariadb.ts sets it up: loopback only, no password. */
function connectAsAdministrator(port: number) {
  return mysql.createConnection({ host: '127.0.0.1', port, user: 'root', password: '', connectTimeout: 2000 });
}

export async function createPrivateDatabase(label: string): Promise<PrivateDatabase> {
  const shared = testConfig().db;
  const name = `benchwright_rel_${label}_${randomBytes(3).toString('hex')}`;
  const admin = await connectAsAdministrator(shared.port);
  try {
    await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    for (const host of ['127.0.0.1', 'localhost']) {
      await admin.query(`GRANT ALL PRIVILEGES ON \`${name}\`.* TO ?@?`, [shared.user, host]);
    }
  } finally {
    await admin.end();
  }
  const drop = async () => {
    const connection = await connectAsAdministrator(shared.port);
    try {
      await connection.query(`DROP DATABASE IF EXISTS \`${name}\``);
      for (const host of ['127.0.0.1', 'localhost']) {
        await connection.query(`REVOKE ALL PRIVILEGES ON \`${name}\`.* FROM ?@?`, [shared.user, host]);
      }
    } finally {
      await connection.end();
    }
  };
  const db = { ...shared, database: name };
  const dataSource = createDataSource(db);
  try {
    await dataSource.initialize();
    await dataSource.runMigrations({ transaction: 'each' });
  } catch (error) {
    await drop();
    throw error;
  } finally {
    if (dataSource.isInitialized) await dataSource.destroy();
  }
  return { db, drop };
}
