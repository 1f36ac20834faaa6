// Writes .local/<profile>/services.env: the app's environment for a profile's local services.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import {
  appOrigin,
  databaseName,
  DB_USER,
  HOST,
  PORTS,
  profilePaths,
  S3_BUCKET,
  S3_REGION,
  SERVICES_ENV_KEYS,
  type Profile,
  type ServicesEnv,
} from './profile';
import type { LocalSecrets } from './secrets';

export function servicesEnv(profile: Profile, secrets: LocalSecrets): ServicesEnv {
  const ports = PORTS[profile];
  return {
    DB_HOST: HOST,
    DB_PORT: String(ports.mariadb),
    DB_NAME: databaseName(profile),
    DB_USER: DB_USER,
    DB_PASSWORD: secrets.dbPassword,
    SESSION_SECRET: secrets.sessionSecret,
    S3_ENDPOINT: `http://${HOST}:${ports.s3}`,
    S3_REGION: S3_REGION,
    S3_BUCKET: S3_BUCKET,
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    S3_FORCE_PATH_STYLE: 'true',
    STRIPE_SECRET_KEY: 'sk_test_benchwright_local',
    STRIPE_API_HOST: HOST,
    STRIPE_API_PORT: String(ports.payments),
    STRIPE_API_PROTOCOL: 'http',
    STRIPE_WEBHOOK_SECRET: secrets.stripeWebhookSecret,
    SMTP_HOST: HOST,
    SMTP_PORT: String(ports.smtp),
    SMTP_SECURE: 'false',
    SMTP_IGNORE_TLS: 'true',
    MAIL_INBOX_URL: `http://${HOST}:${ports.inbox}`,
    PORT: String(ports.app),
    APP_ORIGIN: appOrigin(profile),
  };
}

/** Values are plain (no spaces or quotes), so the file can also be `source`d by bash. */
export function writeServicesEnv(profile: Profile, secrets: LocalSecrets): string {
  const file = profilePaths(profile).servicesEnv;
  const env = servicesEnv(profile, secrets);
  mkdirSync(path.dirname(file), { recursive: true });
  const lines = SERVICES_ENV_KEYS.map((key) => `${key}=${env[key]}`);
  writeFileSync(
    file,
    `# Written by infra-local/services.ts up --profile ${profile}; do not edit.\n${lines.join('\n')}\n`,
    {
      mode: 0o600,
    },
  );
  return file;
}
