// Local services CLI.
//   tsx infra-local/services.ts up     --profile dev|test [--record FILE]
//   tsx infra-local/services.ts down   --profile dev|test [--only FILE]
//   tsx infra-local/services.ts status --profile dev|test
// up reuses what already runs, starts the rest and writes .local/<profile>/services.env;
// --record appends the names of the services this call started, for `down --only`.
// status exits 3 when any service is not running.
import { appendFileSync, existsSync, mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { mailService } from './mail';
import { mariadbService } from './mariadb';
import { paymentsService } from './payments';
import { acquireLock } from './processes';
import { isProfile, PORTS, profilePaths, type Profile } from './profile';
import { s3Service } from './s3';
import { loadOrCreateSecrets } from './secrets';
import {
  describe,
  ensureRunning,
  isServiceName,
  SERVICE_NAMES,
  serviceIdentity,
  stopService,
  type ServiceName,
} from './service';
import { writeServicesEnv } from './services-env';

const USAGE = 'usage: tsx infra-local/services.ts up|down|status --profile dev|test [--record FILE] [--only FILE]';

async function up(profile: Profile, recordFile: string | undefined): Promise<void> {
  const paths = profilePaths(profile);
  const secrets = loadOrCreateSecrets(profile);
  const ctx = { profile, paths };
  const services = [mariadbService(ctx, secrets), s3Service(ctx), mailService(ctx), paymentsService(ctx, secrets)];
  if (recordFile) appendFileSync(recordFile, ''); // exists even when nothing needed starting
  const started: ServiceName[] = [];
  const onStarted = (name: ServiceName) => {
    started.push(name);
    if (recordFile) appendFileSync(recordFile, `${name}\n`);
  };

  const results = await Promise.allSettled(services.map((service) => ensureRunning(service, onStarted)));
  const failures = results.flatMap((result) => (result.status === 'rejected' ? [result.reason as unknown] : []));
  if (failures.length > 0) {
    for (const failure of failures) console.error(failure instanceof Error ? failure.message : failure);
    console.error(`up failed; stopping what this call started: ${started.join(', ') || 'nothing'}`);
    await down(profile, started);
    process.exitCode = 1;
    return;
  }
  const envFile = writeServicesEnv(profile, secrets);
  console.log(`${profile} services ready; environment in ${path.relative(process.cwd(), envFile)}`);
  console.log(`inbox: http://127.0.0.1:${PORTS[profile].inbox}`);
}

async function down(profile: Profile, names: readonly ServiceName[]): Promise<void> {
  await Promise.all(
    names.map(async (name) => {
      console.log(`${name}: ${await stopService(serviceIdentity(profile, name))}`);
    }),
  );
}

function namesFrom(file: string): ServiceName[] {
  if (!existsSync(file)) return [];
  const lines = readFileSync(file, 'utf8')
    .split('\n')
    .map((line) => line.trim());
  return [...new Set(lines.filter(isServiceName))];
}

async function status(profile: Profile): Promise<void> {
  const rows = await Promise.all(SERVICE_NAMES.map((name) => describe(serviceIdentity(profile, name))));
  for (const row of rows) console.log(row.text);
  if (!rows.every((row) => row.running)) process.exitCode = 3;
}

async function main(): Promise<void> {
  const { positionals, values } = parseArgs({
    allowPositionals: true,
    options: { profile: { type: 'string' }, record: { type: 'string' }, only: { type: 'string' } },
  });
  const [command, ...extra] = positionals;
  const profile = values.profile;
  if (!isProfile(profile) || extra.length > 0 || !['up', 'down', 'status'].includes(command ?? '')) {
    console.error(USAGE);
    process.exitCode = 2;
    return;
  }
  if (command === 'status') return status(profile);

  const paths = profilePaths(profile);
  mkdirSync(paths.root, { recursive: true });
  const release = await acquireLock(paths.lock);
  process.once('exit', release);
  try {
    if (command === 'up') {
      await up(profile, values.record && path.resolve(values.record));
    } else {
      const names = values.only ? namesFrom(path.resolve(values.only)) : SERVICE_NAMES;
      if (names.length === 0) console.log('nothing to stop');
      await down(profile, names);
    }
  } finally {
    release();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
