import { describe, expect, it } from 'vitest';
import { attributeCatches, spansOverlap } from './stop-attribution';

const at = (hhmm: string) => new Date(`2024-04-12T${hhmm}:00Z`);
const find = { lat: 32.95, lon: -96.2 };
// 0.001° of latitude is about 111 m (1° ≈ 111.2 km on the mean Earth sphere, radius 6,371,008.8 m: IUGG mean radius).
const farLat = 32.95 + 0.001;

describe('stop attribution', () => {
  const stops = [
    { id: 'a', arrivedAt: at('07:00'), leftAt: at('08:00'), find },
    { id: 'b', arrivedAt: at('08:00'), leftAt: at('09:30'), find: null },
    { id: 'c', arrivedAt: at('10:00'), leftAt: null, find },
  ];

  it('puts a catch in the stop whose span holds its time, arrival included and leaving excluded', () => {
    const { byStop, unattached } = attributeCatches(stops, [
      { id: '1', caughtAt: at('07:00'), lat: null, lon: null },
      { id: '2', caughtAt: at('08:00'), lat: null, lon: null },
      { id: '3', caughtAt: at('09:45'), lat: null, lon: null },
      { id: '4', caughtAt: at('13:00'), lat: null, lon: null },
    ]);
    expect(byStop.get('a')!.catchIds).toEqual(['1']);
    expect(byStop.get('b')!.catchIds).toEqual(['2']);
    expect(byStop.get('c')!.catchIds).toEqual(['4']);
    expect(unattached).toEqual(['3']);
  });

  it('keeps a catch beyond the radius in its stop and lists it to check', () => {
    const { byStop } = attributeCatches(stops, [
      { id: 'near', caughtAt: at('07:10'), lat: 32.9502, lon: -96.2 },
      { id: 'far', caughtAt: at('07:20'), lat: farLat, lon: -96.2 },
    ]);
    expect(byStop.get('a')!.catchIds).toEqual(['near', 'far']);
    expect(byStop.get('a')!.catchesToCheck.map((c) => c.catchId)).toEqual(['far']);
    expect(byStop.get('a')!.catchesToCheck[0]!.distanceM).toBeCloseTo(111.2, 0);
  });

  it('says when spans overlap: touching ends do not, an open span runs on', () => {
    expect(spansOverlap(stops[0]!, stops[1]!)).toBe(false);
    expect(spansOverlap(stops[0]!, { arrivedAt: at('07:59'), leftAt: at('08:30') })).toBe(true);
    expect(spansOverlap(stops[2]!, { arrivedAt: at('15:00'), leftAt: at('15:10') })).toBe(true);
    expect(spansOverlap(stops[2]!, { arrivedAt: at('09:00'), leftAt: at('10:00') })).toBe(false);
  });
});
