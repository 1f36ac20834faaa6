declare module 'express-mysql-session' {
  import type { Store } from 'express-session';
  import type { Pool } from 'mysql2';

  interface Options {
    clearExpired?: boolean;
    checkExpirationInterval?: number;
    expiration?: number;
    createDatabaseTable?: boolean;
    endConnectionOnClose?: boolean;
    schema?: { tableName: string; columnNames: { session_id: string; expires: string; data: string } };
  }
  type StoreClass = new (options: Options, connection: Pool) => Store & { close(): Promise<void> };
  export default function MySQLStoreFactory(session: unknown): StoreClass;
}
