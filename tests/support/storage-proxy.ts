import http, { type IncomingMessage } from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * A pass-through proxy in front of the test S3 server, to stage storage failures without touching the shared
 * service: `decide` sees each request first and may fail it with 503 (as a struggling store answers) or run
 * something before it is passed on. A whole-service outage (connections refused) is staged with tcp-proxy.ts.
 */
export interface StorageProxy {
  endpoint: string;
  close(): Promise<void>;
}

export type ProxyDecision = 'pass' | 'fail';

export async function startStorageProxy(
  target: string,
  decide: (req: IncomingMessage) => Promise<ProxyDecision> | ProxyDecision,
): Promise<StorageProxy> {
  const to = new URL(target);
  const server = http.createServer(async (req, res) => {
    if ((await decide(req)) === 'fail') {
      req.resume();
      res.writeHead(503, { 'Content-Type': 'application/xml' });
      res.end('<?xml version="1.0"?><Error><Code>ServiceUnavailable</Code><Message>Staged outage</Message></Error>');
      return;
    }
    const upstream = http.request(
      { host: to.hostname, port: to.port, method: req.method, path: req.url, headers: req.headers },
      (answer) => {
        res.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(res);
      },
    );
    upstream.on('error', () => res.destroy());
    req.pipe(upstream);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    endpoint: `http://127.0.0.1:${port}`,
    close: () =>
      new Promise((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
