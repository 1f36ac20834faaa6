import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { pickEncoding } from '../../server/http/compressed-assets';
import { staticClient } from '../../server/http/static-client';

/** A built client in a temporary folder: index.html, one script, one small style sheet and a font. */
const dist = mkdtempSync(path.join(os.tmpdir(), 'bw-static-'));
const script = `export const boards = [${Array.from({ length: 400 }, (_, i) => `"board ${i}"`).join(',')}];\n`;
mkdirSync(path.join(dist, 'assets'));
writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Benchwright</title>');
writeFileSync(path.join(dist, 'assets', 'index-Ab12Cd34.js'), script);
writeFileSync(path.join(dist, 'assets', 'tiny-Ab12Cd34.css'), 'a{color:green}');
writeFileSync(path.join(dist, 'assets', 'face-Ab12Cd34.woff2'), Buffer.alloc(2048, 7));
const app = express().use(staticClient(dist)!);

/** The body as bytes (supertest has already undone the Content-Encoding). */
const raw = (res: request.Response, done: (err: Error | null, body: Buffer) => void) => {
  const parts: Buffer[] = [];
  res.on('data', (part: Buffer) => parts.push(part));
  res.on('end', () => done(null, Buffer.concat(parts)));
};

describe('the built client as served', () => {
  afterAll(() => rmSync(dist, { recursive: true, force: true }));

  it('sends scripts Brotli-compressed to browsers that accept it, immutable for a year', async () => {
    const res = await request(app)
      .get('/assets/index-Ab12Cd34.js')
      .set('Accept-Encoding', 'gzip, deflate, br')
      .buffer(true)
      .parse(raw);

    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers.vary).toMatch(/Accept-Encoding/);
    expect((res.body as Buffer).toString()).toBe(script);
    expect(Number(res.headers['content-length'])).toBeLessThan(script.length / 3);
  });

  it('sends gzip when Brotli is not accepted, and the plain file when nothing is', async () => {
    const gz = await request(app)
      .get('/assets/index-Ab12Cd34.js')
      .set('Accept-Encoding', 'gzip, br;q=0')
      .buffer(true)
      .parse(raw);
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect((gz.body as Buffer).toString()).toBe(script);
    expect(Number(gz.headers['content-length'])).toBeLessThan(script.length / 3);

    const plain = await request(app).get('/assets/index-Ab12Cd34.js').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(script);
    expect(plain.headers['cache-control']).toMatch(/immutable/);
  });

  it('leaves fonts and files too small to gain as they are, and answers 404 for a missing asset', async () => {
    const font = await request(app).get('/assets/face-Ab12Cd34.woff2').set('Accept-Encoding', 'br');
    expect(font.headers['content-encoding']).toBeUndefined();
    const tiny = await request(app).get('/assets/tiny-Ab12Cd34.css').set('Accept-Encoding', 'br');
    expect(tiny.headers['content-encoding']).toBeUndefined();
    expect(tiny.text).toBe('a{color:green}');

    const missing = await request(app).get('/assets/gone-Zz99.js').set('Accept-Encoding', 'br');
    expect(missing.status).toBe(404);
  });

  it('reads Accept-Encoding with its weights (RFC 9110 §12.5.3)', () => {
    expect(pickEncoding('gzip, deflate, br, zstd')).toBe('br');
    expect(pickEncoding('br;q=0, gzip;q=0.8')).toBe('gzip');
    expect(pickEncoding('*')).toBe('br');
    expect(pickEncoding('*;q=0, identity')).toBeNull();
    expect(pickEncoding(undefined)).toBeNull();
  });
});
