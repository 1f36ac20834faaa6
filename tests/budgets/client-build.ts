import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { build } from 'vite';
import { ROUTE_BUDGETS } from './budgets';
import { readManifest, routeSize, type RouteSize } from './route-sizes';

const ROOT = path.resolve(import.meta.dirname, '../..');

/**
 * Build the client as `npm run build` does, into `outDir` (so a build the browser tests are serving from
 * dist/client is never touched), with its manifest.
 */
export async function buildClient(outDir: string): Promise<void> {
  // Vite builds Vue's development bundle when NODE_ENV says otherwise (Vitest sets "test"): build what ships.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({
      mode: 'production',
      root: ROOT,
      configFile: path.join(ROOT, 'vite.config.ts'),
      logLevel: 'warn',
      build: { outDir, emptyOutDir: true, manifest: true },
    });
  } finally {
    process.env.NODE_ENV = nodeEnv;
  }
}

/** Build the client into a temporary folder and measure every route in the budget table. */
export async function measureClientBuild(): Promise<RouteSize[]> {
  const outDir = mkdtempSync(path.join(os.tmpdir(), 'bw-budget-'));
  try {
    await buildClient(outDir);
    const manifest = readManifest(outDir);
    return ROUTE_BUDGETS.map((budget) => routeSize(outDir, manifest, budget));
  } finally {
    rmSync(outDir, { recursive: true, force: true });
  }
}
