import { DataSource, type DataSourceOptions, type Logger } from 'typeorm';
import type { AppContext } from '../../server/app-context';
import type { Config } from '../../server/config';
import { createDataSource } from '../../server/db/data-source';
import type { Statement } from './load';

/** A TypeORM logger that keeps every statement (text and parameters) instead of printing it. */
class StatementLog implements Logger {
  statements: Statement[] = [];
  logQuery(query: string, parameters?: unknown[]): void {
    this.statements.push({ sql: query, params: [...(parameters ?? [])] });
  }
  logQueryError(): void {}
  logQuerySlow(): void {}
  logSchemaBuild(): void {}
  logMigration(): void {}
  log(): void {}
}

/**
 * Records the SQL a service function sends, by running it once on a connection set up as the app's but with a
 * recording logger: the baseline then replays exactly those statements.
 */
export async function sqlRecorder(db: Config['db']) {
  const log = new StatementLog();
  const dataSource = new DataSource({ ...createDataSource(db).options, logger: log } as DataSourceOptions);
  await dataSource.initialize();
  // The services recorded (search, listing page) read nothing from the context but its data source.
  const ctx = { dataSource } as AppContext;
  // One recording at a time, so the statements of two calls never mix.
  let last: Promise<unknown> = Promise.resolve();
  return {
    record(work: (ctx: AppContext) => Promise<unknown>): Promise<Statement[]> {
      const recording = last.then(async () => {
        log.statements = [];
        await work(ctx);
        return log.statements;
      });
      last = recording.catch(() => undefined);
      return recording;
    },
    close: () => dataSource.destroy(),
  };
}
