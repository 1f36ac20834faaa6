import { describe, expect, it } from 'vitest';
import { boundingBox, haversineKm, roundPosition } from '../../shared/geo';

describe('haversineKm', () => {
  it('gives 2887.26 km from Nashville to Los Angeles on a 6372.8 km sphere', () => {
    // published worked example: Rosetta Code, "Haversine formula" task — BNA (36.12, -86.67) to
    // LAX (33.94, -118.40) with R = 6372.8 km is 2887.2599506071106 km
    const km = haversineKm({ lat: 36.12, lon: -86.67 }, { lat: 33.94, lon: -118.4 }, 6372.8);
    expect(km).toBeCloseTo(2887.2599506071106, 9);
  });

  it('is zero from a place to itself and the same both ways', () => {
    const crewe = { lat: 53.09787, lon: -2.44161 };
    const york = { lat: 53.95763, lon: -1.08271 };
    expect(haversineKm(crewe, crewe)).toBe(0);
    expect(haversineKm(crewe, york)).toBeCloseTo(haversineKm(york, crewe), 9);
  });

  it('gives a quarter of the circumference from the equator to a pole', () => {
    // geometry: a quarter great circle is πR/2
    expect(haversineKm({ lat: 0, lon: 0 }, { lat: 90, lon: 0 }, 6371)).toBeCloseTo((Math.PI * 6371) / 2, 6);
  });
});

describe('boundingBox', () => {
  it('holds every point within the distance in each direction', () => {
    const centre = { lat: 53.1, lon: -2.44 };
    const box = boundingBox(centre, 50);
    for (const bearing of [0, 45, 90, 135, 180, 225, 270, 315]) {
      // a point 49.9 km away along the bearing, by small steps along the great circle
      const rad = (bearing * Math.PI) / 180;
      const dLat = ((49.9 / 6371.0088) * Math.cos(rad) * 180) / Math.PI;
      const dLon = ((49.9 / 6371.0088) * Math.sin(rad) * 180) / Math.PI / Math.cos((centre.lat * Math.PI) / 180);
      const p = { lat: centre.lat + dLat, lon: centre.lon + dLon };
      expect(p.lat).toBeGreaterThanOrEqual(box.minLat);
      expect(p.lat).toBeLessThanOrEqual(box.maxLat);
      expect(p.lon).toBeGreaterThanOrEqual(box.minLon);
      expect(p.lon).toBeLessThanOrEqual(box.maxLon);
    }
  });
});

describe('roundPosition', () => {
  it('rounds to two decimal places: about a kilometre, never a street', () => {
    expect(roundPosition({ lat: 53.097871, lon: -2.441613 })).toEqual({ lat: 53.1, lon: -2.44 });
  });
});
