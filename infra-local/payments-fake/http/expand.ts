import { invalidRequest } from '../errors';
import type { Store } from '../store';

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Reads `expand[]` loosely (its shape is checked again by the handler's Params). */
export function readExpand(raw: unknown): string[] {
  if (!isRecord(raw)) return [];
  const value = raw.expand;
  if (Array.isArray(value)) return value.filter((item): item is string => typeof item === 'string');
  if (isRecord(value)) return Object.values(value).filter((item): item is string => typeof item === 'string');
  return [];
}

/** Refuses, before anything runs, paths the endpoint cannot expand (Stripe does the same). */
export function checkExpandable(paths: readonly string[], expandable: readonly string[]): void {
  paths.forEach((path, index) => {
    if (!expandable.includes(path)) {
      throw invalidRequest(
        `This property cannot be expanded (${path}). The payments fake expands: ${expandable.join(', ') || 'nothing here'}.`,
        { param: `expand[${index}]` },
      );
    }
  });
}

/** Replaces id strings at the given dotted paths (`latest_charge`, `data.latest_charge`) with the stored objects. */
export function applyExpand(body: object, paths: readonly string[], store: Store): object {
  const copy: unknown = structuredClone(body);
  for (const path of paths) expandAt(copy, path.split('.'), store);
  return copy as object;
}

function expandAt(target: unknown, segments: string[], store: Store): void {
  const [head, ...rest] = segments;
  if (head === undefined || !isRecord(target)) return;
  if (head === 'data' && target.object === 'list' && Array.isArray(target.data)) {
    for (const item of target.data) expandAt(item, rest, store);
    return;
  }
  const value = target[head];
  if (typeof value === 'string') {
    const found = store.findById(value);
    if (found) target[head] = structuredClone(found);
  }
  if (rest.length > 0) expandAt(target[head], rest, store);
}
