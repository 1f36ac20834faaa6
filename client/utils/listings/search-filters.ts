import type { LocationQuery, LocationQueryRaw } from 'vue-router';
import { LISTING_LIMITS } from '@shared/listings/limits';
import {
  CONTROL_SYSTEMS,
  FINISHES,
  HANDLING_OPTIONS,
  LISTING_KINDS,
  type ControlSystem,
  type Finish,
  type HandlingOption,
  type ListingKind,
} from '@shared/listings/vocabulary';
import { GAUGES_MM, SCALE_IDS } from '@shared/scales';
import { LISTING_SORTS, type ListingSort } from '@shared/listings/sorts';
import type { QueryParams } from '@/api/http';

/** A search as the page holds it; the address bar holds the same, so a search can be shared and reloaded. */
export interface SearchFilters {
  q: string;
  kind: ListingKind | null;
  scale: string[];
  gauge: number[];
  finish: Finish[];
  /** Millimetres. */
  lengthMin: number | null;
  lengthMax: number | null;
  widthMin: number | null;
  widthMax: number | null;
  /** Pence. */
  priceMin: number | null;
  priceMax: number | null;
  town: number | null;
  /** The town's name, kept in the address only so the page can say it without looking it up. */
  townName: string;
  withinKm: number | null;
  handling: HandlingOption[];
  control: ControlSystem[];
  /** The buyer's end profile: each track's offset from the front edge, mm. */
  joinOffsets: number[];
  joinTolerance: number | null;
  sort: ListingSort | null;
  page: number;
}

/** Results per page. */
export const SEARCH_PAGE_SIZE = 24;

export const emptyFilters = (): SearchFilters => ({
  q: '',
  kind: null,
  scale: [],
  gauge: [],
  finish: [],
  lengthMin: null,
  lengthMax: null,
  widthMin: null,
  widthMax: null,
  priceMin: null,
  priceMax: null,
  town: null,
  townName: '',
  withinKm: null,
  handling: [],
  control: [],
  joinOffsets: [],
  joinTolerance: null,
  sort: null,
  page: 1,
});

/** Every text value under `key`, whether repeated (`a=1&a=2`) or comma-joined (`a=1,2`). */
function texts(query: LocationQuery, key: string): string[] {
  const raw = query[key];
  const values = Array.isArray(raw) ? raw : raw === undefined || raw === null ? [] : [raw];
  return values
    .flatMap((v) => (v ?? '').split(','))
    .map((v) => v.trim())
    .filter(Boolean);
}

const one = (query: LocationQuery, key: string): string => texts(query, key).join(',');

function wholeNumber(text: string, max: number): number | null {
  if (!/^\d+$/.test(text)) return null;
  const n = Number(text);
  return n <= max ? n : null;
}

function choices<T extends string>(query: LocationQuery, key: string, allowed: readonly T[]): T[] {
  return [...new Set(texts(query, key).filter((v): v is T => (allowed as readonly string[]).includes(v)))];
}

/** Read the address bar's query, leaving out anything that is not a known value. */
export function filtersFromQuery(query: LocationQuery): SearchFilters {
  const L = LISTING_LIMITS;
  const num = (key: string, max: number) => wholeNumber(one(query, key), max);
  const kind = one(query, 'kind');
  const sort = one(query, 'sort');
  return {
    q: (typeof query.q === 'string' ? query.q : '').slice(0, L.searchTextMax),
    kind: (LISTING_KINDS as readonly string[]).includes(kind) ? (kind as ListingKind) : null,
    scale: choices(query, 'scale', SCALE_IDS),
    gauge: [...new Set(texts(query, 'gauge').map(Number))].filter((g) => GAUGES_MM.includes(g)),
    finish: choices(query, 'finish', FINISHES),
    lengthMin: num('lengthMin', L.lengthMm.max),
    lengthMax: num('lengthMax', L.lengthMm.max),
    widthMin: num('widthMin', L.widthMm.max),
    widthMax: num('widthMax', L.widthMm.max),
    priceMin: num('priceMin', L.priceMinor.max),
    priceMax: num('priceMax', L.priceMinor.max),
    town: num('town', 4_294_967_295) || null,
    townName: typeof query.near === 'string' ? query.near.slice(0, 80) : '',
    withinKm: num('withinKm', L.withinKmMax) || null,
    handling: choices(query, 'handling', HANDLING_OPTIONS),
    control: choices(query, 'control', CONTROL_SYSTEMS),
    joinOffsets: texts(query, 'joinOffsets')
      .map((t) => wholeNumber(t, L.widthMm.max))
      .filter((n): n is number => n !== null)
      .slice(0, L.tracksPerEnd),
    joinTolerance: num('joinTolerance', L.profileToleranceMmMax),
    sort: (LISTING_SORTS as readonly string[]).includes(sort) ? (sort as ListingSort) : null,
    page: Math.max(1, num('page', 10_000) ?? 1),
  };
}

/** The order results come in: the chosen one when it can apply, else relevance with words, else newest. */
export function effectiveSort(f: SearchFilters): ListingSort {
  const usable = f.sort && !(f.sort === 'relevance' && !f.q.trim()) && !(f.sort === 'distance' && !f.town);
  if (usable) return f.sort!;
  return f.q.trim() ? 'relevance' : 'newest';
}

/** The search as query values, lists comma-joined, empty ones left out. */
function queryValues(f: SearchFilters): Record<string, string | undefined> {
  const list = (values: readonly (string | number)[]) => (values.length ? values.join(',') : undefined);
  const n = (value: number | null) => (value === null ? undefined : String(value));
  const hasTown = f.town !== null;
  return {
    q: f.q.trim() || undefined,
    kind: f.kind ?? undefined,
    scale: list(f.scale),
    gauge: list(f.gauge),
    finish: list(f.finish),
    lengthMin: n(f.lengthMin),
    lengthMax: n(f.lengthMax),
    widthMin: n(f.widthMin),
    widthMax: n(f.widthMax),
    priceMin: n(f.priceMin),
    priceMax: n(f.priceMax),
    town: n(f.town),
    near: hasTown ? f.townName || undefined : undefined,
    withinKm: hasTown ? n(f.withinKm) : undefined,
    handling: list(f.handling),
    control: list(f.control),
    joinOffsets: list(f.joinOffsets),
    joinTolerance: f.joinOffsets.length ? n(f.joinTolerance) : undefined,
    sort: f.sort && f.sort === effectiveSort(f) ? f.sort : undefined,
    page: f.page > 1 ? String(f.page) : undefined,
  };
}

/** The address bar's query for a search: only what is set, so shared links stay short. */
export function queryFromFilters(f: SearchFilters): LocationQueryRaw {
  const out: LocationQueryRaw = {};
  for (const [key, value] of Object.entries(queryValues(f))) if (value !== undefined) out[key] = value;
  return out;
}

/** The API's query for a search: the same values, with the order always named and the page size. */
export function apiQueryFromFilters(f: SearchFilters): QueryParams {
  const { near: _near, ...values } = queryValues(f);
  return { ...values, sort: effectiveSort(f), pageSize: SEARCH_PAGE_SIZE };
}
