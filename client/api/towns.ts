import type { TownView } from '@shared/types/towns';
import { http } from './http';

/** Towns whose name starts with `q`, largest first (at most ten), for the town pickers. */
export async function searchTowns(q: string, signal?: AbortSignal): Promise<TownView[]> {
  const { items } = await http.get<{ items: TownView[] }>('/api/towns', { q }, signal);
  return items;
}
