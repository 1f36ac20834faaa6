import 'reflect-metadata';
import { DataSource } from 'typeorm';
import type { Config } from '../config';
import { entities } from './entities';
import { migrations } from './migrations';

/** The TypeORM connection to MariaDB. The schema changes only through migrations. */
export function createDataSource(db: Config['db']): DataSource {
  return new DataSource({
    type: 'mariadb',
    host: db.host,
    port: db.port,
    username: db.user,
    password: db.password,
    database: db.database,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    entities,
    migrations,
    migrationsTableName: 'schema_migrations',
    synchronize: false,
    logging: false,
    extra: { connectionLimit: 10, connectTimeout: 5000 },
  });
}
