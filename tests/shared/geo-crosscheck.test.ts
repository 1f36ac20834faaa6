import fc from 'fast-check';
import { getDistance } from 'geolib';
import { describe, expect, it } from 'vitest';
import { haversineKm } from '../../shared/geo';

const point = fc.record({
  lat: fc.double({ min: -80, max: 80, noNaN: true }),
  lon: fc.double({ min: -180, max: 180, noNaN: true }),
});

describe('haversineKm against a geodesy package', () => {
  it('agrees with geolib’s getDistance to within a metre on its 6378.137 km sphere', () => {
    // reference library: geolib 3.3.14 getDistance (haversine on a sphere of radius 6 378 137 m), at 1 mm accuracy
    fc.assert(
      fc.property(point, point, (a, b) => {
        const reference = getDistance(
          { latitude: a.lat, longitude: a.lon },
          { latitude: b.lat, longitude: b.lon },
          0.001,
        );
        expect(Math.abs(haversineKm(a, b, 6378.137) * 1000 - reference)).toBeLessThan(1);
      }),
      { numRuns: 300 },
    );
  });
});
