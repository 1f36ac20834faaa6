import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';

/**
 * The real app for `npm run bench`, in its own process so the load generator does not share its event loop: the
 * bench database from the environment, a free loopback port (sent to the parent), request logging as configured.
 * The planner's per-address limit is lifted, since every request of the load comes from one address.
 */
async function main(): Promise<void> {
  const config = loadConfig();
  const instance = await createApp({
    ...config,
    host: '127.0.0.1',
    port: 0,
    plannerLimitPerMinute: 1_000_000_000,
    rateLimitNamespace: `bench-${process.pid}-${Date.now()}`,
  });
  const server = createServer(instance.app);
  server.listen(0, '127.0.0.1', () => process.send?.({ port: (server.address() as AddressInfo).port }));
  const stop = () => {
    server.close();
    server.closeAllConnections();
    void instance.close().finally(() => process.exit(0));
  };
  process.on('disconnect', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
