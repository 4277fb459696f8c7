import { distanceM } from '@shoalbook/analytics';
import { describe, expect, it } from 'vitest';
import { DuplicateIndex } from './duplicate-index';

/** Deterministic pseudo-random numbers (mulberry32) so the check is reproducible. */
function rng(seed: number): () => number {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('DuplicateIndex', () => {
  it('agrees with a brute-force search over every point (analytics distanceM)', () => {
    const rand = rng(7);
    const base = { lat: 47.6, lon: -122.2 };
    const points = Array.from({ length: 400 }, (_, k) => ({
      lat: base.lat + (rand() - 0.5) * 0.004,
      lon: base.lon + (rand() - 0.5) * 0.006,
      name: `p${k}`,
      findId: `f${k}`,
      rowIndex: null,
    }));
    const index = new DuplicateIndex(15, base.lat);
    points.forEach((p) => index.add(p));
    let hits = 0;
    for (let q = 0; q < 400; q++) {
      const lat = base.lat + (rand() - 0.5) * 0.004;
      const lon = base.lon + (rand() - 0.5) * 0.006;
      const brute = points
        .map((p) => ({ p, d: distanceM({ lat, lon }, p) }))
        .filter((x) => x.d <= 15)
        .sort((a, b) => a.d - b.d)[0];
      const found = index.nearest(lat, lon);
      expect(found?.point.name ?? null).toBe(brute?.p.name ?? null);
      if (found) hits += 1;
    }
    // The random layout must produce some matches, or the comparison proves little.
    expect(hits).toBeGreaterThan(20);
  });

  it('flags a point 14 m away and not one 16 m away (1° of latitude ≈ 111.2 km on the mean sphere)', () => {
    const index = new DuplicateIndex(15, 30);
    index.add({ lat: 30, lon: -90, name: 'a', findId: 'a', rowIndex: null });
    expect(index.nearest(30 + 14 / 111_195, -90)?.point.name).toBe('a');
    expect(index.nearest(30 + 16 / 111_195, -90)).toBeNull();
  });
});
