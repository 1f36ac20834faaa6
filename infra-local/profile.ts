// Ports, paths and the written environment of the local service profiles.
// Shared by infra-local/, the bootstrap scripts and the tests.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export const PROFILES = ['dev', 'test'] as const;
export type Profile = (typeof PROFILES)[number];

export interface ProfilePorts {
  mariadb: number;
  s3: number;
  payments: number;
  smtp: number;
  inbox: number;
  app: number;
}

export const PORTS: Record<Profile, ProfilePorts> = {
  dev: { mariadb: 3307, s3: 4568, payments: 12111, smtp: 1025, inbox: 1080, app: 8080 },
  test: { mariadb: 3308, s3: 4578, payments: 12121, smtp: 1035, inbox: 1090, app: 8090 },
};

export const HOST = '127.0.0.1';
export const S3_BUCKET = 'benchwright-photos';
export const S3_REGION = 'eu-west-2';
export const DB_USER = 'benchwright';

export const REPO_ROOT = path.resolve(import.meta.dirname, '..');

export function isProfile(value: unknown): value is Profile {
  return typeof value === 'string' && (PROFILES as readonly string[]).includes(value);
}

export function databaseName(profile: Profile): string {
  return profile === 'dev' ? 'benchwright' : 'benchwright_test';
}

/** The test profile's second database: `npm run bench` fills it with 20,000 listings, apart from the tests' data. */
export const BENCH_DATABASE = 'benchwright_bench';

/** Every database a profile's MariaDB holds: the app's, and for the test profile the benchmark's too. */
export function databaseNames(profile: Profile): string[] {
  return profile === 'test' ? [databaseName(profile), BENCH_DATABASE] : [databaseName(profile)];
}

export function appOrigin(profile: Profile): string {
  return `http://${HOST}:${PORTS[profile].app}`;
}

export function profilePaths(profile: Profile) {
  const root = path.join(REPO_ROOT, '.local', profile);
  const mariadbDir = path.join(root, 'mariadb');
  return {
    root,
    logs: path.join(root, 'logs'),
    pids: path.join(root, 'pids'),
    lock: path.join(root, 'services.lock'),
    secrets: path.join(root, 'secrets.json'),
    servicesEnv: path.join(root, 'services.env'),
    seededMarker: path.join(root, 'seeded'),
    mariadbDir,
    mariadbData: path.join(mariadbDir, 'data'),
    mariadbSocket: socketPath(path.join(mariadbDir, 'mysqld.sock')),
    mariadbPidFile: path.join(mariadbDir, 'mysqld.pid'),
    s3: path.join(root, 's3'),
    mailStore: path.join(root, 'mail', 'messages.json'),
    paymentsState: path.join(root, 'payments', 'state.json'),
  };
}

// Unix socket paths are limited to about 107 bytes; fall back to the temp dir in deep checkouts.
function socketPath(preferred: string): string {
  if (Buffer.byteLength(preferred) <= 100) return preferred;
  const hash = createHash('sha256').update(preferred).digest('hex').slice(0, 12);
  return path.join(os.tmpdir(), `benchwright-${hash}.sock`);
}

export type ProfilePaths = ReturnType<typeof profilePaths>;

export const SERVICES_ENV_KEYS = [
  'DB_HOST',
  'DB_PORT',
  'DB_NAME',
  'DB_USER',
  'DB_PASSWORD',
  'SESSION_SECRET',
  'S3_ENDPOINT',
  'S3_REGION',
  'S3_BUCKET',
  'S3_ACCESS_KEY_ID',
  'S3_SECRET_ACCESS_KEY',
  'S3_FORCE_PATH_STYLE',
  'STRIPE_SECRET_KEY',
  'STRIPE_API_HOST',
  'STRIPE_API_PORT',
  'STRIPE_API_PROTOCOL',
  'STRIPE_WEBHOOK_SECRET',
  'SMTP_HOST',
  'SMTP_PORT',
  'SMTP_SECURE',
  'SMTP_IGNORE_TLS',
  'MAIL_INBOX_URL',
  'PORT',
  'APP_ORIGIN',
] as const;

export type ServicesEnvKey = (typeof SERVICES_ENV_KEYS)[number];
export type ServicesEnv = Record<ServicesEnvKey, string>;

/** Reads `.local/<profile>/services.env` (written by `services.ts up`). */
export function loadServicesEnv(profile: Profile): ServicesEnv {
  const file = profilePaths(profile).servicesEnv;
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch {
    throw new Error(
      `${file} not found: run \`node_modules/.bin/tsx infra-local/services.ts up --profile ${profile}\` first`,
    );
  }
  const values = new Map<string, string>();
  for (const line of text.split('\n')) {
    const match = /^([A-Z0-9_]+)=(.*)$/.exec(line.trim());
    if (match?.[1] !== undefined && match[2] !== undefined) values.set(match[1], match[2]);
  }
  const env = {} as ServicesEnv;
  for (const key of SERVICES_ENV_KEYS) {
    const value = values.get(key);
    if (value === undefined) throw new Error(`${file} lacks ${key}: run services.ts up again`);
    env[key] = value;
  }
  return env;
}
