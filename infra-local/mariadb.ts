// A private MariaDB instance per profile (Debian's mariadb-server binaries, never its system service).
import { spawnSync } from 'node:child_process';
import { accessSync, appendFileSync, constants, existsSync, mkdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import mysql from 'mysql2/promise';
import { databaseNames, DB_USER, HOST, PORTS } from './profile';
import { portAnswers } from './processes';
import type { LocalSecrets } from './secrets';
import { serviceIdentity, type ServiceDefinition, type UpContext } from './service';

const INSTALL_COMMAND = 'apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y mariadb-server';

function findExecutable(name: string, fallbacks: string[]): string | null {
  const dirs = (process.env.PATH ?? '').split(path.delimiter).filter(Boolean);
  for (const candidate of [...dirs.map((dir) => path.join(dir, name)), ...fallbacks]) {
    try {
      accessSync(candidate, constants.X_OK);
      return candidate;
    } catch {
      // keep looking
    }
  }
  return null;
}

const findMariadbd = () => findExecutable('mariadbd', ['/usr/sbin/mariadbd']);

async function ensureInstalled(): Promise<string> {
  const found = findMariadbd();
  if (found) return found;
  if (process.getuid?.() !== 0) {
    throw new Error(`mariadbd is not installed. Install it with:\n  sudo sh -c '${INSTALL_COMMAND}'`);
  }
  console.log(`mariadb: mariadbd not found, installing Debian's mariadb-server (about 30 s)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', 'mariadb-server']]) {
    const result = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (result.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed; run: ${INSTALL_COMMAND}`);
  }
  const installed = findMariadbd();
  if (!installed) throw new Error('mariadb-server installed but mariadbd is still not found');
  if (await portAnswers(3306)) {
    console.log('mariadb: note: the system MariaDB service listens on 3306; nothing here uses it.');
  }
  return installed;
}

function initialiseDataDir(ctx: UpContext, logFile: string): void {
  const { mariadbData, seededMarker } = ctx.paths;
  if (existsSync(path.join(mariadbData, 'mysql'))) return;
  const installDb = findExecutable('mariadb-install-db', ['/usr/bin/mariadb-install-db', '/usr/bin/mysql_install_db']);
  if (!installDb) throw new Error('mariadb-install-db not found (is mariadb-server fully installed?)');
  rmSync(mariadbData, { recursive: true, force: true });
  mkdirSync(mariadbData, { recursive: true });
  console.log(`mariadb: initialising ${mariadbData}`);
  const result = spawnSync(
    installDb,
    [
      `--datadir=${mariadbData}`,
      `--user=${os.userInfo().username}`,
      '--auth-root-authentication-method=normal',
      '--skip-test-db',
    ],
    { encoding: 'utf8' },
  );
  mkdirSync(path.dirname(logFile), { recursive: true });
  appendFileSync(logFile, `\n--- mariadb-install-db\n${result.stdout}${result.stderr}`);
  if (result.status !== 0) {
    rmSync(mariadbData, { recursive: true, force: true }); // so the next attempt starts clean
    throw new Error(`mariadb-install-db failed:\n${result.stdout}${result.stderr}`);
  }
  // A fresh database has no seed data, whatever an old marker says.
  rmSync(seededMarker, { force: true });
}

// Root has no password: the instance listens on 127.0.0.1 only and holds local data only.
function connectAsRoot(port: number) {
  return mysql.createConnection({ host: HOST, port, user: 'root', password: '', connectTimeout: 2000 });
}

export function mariadbService(ctx: UpContext, secrets: LocalSecrets): ServiceDefinition {
  const port = PORTS[ctx.profile].mariadb;
  const identity = serviceIdentity(ctx.profile, 'mariadb');
  let mariadbd = '';
  return {
    ...identity,
    async prepare() {
      mariadbd = await ensureInstalled();
      initialiseDataDir(ctx, identity.logFile);
    },
    command: () => ({
      command: mariadbd,
      args: [
        '--no-defaults',
        `--datadir=${ctx.paths.mariadbData}`,
        `--port=${port}`,
        `--bind-address=${HOST}`,
        `--socket=${ctx.paths.mariadbSocket}`,
        `--pid-file=${ctx.paths.mariadbPidFile}`,
        `--user=${os.userInfo().username}`,
        // --no-defaults also drops Debian's utf8mb4 default; the server default would be latin1.
        '--character-set-server=utf8mb4',
        '--collation-server=utf8mb4_unicode_ci',
      ],
    }),
    async isReady() {
      try {
        const connection = await connectAsRoot(port);
        await connection.end();
        return true;
      } catch {
        return false;
      }
    },
    async configure() {
      const databases = databaseNames(ctx.profile);
      const connection = await connectAsRoot(port);
      try {
        for (const database of databases) {
          await connection.query(
            `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
          );
        }
        for (const host of ['127.0.0.1', 'localhost']) {
          // ALTER as well as CREATE: a regenerated secrets.json must win over an old password.
          await connection.query('CREATE USER IF NOT EXISTS ?@? IDENTIFIED BY ?', [DB_USER, host, secrets.dbPassword]);
          await connection.query('ALTER USER ?@? IDENTIFIED BY ?', [DB_USER, host, secrets.dbPassword]);
          for (const database of databases) {
            await connection.query(`GRANT ALL PRIVILEGES ON \`${database}\`.* TO ?@?`, [DB_USER, host]);
          }
        }
      } finally {
        await connection.end();
      }
    },
  };
}
