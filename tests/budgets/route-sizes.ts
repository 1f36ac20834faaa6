import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import type { RouteBudget } from './budgets';

/** One chunk as Vite's build manifest (`.vite/manifest.json`) describes it. */
interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

export interface RouteSize {
  budget: RouteBudget;
  jsKb: number;
  cssKb: number;
  files: number;
  overBudget: string[];
}

/** Bytes after gzip at level 9, as servers and most bundle reporters compress static files: common practice, no source. */
const gzipBytes = (file: string) => gzipSync(readFileSync(file), { level: 9 }).length;
const kb = (bytes: number) => Math.round(bytes / 10) / 100;

export function readManifest(outDir: string): Manifest {
  return JSON.parse(readFileSync(path.join(outDir, '.vite/manifest.json'), 'utf8')) as Manifest;
}

/** The chunk and everything it imports statically, transitively: what the browser fetches before running it. */
function staticClosure(manifest: Manifest, key: string, seen: Set<string>): void {
  if (seen.has(key)) return;
  const chunk = manifest[key];
  if (!chunk) throw new Error(`the build manifest has no chunk "${key}"`);
  seen.add(key);
  for (const imported of chunk.imports ?? []) staticClosure(manifest, imported, seen);
}

/** Initial JS and CSS of one route: entry chunk + the page's lazy chunk, each with its static imports. */
export function routeSize(outDir: string, manifest: Manifest, budget: RouteBudget): RouteSize {
  const entry = Object.keys(manifest).find((key) => manifest[key]!.isEntry);
  const page = Object.keys(manifest).find((key) => manifest[key]!.src === budget.page);
  if (!entry) throw new Error('the build manifest has no entry chunk');
  if (!page) throw new Error(`the build manifest has no chunk for ${budget.page}`);
  const chunks = new Set<string>();
  staticClosure(manifest, entry, chunks);
  staticClosure(manifest, page, chunks);
  const js = new Set([...chunks].map((key) => manifest[key]!.file));
  const css = new Set([...chunks].flatMap((key) => manifest[key]!.css ?? []));
  const sum = (files: Set<string>) => [...files].reduce((total, f) => total + gzipBytes(path.join(outDir, f)), 0);
  const jsKb = kb(sum(js));
  const cssKb = kb(sum(css));
  const overBudget = [
    ...(jsKb > budget.jsKb ? [`${budget.route}: JS ${jsKb} KB > ${budget.jsKb} KB`] : []),
    ...(cssKb > budget.cssKb ? [`${budget.route}: CSS ${cssKb} KB > ${budget.cssKb} KB`] : []),
  ];
  return { budget, jsKb, cssKb, files: js.size + css.size, overBudget };
}

/** The per-route table, as printed by `npm run budget` and the budget test. */
export function budgetTable(sizes: RouteSize[]): string {
  const rows = sizes.map((s) => [
    s.budget.route,
    s.budget.path,
    `${s.jsKb.toFixed(1)} / ${s.budget.jsKb}`,
    `${s.cssKb.toFixed(1)} / ${s.budget.cssKb}`,
    String(s.files),
    s.overBudget.length ? 'OVER' : 'ok',
  ]);
  const head = ['route', 'path', 'JS gzip KB / budget', 'CSS gzip KB / budget', 'files', 'result'];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i]!)).join(' | ')} |`;
  return [line(head), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}
