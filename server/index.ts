import { createServer } from 'node:http';
import { createApp } from './app';
import { loadConfig } from './config';

/** Start the server and stop it gracefully on SIGTERM/SIGINT: finish requests in flight, then exit 0. */
async function main(): Promise<void> {
  const config = loadConfig();
  const instance = await createApp(config);
  const server = createServer(instance.app);
  server.listen(config.port, config.host, () => {
    instance.ctx.logger.info({ url: `http://${config.host}:${config.port}` }, 'Benchwright is listening');
  });
  instance.start();

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    instance.ctx.logger.info({ signal, drainMs: config.shutdownDrainMs }, 'shutting down');
    // Health answers 503 first, so a load balancer stops sending; requests that still arrive are served in full.
    instance.beginShutdown();
    const forced = setTimeout(() => process.exit(1), config.shutdownDrainMs + 15_000).unref();
    await new Promise((resolve) => setTimeout(resolve, config.shutdownDrainMs));
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    await closed;
    await instance.close();
    clearTimeout(forced);
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop('SIGTERM'));
  process.on('SIGINT', () => void stop('SIGINT'));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
