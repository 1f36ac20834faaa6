import { Writable } from 'node:stream';
import express from 'express';
import { pino } from 'pino';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { redactUrl, requestLog } from '../../server/lib/request-log';

/** OWASP ASVS 5.0 V16.2.5 / Logging Cheat Sheet: no secrets such as tokens in logs. */
describe('request log', () => {
  it('hides one-time tokens in logged URLs', () => {
    expect(redactUrl('/verify-email?token=abc123&x=1')).toBe('/verify-email?token=[hidden]&x=1');
  });

  it('writes one line per request with the address, and no cookie or token', async () => {
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk, _enc, done) {
        lines.push(String(chunk));
        done();
      },
    });
    const app = express();
    app.use(requestLog(pino({ level: 'info' }, sink)));
    app.get('/reset-password', (_req, res) => {
      res.send('ok');
    });

    await request(app).get('/reset-password?token=very-secret-token-value').set('Cookie', 'bw.sid=session-secret');

    expect(lines).toHaveLength(1);
    const entry = JSON.parse(lines[0]!) as Record<string, unknown>;
    expect(entry).toHaveProperty('ip');
    expect(lines[0]).not.toContain('very-secret-token-value');
    expect(lines[0]).not.toContain('session-secret');
  });
});
