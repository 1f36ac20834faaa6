import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RouteBudget } from './budgets';
import { budgetTable, readManifest, routeSize } from './route-sizes';

/** A small build written by hand: an entry, a page that shares a chunk with it, and a chunk loaded only later. */
let outDir: string;
const files: Record<string, string> = {
  'assets/entry.js': 'entry '.repeat(400),
  'assets/shared.js': 'shared '.repeat(300),
  'assets/page.js': 'page '.repeat(200),
  'assets/later.js': 'later '.repeat(5000),
  'assets/entry.css': 'body{margin:0}'.repeat(50),
  'assets/page.css': '.page{color:red}'.repeat(40),
};
const manifest = {
  'index.html': { file: 'assets/entry.js', isEntry: true, imports: ['_shared.js'], css: ['assets/entry.css'] },
  '_shared.js': { file: 'assets/shared.js' },
  'client/pages/Page.vue': {
    file: 'assets/page.js',
    src: 'client/pages/Page.vue',
    imports: ['_shared.js'],
    dynamicImports: ['client/Later.vue'],
    css: ['assets/page.css'],
  },
  'client/Later.vue': { file: 'assets/later.js', src: 'client/Later.vue' },
};
const gz = (name: string) => gzipSync(Buffer.from(files[name]!), { level: 9 }).length;
const budget = (jsKb: number, cssKb: number): RouteBudget => ({
  route: 'page',
  path: '/page',
  page: 'client/pages/Page.vue',
  jsKb,
  cssKb,
});

beforeAll(() => {
  outDir = mkdtempSync(path.join(os.tmpdir(), 'bw-sizes-'));
  mkdirSync(path.join(outDir, 'assets'));
  mkdirSync(path.join(outDir, '.vite'));
  for (const [name, text] of Object.entries(files)) writeFileSync(path.join(outDir, name), text);
  writeFileSync(path.join(outDir, '.vite/manifest.json'), JSON.stringify(manifest));
});
afterAll(() => rmSync(outDir, { recursive: true, force: true }));

describe('initial download of a route', () => {
  it('counts the entry, the page and their static imports once each, and leaves out lazy chunks', () => {
    const size = routeSize(outDir, readManifest(outDir), budget(100, 100));

    const js = gz('assets/entry.js') + gz('assets/shared.js') + gz('assets/page.js');
    const css = gz('assets/entry.css') + gz('assets/page.css');
    expect(size.jsKb).toBe(Math.round(js / 10) / 100);
    expect(size.cssKb).toBe(Math.round(css / 10) / 100);
    expect(size.files).toBe(5);
    expect(size.overBudget).toEqual([]);
  });

  it('names each limit a route goes over, and marks it in the table', () => {
    const size = routeSize(outDir, readManifest(outDir), budget(0.01, 0.01));

    expect(size.overBudget).toEqual([`page: JS ${size.jsKb} KB > 0.01 KB`, `page: CSS ${size.cssKb} KB > 0.01 KB`]);
    expect(budgetTable([size])).toMatch(/\| page +\| \/page +\|.*\| OVER +\|/);
  });
});
