// Per-profile local secrets, generated on first use and kept in .local/<profile>/secrets.json.
import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { profilePaths, type Profile } from './profile';

export interface LocalSecrets {
  dbPassword: string;
  sessionSecret: string;
  stripeWebhookSecret: string;
}

function generate(): LocalSecrets {
  return {
    dbPassword: randomBytes(24).toString('hex'),
    sessionSecret: randomBytes(48).toString('base64url'),
    stripeWebhookSecret: `whsec_${randomBytes(32).toString('base64url')}`,
  };
}

export function loadOrCreateSecrets(profile: Profile): LocalSecrets {
  const file = profilePaths(profile).secrets;
  let stored: Partial<LocalSecrets> = {};
  try {
    stored = JSON.parse(readFileSync(file, 'utf8')) as Partial<LocalSecrets>;
  } catch {
    // first run (or unreadable): generate below
  }
  const fresh = generate();
  const secrets: LocalSecrets = {
    dbPassword: stored.dbPassword || fresh.dbPassword,
    sessionSecret: stored.sessionSecret || fresh.sessionSecret,
    stripeWebhookSecret: stored.stripeWebhookSecret || fresh.stripeWebhookSecret,
  };
  if (JSON.stringify(secrets) !== JSON.stringify(stored)) {
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, `${JSON.stringify(secrets, null, 2)}\n`, { mode: 0o600 });
  }
  return secrets;
}
