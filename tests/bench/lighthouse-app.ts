import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:http';
import os from 'node:os';
import path from 'node:path';
import { createApp } from '../../server/app';
import { seedDemo } from '../../server/db/seeds/demo-seed';
import { buildClient } from '../budgets/client-build';
import { createPrivateDatabase } from '../reliability/support/private-database';
import { closedPort } from '../support/tcp-proxy';
import { testConfig } from '../support/test-env';

export interface DemoApp {
  url: string;
  stop(): Promise<void>;
}

/**
 * The app as a visitor meets it, for Lighthouse: a production build of the client, the demo scenario seeded into a
 * private database on the test services (dropped afterwards), served on a free loopback port.
 */
export async function startDemoApp(): Promise<DemoApp> {
  // LIGHTHOUSE_CLIENT_DIST measures a build made elsewhere (kept); otherwise a fresh one is made and removed.
  const given = process.env.LIGHTHOUSE_CLIENT_DIST;
  const clientDist = given ?? mkdtempSync(path.join(os.tmpdir(), 'bw-lighthouse-'));
  if (!given) await buildClient(clientDist);
  const database = await createPrivateDatabase('lighthouse');
  const port = await closedPort();
  const url = `http://127.0.0.1:${port}`;
  const instance = await createApp(
    testConfig({ db: database.db, clientDist, host: '127.0.0.1', port, appOrigin: url, logLevel: 'warn' }),
  );
  const seeded = await seedDemo(instance.ctx);
  console.log(`Demo data: ${seeded.accounts} accounts, ${seeded.listings.created} listings.`);
  const server = createServer(instance.app);
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  return {
    url,
    async stop() {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections();
      await closed;
      await instance.close();
      await database.drop();
      if (!given) rmSync(clientDist, { recursive: true, force: true });
    },
  };
}

/**
 * The same app started in a child process (tests/bench/lighthouse-server.ts), so the measuring process never
 * delays its answers. What it prints is passed on.
 */
export async function startDemoAppProcess(): Promise<DemoApp> {
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(import.meta.dirname, 'lighthouse-server.ts')], {
    stdio: ['pipe', 'pipe', 'inherit'],
    env: process.env,
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const url = await new Promise<string>((resolve, reject) => {
    let partial = '';
    child.stdout.setEncoding('utf8');
    child.stdout.on('data', (chunk: string) => {
      const lines = (partial + chunk).split('\n');
      partial = lines.pop() ?? '';
      for (const line of lines) {
        const ready = /^ready (\S+)$/.exec(line);
        if (ready) resolve(ready[1]!);
        else console.log(line);
      }
    });
    child.once('exit', (code) => reject(new Error(`the demo app stopped before it was ready (exit ${code})`)));
  });
  return {
    url,
    async stop() {
      child.stdin.end();
      await exited;
    },
  };
}
