// The payments fake (infra-local/payments-fake/, written separately) as a local service.
import { existsSync } from 'node:fs';
import path from 'node:path';
import { appOrigin, PORTS, REPO_ROOT } from './profile';
import type { LocalSecrets } from './secrets';
import { serviceIdentity, type ServiceDefinition, type UpContext } from './service';

const ENTRY = path.join(REPO_ROOT, 'infra-local/payments-fake/main.ts');

export function paymentsService(ctx: UpContext, secrets: LocalSecrets): ServiceDefinition {
  return {
    ...serviceIdentity(ctx.profile, 'payments'),
    async prepare() {
      if (!existsSync(ENTRY)) throw new Error(`payments: ${ENTRY} is missing`);
    },
    command: () => ({
      // Same as `tsx infra-local/payments-fake/main.ts …`, but one process (see mail.ts).
      command: process.execPath,
      args: [
        '--import',
        'tsx',
        ENTRY,
        '--port',
        String(PORTS[ctx.profile].payments),
        '--webhook-secret',
        secrets.stripeWebhookSecret,
        '--webhook-url',
        `${appOrigin(ctx.profile)}/api/payments/webhook`,
        '--state-file',
        ctx.paths.paymentsState,
      ],
    }),
  };
}
