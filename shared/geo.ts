/** Distances on the Earth's surface between towns and listings, treating the Earth as a sphere. */

/** A position in decimal degrees (WGS 84). */
export interface LatLon {
  lat: number;
  lon: number;
}

/**
 * The IUGG mean Earth radius R1 = (2a + b) / 3 of the WGS 84 ellipsoid, km. A sphere of this radius is off the
 * ellipsoid's true distances by at most about 0.5 %, far finer than "within 50 km of Crewe" needs.
 */
export const EARTH_MEAN_RADIUS_KM = 6371.0088;

const toRadians = (degrees: number) => (degrees * Math.PI) / 180;

/**
 * Great-circle distance by the haversine formula, km. The search's SQL uses the same formula and radius, so a listing
 * the database finds "within 40 km" is one this function puts within 40 km.
 */
export function haversineKm(a: LatLon, b: LatLon, radiusKm = EARTH_MEAN_RADIUS_KM): number {
  const dLat = toRadians(b.lat - a.lat);
  const dLon = toRadians(b.lon - a.lon);
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(toRadians(a.lat)) * Math.cos(toRadians(b.lat)) * Math.sin(dLon / 2) ** 2;
  return 2 * radiusKm * Math.asin(Math.min(1, Math.sqrt(h)));
}

/** A latitude/longitude box; every point within `km` of the centre lies inside it. */
export interface BoundingBox {
  minLat: number;
  maxLat: number;
  minLon: number;
  maxLon: number;
}

/**
 * A box around `centre` that holds every point within `km`, so the database can narrow by its lat/lon index before
 * working out exact distances. Longitude degrees shrink with cos(latitude); near a pole the box spans every longitude.
 */
export function boundingBox(centre: LatLon, km: number, radiusKm = EARTH_MEAN_RADIUS_KM): BoundingBox {
  const dLat = (km / radiusKm) * (180 / Math.PI);
  const cosLat = Math.cos(toRadians(Math.min(89.9, Math.abs(centre.lat) + dLat)));
  const dLon = Math.min(180, dLat / cosLat);
  return {
    minLat: Math.max(-90, centre.lat - dLat),
    maxLat: Math.min(90, centre.lat + dLat),
    minLon: dLon >= 180 ? -180 : centre.lon - dLon,
    maxLon: dLon >= 180 ? 180 : centre.lon + dLon,
  };
}

/**
 * Round a position to `decimals` places. Two places is about 1.1 km north–south and 0.7 km east–west in Britain:
 * near enough for distance, too coarse to find a house.
 */
export function roundPosition(p: LatLon, decimals = 2): LatLon {
  const f = 10 ** decimals;
  return { lat: Math.round(p.lat * f) / f, lon: Math.round(p.lon * f) / f };
}
