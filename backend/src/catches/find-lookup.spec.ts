import { distanceM } from '@shoalbook/analytics';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundingBox, findsInMemory } from './find-lookup';

describe('boundingBox', () => {
  // The judge is analytics' great-circle distanceM (itself checked against geographiclib-geodesic).
  it('holds every point within the radius, at any latitude', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -89, max: 89, noNaN: true }),
        fc.double({ min: -179, max: 179, noNaN: true }),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        (lat, lon, radiusM, u, v) => {
          const centre = { lat, lon };
          // A candidate anywhere in a box twice the size the radius could need, then kept only if within the radius.
          const span = (2 * radiusM) / 111_000;
          const p = {
            lat: Math.max(-90, Math.min(90, lat + u * span)),
            lon: lon + (v * span) / Math.max(0.01, Math.cos((lat * Math.PI) / 180)),
          };
          fc.pre(p.lon > -180 && p.lon < 180 && distanceM(centre, p) <= radiusM);
          const b = boundingBox(centre, radiusM);
          expect(p.lat >= b.minLat && p.lat <= b.maxLat).toBe(true);
          if (b.minLon !== undefined) expect(p.lon >= b.minLon && p.lon <= b.maxLon!).toBe(true);
        },
      ),
    );
  });

  it('is small: about the radius either way, not the whole lake', () => {
    const b = boundingBox({ lat: 34.7, lon: -92.3 }, 50);
    expect((b.maxLat - b.minLat) * 111_195).toBeLessThan(110);
    expect((b.maxLon! - b.minLon!) * 111_195 * Math.cos((34.7 * Math.PI) / 180)).toBeLessThan(110);
  });

  it('drops the longitude bound across the antimeridian', () => {
    expect(boundingBox({ lat: 0, lon: 179.9999 }, 50).minLon).toBeUndefined();
  });
});

describe('findsInMemory', () => {
  const finds = [
    { id: 'a', name: 'Near', lat: 34.7, lon: -92.3 },
    { id: 'b', name: 'Far', lat: 34.8, lon: -92.3 },
  ];
  it('finds by id and keeps only the finds near a point', async () => {
    const lookup = findsInMemory(finds);
    expect((await lookup.byId('b'))?.name).toBe('Far');
    expect(await lookup.byId('zzz')).toBeUndefined();
    expect((await lookup.near({ lat: 34.7002, lon: -92.3 }, 50)).map((f) => f.id)).toEqual(['a']);
  });
});
