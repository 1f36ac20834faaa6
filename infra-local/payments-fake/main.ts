// PLACEHOLDER-BY-INFRA-ENGINEER: temporary, deleted after testing services.ts.
import http from 'node:http';
import { parseArgs } from 'node:util';
const { values } = parseArgs({ options: { port: { type: 'string' }, 'webhook-secret': { type: 'string' }, 'webhook-url': { type: 'string' }, 'state-file': { type: 'string' } } });
http.createServer((_q, r) => r.end('{"placeholder":true}')).listen(Number(values.port), '127.0.0.1');
process.once('SIGTERM', () => process.exit(0));
