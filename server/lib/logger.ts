import { pino, type Logger } from 'pino';
import type { Config } from '../config';

/** Paths that must never reach a log line. */
const REDACT = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  '*.password',
  '*.currentPassword',
  '*.newPassword',
  '*.token',
];

export function createLogger(config: Pick<Config, 'logLevel'>): Logger {
  return pino({ level: config.logLevel, redact: { paths: REDACT, censor: '[hidden]' } });
}
