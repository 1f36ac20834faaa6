// The mail fake (infra-local/mail-fake/) as a local service.
import path from 'node:path';
import { PORTS, REPO_ROOT } from './profile';
import { serviceIdentity, type ServiceDefinition, type UpContext } from './service';

export function mailService(ctx: UpContext): ServiceDefinition {
  const ports = PORTS[ctx.profile];
  return {
    ...serviceIdentity(ctx.profile, 'mail'),
    command: () => ({
      // node --import tsx rather than the tsx CLI: one process, so the pid file names the server itself.
      command: process.execPath,
      args: [
        '--import',
        'tsx',
        path.join(REPO_ROOT, 'infra-local/mail-fake/main.ts'),
        '--smtp-port',
        String(ports.smtp),
        '--web-port',
        String(ports.inbox),
        '--store',
        ctx.paths.mailStore,
      ],
    }),
  };
}
