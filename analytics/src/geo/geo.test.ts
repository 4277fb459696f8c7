import fc from 'fast-check';
import { Geodesic } from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { depthBand, depthBandLabels, temperatureBand, temperatureBandLabels } from './bands.js';
import { distanceM, MEAN_EARTH_RADIUS_M } from './distance.js';
import { nearestFind } from './nearest-find.js';
import { beamFootprintM, coverage, doubleEchoDepth } from './sonar.js';

const wgs84 = (a: { lat: number; lon: number }, b: { lat: number; lon: number }) =>
  Geodesic.WGS84.Inverse(a.lat, a.lon, b.lat, b.lon).s12!;

describe('distanceM (great circle, R = 6,371,008.8 m)', () => {
  it('is within 0.5 % of the WGS 84 ellipsoid distance from geographiclib-geodesic (Karney 2013) between 20° and 60° latitude', () => {
    const point = fc.record({
      lat: fc.double({ min: 20, max: 60, noNaN: true }),
      lon: fc.double({ min: -180, max: 180, noNaN: true }),
    });
    fc.assert(
      fc.property(point, point, (a, b) => {
        const reference = wgs84(a, b);
        fc.pre(reference > 1);
        expect(Math.abs(distanceM(a, b) / reference - 1)).toBeLessThan(0.005);
      }),
    );
  });

  it('is within 0.6 % anywhere: the sphere is worst for short north–south steps at the equator, where the meridian radius is a(1 − e²) = 6,335,439 m', () => {
    const point = fc.record({
      lat: fc.double({ min: -90, max: 90, noNaN: true }),
      lon: fc.double({ min: -180, max: 180, noNaN: true }),
    });
    fc.assert(
      fc.property(point, point, (a, b) => {
        const reference = wgs84(a, b);
        fc.pre(reference > 1);
        expect(Math.abs(distanceM(a, b) / reference - 1)).toBeLessThan(0.006);
      }),
    );
  });

  it('is within 0.5 % at lake scale (tens of metres to a few kilometres)', () => {
    const lake = { lat: 33.2, lon: -96.1 };
    for (const [dLat, dLon] of [
      [0.0003, 0],
      [0, 0.0005],
      [0.002, 0.002],
      [0.03, -0.02],
    ]) {
      const other = { lat: lake.lat + dLat, lon: lake.lon + dLon };
      expect(Math.abs(distanceM(lake, other) / wgs84(lake, other) - 1)).toBeLessThan(0.005);
    }
  });

  it('one degree along the equator is 2πR/360 (spherical geometry)', () => {
    expect(distanceM({ lat: 0, lon: 0 }, { lat: 0, lon: 1 })).toBeCloseTo((2 * Math.PI * MEAN_EARTH_RADIUS_M) / 360, 6);
    expect(distanceM({ lat: 10, lon: 20 }, { lat: 10, lon: 20 })).toBe(0);
  });

  it('rejects impossible coordinates', () => {
    expect(() => distanceM({ lat: 91, lon: 0 }, { lat: 0, lon: 0 })).toThrow(/a.lat/);
    expect(() => distanceM({ lat: 0, lon: 0 }, { lat: 0, lon: Number.NaN })).toThrow(/b.lon/);
  });
});

describe('nearestFind', () => {
  // Invented finds on an invented lake.
  const finds = [
    { id: 'shell bar', lat: 33.2, lon: -96.1 },
    { id: 'grass edge', lat: 33.201, lon: -96.1 },
    { id: 'twin of shell bar', lat: 33.2, lon: -96.1 },
  ];

  it('returns the nearest find within the radius, the first one on a tie', () => {
    const hit = nearestFind({ lat: 33.2003, lon: -96.1 }, finds, 50);
    expect(hit?.find.id).toBe('shell bar');
    expect(hit?.distanceM).toBeCloseTo(distanceM({ lat: 33.2003, lon: -96.1 }, finds[0]), 9);
    expect(nearestFind({ lat: 33.2008, lon: -96.1 }, finds, 50)?.find.id).toBe('grass edge');
  });

  it('returns null when nothing lies within the radius, and checks its inputs', () => {
    expect(nearestFind({ lat: 33.21, lon: -96.1 }, finds, 100)).toBeNull();
    expect(nearestFind({ lat: 33.21, lon: -96.1 }, [], 100)).toBeNull();
    expect(() => nearestFind({ lat: 33.2, lon: -96.1 }, finds, -1)).toThrow(/maxM/);
    expect(() => nearestFind({ lat: 33.2, lon: -96.1 }, [{ lat: 100, lon: 0 }], 10)).toThrow(/finds\[0\]/);
  });
});

