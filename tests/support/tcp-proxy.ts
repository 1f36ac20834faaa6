import type { AddressInfo, Socket } from 'node:net';
import net from 'node:net';

/**
 * A loopback TCP proxy in front of one test service (MariaDB, S3, SMTP, the payments fake), to stage an outage
 * without touching the shared service: `cut()` stops listening (new connections are refused) and destroys every
 * connection already open, as a crashed server or a pulled cable would; `restore()` listens again on the same
 * port, so clients configured with it reconnect without a restart.
 */
export interface TcpProxy {
  readonly host: string;
  readonly port: number;
  /** Connections passed through since the start (both sides open), for checks that traffic did flow. */
  readonly accepted: number;
  readonly isCut: boolean;
  cut(): Promise<void>;
  restore(): Promise<void>;
  close(): Promise<void>;
}

const HOST = '127.0.0.1';

function listen(server: net.Server, port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, HOST, () => {
      server.off('error', reject);
      resolve();
    });
  });
}

/** Start a proxy on a free loopback port that forwards every connection to `targetPort` on 127.0.0.1. */
export async function startTcpProxy(targetPort: number, targetHost = HOST): Promise<TcpProxy> {
  const open = new Set<Socket>();
  let accepted = 0;
  let isCut = false;

  const server = net.createServer((client) => {
    accepted += 1;
    const upstream = net.connect(targetPort, targetHost);
    for (const socket of [client, upstream]) {
      open.add(socket);
      socket.on('close', () => open.delete(socket));
      // Either side failing ends the pair; the error itself is the client's to see.
      socket.on('error', () => {
        client.destroy();
        upstream.destroy();
      });
    }
    client.pipe(upstream);
    upstream.pipe(client);
  });
  await listen(server, 0);
  const { port } = server.address() as AddressInfo;

  const stopListening = () =>
    new Promise<void>((resolve) => {
      if (!server.listening) return resolve();
      server.close(() => resolve());
    });
  const dropConnections = () => {
    for (const socket of open) socket.destroy();
    open.clear();
  };

  return {
    host: HOST,
    port,
    get accepted() {
      return accepted;
    },
    get isCut() {
      return isCut;
    },
    async cut() {
      isCut = true;
      const closed = stopListening();
      dropConnections();
      await closed;
    },
    async restore() {
      if (!isCut) return;
      await listen(server, port);
      isCut = false;
    },
    async close() {
      const closed = stopListening();
      dropConnections();
      await closed;
    },
  };
}

/** A local port with nothing listening on it: a service "down" from the start. */
export async function closedPort(): Promise<number> {
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, HOST, resolve));
  const { port } = probe.address() as AddressInfo;
  await new Promise((resolve) => probe.close(resolve));
  return port;
}
