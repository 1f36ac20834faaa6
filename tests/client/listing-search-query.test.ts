import { describe, expect, it } from 'vitest';
import { filterChips, withoutAllFilters, withoutChip } from '@/utils/listings/search-chips';
import {
  apiQueryFromFilters,
  emptyFilters,
  filtersFromQuery,
  queryFromFilters,
  type SearchFilters,
} from '@/utils/listings/search-filters';

const mm = (n: number) => `${n} mm`;

/** A search with something in every filter, several values where a filter takes several. */
function everyFilter(): SearchFilters {
  return {
    ...emptyFilters(),
    q: 'fiddle yard',
    kind: 'module',
    scale: ['oo', 'h0'],
    gauge: [9, 16.5],
    finish: ['topped', 'track-laid'],
    lengthMin: 600,
    lengthMax: 1200,
    widthMin: 300,
    widthMax: 600,
    priceMin: 5_000,
    priceMax: 25_000,
    town: 2652002,
    townName: 'Crewe',
    withinKm: 50,
    handling: ['collection', 'parcel'],
    control: ['dcc'],
    joinOffsets: [150, 196],
    joinTolerance: 5,
    sort: 'distance',
    page: 3,
  };
}

describe('the search held in the address bar', () => {
  it('reads back every filter it wrote, several values each', () => {
    const search = everyFilter();

    const query = queryFromFilters(search);

    expect(query.scale).toBe('oo,h0');
    expect(query.handling).toBe('collection,parcel');
    expect(filtersFromQuery(query as Record<string, string>)).toEqual(search);
  });

  it('reads a filter given as repeated keys the same as comma-joined', () => {
    const repeated = filtersFromQuery({ scale: ['oo', 'h0'], finish: ['topped'] });
    const joined = filtersFromQuery({ scale: 'oo,h0', finish: 'topped' });

    expect(repeated).toEqual(joined);
    expect(repeated.scale).toEqual(['oo', 'h0']);
  });

  it('leaves out values it does not know rather than failing', () => {
    const search = filtersFromQuery({ scale: 'oo,warp-drive', gauge: '16.5,17', page: 'lots', handling: 'teleport' });

    expect(search.scale).toEqual(['oo']);
    expect(search.gauge).toEqual([16.5]);
    expect(search.page).toBe(1);
    expect(search.handling).toEqual([]);
  });

  it('writes nothing for an empty search, so shared links stay short', () => {
    expect(queryFromFilters(emptyFilters())).toEqual({});
  });

  it('drops an order that cannot apply: relevance without words, distance without a town', () => {
    expect(queryFromFilters({ ...emptyFilters(), sort: 'relevance' }).sort).toBeUndefined();
    expect(apiQueryFromFilters({ ...emptyFilters(), sort: 'distance' }).sort).toBe('newest');
    expect(apiQueryFromFilters({ ...emptyFilters(), q: 'station' }).sort).toBe('relevance');
  });

  it('asks the API for the same values, without the town name it only keeps for display', () => {
    const api = apiQueryFromFilters(everyFilter());

    expect(api).toMatchObject({ scale: 'oo,h0', town: '2652002', withinKm: '50', sort: 'distance', pageSize: 24 });
    expect(api).not.toHaveProperty('near');
  });
});

describe('the applied-filter chips', () => {
  it('show one chip per value, in words', () => {
    const labels = filterChips(everyFilter(), mm).map((c) => c.label);

    expect(labels).toEqual([
      'Modules only',
      'Scale OO',
      'Scale H0',
      '9 mm gauge',
      '16.5 mm gauge',
      'Frame and top, ready for track',
      'Track laid, not wired',
      'Length 600 mm to 1200 mm',
      'Width 300 mm to 600 mm',
      'Price £50.00 to £250.00',
      'Within 50 km of Crewe',
      'Collection',
      'Parcel courier',
      'Wired for DCC',
      'Joins my end: 2 tracks at 150 mm, 196 mm (± 5 mm)',
    ]);
  });

  it('take off one value and keep the rest of that filter, back on page 1', () => {
    const next = withoutChip(everyFilter(), 'scale:h0');

    expect(next.scale).toEqual(['oo']);
    expect(next.finish).toEqual(['topped', 'track-laid']);
    expect(next.page).toBe(1);
  });

  it('take off a range or a town as a whole', () => {
    const next = withoutChip(withoutChip(everyFilter(), 'length'), 'town');

    expect([next.lengthMin, next.lengthMax, next.town, next.townName, next.withinKm]).toEqual([
      null,
      null,
      null,
      '',
      null,
    ]);
    expect(queryFromFilters(next).sort).toBeUndefined();
  });

  it('clear all filters but keep the search words and a usable order', () => {
    const cleared = withoutAllFilters({ ...everyFilter(), sort: 'price-asc' });

    expect(filterChips(cleared, mm)).toEqual([]);
    expect(queryFromFilters(cleared)).toEqual({ q: 'fiddle yard', sort: 'price-asc' });
  });
});