describe('sonar geometry', () => {
  it('beam footprint = 2·depth·tan(angle/2): a 90° cone spans twice the depth, a 60° cone 2d/√3 (plane trigonometry)', () => {
    expect(beamFootprintM(10, 90)).toBeCloseTo(20, 12);
    expect(beamFootprintM(10, 60)).toBeCloseTo(20 / Math.sqrt(3), 12);
    expect(beamFootprintM(0, 20)).toBe(0);
    expect(beamFootprintM(6, 20)).toBeLessThan(beamFootprintM(6, 60)); // the wider low-frequency beam sees more
  });

  it('double echo sits at twice the depth: 20 ft → 40 ft (common practice)', () => {
    expect(doubleEchoDepth(20)).toBe(40);
    expect(() => doubleEchoDepth(-1)).toThrow(RangeError);
  });

  it('coverage hours match a metric recomputation (1 acre = 4046.8564224 m², 1 mph = 0.44704 m/s: NIST SP 811)', () => {
    const [acres, depthFt, angle, mph] = [1200, 18, 40, 30];
    const swathM = 2 * depthFt * 0.3048 * Math.tan((20 * Math.PI) / 180);
    const expectedHours = (acres * 4046.8564224) / swathM / (mph * 0.44704) / 3600;
    expect(coverage(acres, depthFt, angle, mph)).toBeCloseTo(expectedHours, 9);
    expect(coverage(acres, depthFt, angle, 2 * mph)).toBeCloseTo(expectedHours / 2, 9);
  });

  it('rejects impossible beams, depths and speeds', () => {
    expect(() => beamFootprintM(5, 180)).toThrow(/beamAngleDeg/);
    expect(() => coverage(100, 0, 20, 30)).toThrow(/depthFt/);
    expect(() => coverage(100, 10, 20, 0)).toThrow(/speedMph/);
  });
});

describe('depth and temperature bands (Shoalbook defaults)', () => {
  it('puts a depth in the band that includes its lower edge', () => {
    expect(depthBand(0)).toBe('0–5 ft');
    expect(depthBand(4.9)).toBe('0–5 ft');
    expect(depthBand(5)).toBe('5–10 ft');
    expect(depthBand(33)).toBe('30–40 ft');
    expect(depthBand(65)).toBe('40+ ft');
    expect(depthBand(null)).toBeNull();
    expect(depthBand(12, [10, 20])).toBe('10–20 ft');
    expect(depthBandLabels([10, 20])).toEqual(['0–10 ft', '10–20 ft', '20+ ft']);
  });

  it('puts a water temperature in its band', () => {
    expect(temperatureBand(45)).toBe('<50 °F');
    expect(temperatureBand(50)).toBe('50–55 °F');
    expect(temperatureBand(72.5)).toBe('70–75 °F');
    expect(temperatureBand(90)).toBe('85+ °F');
    expect(temperatureBand(undefined)).toBeNull();
    expect(temperatureBandLabels()).toHaveLength(9);
  });

  it('rejects negative depths and bad edges', () => {
    expect(() => depthBand(-1)).toThrow(/depthFt/);
    expect(() => depthBand(3, [10, 5])).toThrow(/increasing/);
    expect(() => temperatureBand(Number.NaN)).toThrow(/waterTempF/);
  });
});
