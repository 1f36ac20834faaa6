/**
 * Runs the payments fake as a process:
 *   tsx infra-local/payments-fake/main.ts --port 12111 --webhook-url URL --webhook-secret whsec_… --state-file FILE
 * Listens on 127.0.0.1 only; SIGTERM or SIGINT closes it gracefully (exit 0).
 */
import { parseArgs } from 'node:util';
import { createPaymentsFake } from './index';

function fail(message: string): never {
  process.stderr.write(`payments-fake: ${message}\n`);
  process.exit(2);
}

const { values } = parseArgs({
  options: {
    port: { type: 'string', default: '12111' },
    'webhook-url': { type: 'string' },
    'webhook-secret': { type: 'string' },
    'state-file': { type: 'string' },
    'api-version': { type: 'string' },
    quiet: { type: 'boolean', default: false },
  },
  strict: true,
});

const port = Number(values.port);
if (!Number.isInteger(port) || port < 0 || port > 65535) fail(`invalid --port ${values.port}`);
const webhookUrl = values['webhook-url'];
const webhookSecret = values['webhook-secret'];
if (webhookUrl) {
  try {
    new URL(webhookUrl);
  } catch {
    fail(`invalid --webhook-url ${webhookUrl}`);
  }
  if (!webhookSecret?.startsWith('whsec_')) fail('--webhook-url needs --webhook-secret whsec_…');
}

const log = values.quiet ? undefined : (line: string) => process.stdout.write(`[payments-fake] ${line}\n`);

async function main(): Promise<void> {
  const fake = createPaymentsFake({
    port,
    webhookUrl,
    webhookSecret,
    stateFile: values['state-file'],
    apiVersion: values['api-version'],
    log,
  });
  const running = await fake.start();
  process.stdout.write(`[payments-fake] listening on ${running.url}\n`);

  let stopping = false;
  const stop = (signal: NodeJS.Signals): void => {
    if (stopping) {
      process.stderr.write(`[payments-fake] ${signal} again, exiting now\n`);
      process.exit(1);
    }
    stopping = true;
    process.stdout.write(`[payments-fake] ${signal} received, closing\n`);
    running.close().then(
      () => process.exit(0),
      (error: unknown) => {
        process.stderr.write(`[payments-fake] close failed: ${String(error)}\n`);
        process.exit(1);
      },
    );
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((error: unknown) => fail(error instanceof Error ? error.message : String(error)));
