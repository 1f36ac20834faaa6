import type { ListingSearchItem, ModuleDetailsView, PhotoView } from '@shared/types/listings';
import { scaleById } from '@shared/scales';

/** A module's details as the API shows them: one 1200 × 450 mm OO board, collected only, 9.5 kg. */
export function buildModule(overrides: Partial<ModuleDetailsView> = {}): ModuleDetailsView {
  return {
    scale: scaleById('oo')!,
    lengthMm: 1200,
    widthMm: 450,
    heightMm: 100,
    boardCount: 1,
    joinMethod: 'bolts',
    levels: { type: 'single' },
    construction: {
      frameDepthMm: 44,
      frameThicknessMm: 18,
      crossMemberSpacingMm: 400,
      topMaterial: 'birch-plywood',
      topThicknessMm: 9,
      supports: 'legs',
    },
    wiring: { control: 'dcc', busWireMm2: 1.5, boardConnectors: '' },
    endProfiles: {
      a: { trackOffsetsMm: [150, 196], railTopHeightMm: 1050, railTopFrom: 'floor' },
      b: { trackOffsetsMm: [150], railTopHeightMm: 1050, railTopFrom: 'floor' },
    },
    finish: 'wired-running',
    condition: 'sound',
    conditionNotes: 'Ballast loose by the points.',
    priceMinor: 18_000,
    handling: { collection: true, delivery: null, courier: null },
    weightKg: 9.5,
    weightSource: 'entered',
    ...overrides,
  };
}

/** A listed module as a search result. */
export function buildSearchItem(overrides: Partial<ListingSearchItem> = {}): ListingSearchItem {
  return {
    id: 41,
    kind: 'module',
    state: 'listed',
    title: 'OO through station, one board',
    description: 'A through station on one board.',
    currency: 'GBP',
    seller: { id: 3, displayName: 'Hattie Dowel' },
    sellerRating: { average: null, count: 0 },
    town: { id: 2652002, name: 'Crewe', adminArea: 'England', country: 'GB', lat: 53.1, lon: -2.44 },
    position: { lat: 53.1, lon: -2.44 },
    module: buildModule(),
    service: null,
    photos: [],
    publishedAt: '2026-03-07T10:00:00.000Z',
    updatedAt: '2026-03-07T10:00:00.000Z',
    coverThumbUrl: null,
    ...overrides,
  };
}

/** A saved photo of listing 5, as the photo routes answer it. */
export function buildPhoto(id: number, position: number, isCover = position === 1): PhotoView {
  return {
    id,
    position,
    isCover,
    thumbUrl: `/api/photos/key${id}/thumb.jpg`,
    displayUrl: `/api/photos/key${id}/display.jpg`,
    width: 1600,
    height: 1200,
  };
}
