import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Router } from 'express';
import { compressedAssets } from './compressed-assets';

/**
 * Serve the built client: its hashed assets compressed and immutable for a year, and its index.html (never cached
 * without asking) for every other non-API path (client-side routes).
 */
export function staticClient(distDir: string): Router | null {
  const root = path.resolve(distDir);
  const index = path.join(root, 'index.html');
  if (!existsSync(index)) return null;
  const router = express.Router();
  const assets = path.join(root, 'assets');
  router.use('/assets', compressedAssets(assets));
  router.use('/assets', express.static(assets, { immutable: true, maxAge: '1y', fallthrough: false }));
  router.use(express.static(root, { index: false, maxAge: '1h' }));
  router.get('/{*splat}', (req, res, next) => {
    if (req.path.startsWith('/api/')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return router;
}
