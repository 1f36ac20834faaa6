import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { promisify } from 'node:util';
import zlib from 'node:zlib';
import type { RequestHandler } from 'express';

/** Built files worth compressing: text. Images and fonts are compressed already. */
const TEXT_FILE = /^[\w.-]+\.(?:js|mjs|css|svg|json|txt|map)$/;
/** Smaller files gain less than the header costs. */
const MIN_BYTES = 1024;
const ONE_YEAR = 'public, max-age=31536000, immutable';

const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

interface Encoded {
  br: Buffer;
  gzip: Buffer;
  length: number;
}

/** The encoding to send for an Accept-Encoding header: Brotli, else gzip, else none (RFC 9110 §12.5.3). */
export function pickEncoding(acceptEncoding: string | undefined): 'br' | 'gzip' | null {
  const offered = new Map<string, number>();
  for (const part of (acceptEncoding ?? '').toLowerCase().split(',')) {
    const [name = '', ...params] = part.trim().split(';');
    const q = params.map((p) => /^\s*q=([\d.]+)\s*$/.exec(p)?.[1]).find(Boolean);
    offered.set(name.trim(), q === undefined ? 1 : Number(q));
  }
  const allowed = (name: string) => (offered.get(name) ?? offered.get('*') ?? 0) > 0;
  if (allowed('br')) return 'br';
  if (allowed('gzip')) return 'gzip';
  return null;
}

/**
 * Serve the build's hashed text files (scripts, styles, SVG) Brotli- or gzip-compressed, whichever the browser
 * accepts, as immutable for a year: a changed file gets a new name. Each file is compressed on its first request
 * and kept in memory; the set is bounded by the build. Anything else falls through to the plain static handler.
 */
export function compressedAssets(assetsDir: string): RequestHandler {
  const cache = new Map<string, Promise<Encoded | null>>();

  async function encode(name: string): Promise<Encoded | null> {
    let raw: Buffer;
    try {
      raw = await readFile(path.join(assetsDir, name));
    } catch {
      return null;
    }
    if (raw.length < MIN_BYTES) return null;
    const [br, gz] = await Promise.all([
      brotli(raw, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 9 } }),
      gzip(raw, { level: 9 }),
    ]);
    return { br, gzip: gz, length: raw.length };
  }

  return (req, res, next) => {
    const name = req.path.slice(1);
    if ((req.method !== 'GET' && req.method !== 'HEAD') || !TEXT_FILE.test(name)) return next();
    const encoding = pickEncoding(req.headers['accept-encoding']);
    if (!encoding) return next();
    let pending = cache.get(name);
    if (!pending) {
      pending = encode(name);
      cache.set(name, pending);
    }
    pending.then((encoded) => {
      // Only files that exist are remembered, so asking for made-up names cannot fill the memory.
      if (!encoded) {
        cache.delete(name);
        return next();
      }
      const body = encoded[encoding];
      res.vary('Accept-Encoding');
      res.type(path.extname(name));
      res.set({ 'Content-Encoding': encoding, 'Content-Length': String(body.length), 'Cache-Control': ONE_YEAR });
      res.end(req.method === 'HEAD' ? undefined : body);
    }, next);
  };
}
