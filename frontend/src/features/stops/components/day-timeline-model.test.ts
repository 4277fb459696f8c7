import { describe, expect, it } from 'vitest';
import { layoutDay, type TimelineStop } from './day-timeline-model';

// America/Chicago is on CDT (UTC−5) in June 2025 (IANA time zone database), so 07:00 local = 12:00Z.
const DAY = { date: '2025-06-14', startTime: '06:30', checkInTime: '15:00' };
const ZONE = 'America/Chicago';
const AFTER = new Date('2026-01-01T00:00:00Z');
const stop = (id: string, arrivedAt: string, leftAt: string | null, anglerId = 'a'): TimelineStop => ({
  id,
  label: id,
  arrivedAt,
  leftAt,
  anglerId,
  anglerName: anglerId,
  toCheck: 0,
});

describe('layoutDay', () => {
  it('spans the day from its start to check-in, with a tick on every full hour of the lake clock', () => {
    const m = layoutDay(DAY, ZONE, [stop('s1', '2025-06-14T12:00:00Z', '2025-06-14T13:05:00Z')], [], AFTER);
    expect(new Date(m.startMs).toISOString()).toBe('2025-06-14T11:30:00.000Z');
    expect(new Date(m.endMs).toISOString()).toBe('2025-06-14T20:00:00.000Z');
    expect(m.ticks.map((t) => t.label)).toEqual([
      '07:00',
      '08:00',
      '09:00',
      '10:00',
      '11:00',
      '12:00',
      '13:00',
      '14:00',
      '15:00',
    ]);
    // 06:30–15:00 is 510 minutes; the stop runs from minute 30 to minute 95.
    const [s] = m.lanes[0].stops;
    expect(s.x0).toBeCloseTo(30 / 510, 12);
    expect(s.x1).toBeCloseTo(95 / 510, 12);
    expect(s.open).toBe(false);
  });

  it('widens the window to the hour around anything logged outside the day, so nothing falls off the edge', () => {
    const m = layoutDay(
      DAY,
      ZONE,
      [],
      [{ id: 'c1', caughtAt: '2025-06-14T10:50:00Z', label: '2 lb', stopId: null, toCheck: false }],
      AFTER,
    );
    expect(new Date(m.startMs).toISOString()).toBe('2025-06-14T10:00:00.000Z');
    expect(m.catches[0].x).toBeCloseTo(50 / 600, 12);
    expect(m.ticks[0].label).toBe('05:00');
  });

  it('an open stop on a day already over ends at the last thing logged after it, not at check-in', () => {
    const m = layoutDay(
      DAY,
      ZONE,
      [stop('s1', '2025-06-14T12:00:00Z', null)],
      [{ id: 'c1', caughtAt: '2025-06-14T12:40:00Z', label: '3 lb', stopId: 's1', toCheck: false }],
      AFTER,
    );
    const [s] = m.lanes[0].stops;
    expect(s.open).toBe(true);
    expect(s.x1).toBeCloseTo(70 / 510, 12);
    // With nothing after arriving it still shows a quarter hour.
    const bare = layoutDay(DAY, ZONE, [stop('s1', '2025-06-14T12:00:00Z', null)], [], AFTER).lanes[0].stops[0];
    expect(bare.x1 - bare.x0).toBeCloseTo(15 / 510, 12);
  });

  it('an open stop while the day is on runs to now', () => {
    const now = new Date('2025-06-14T14:30:00Z'); // 09:30 local
    const [s] = layoutDay(DAY, ZONE, [stop('s1', '2025-06-14T12:00:00Z', null)], [], now).lanes[0].stops;
    expect(s.x1).toBeCloseTo(180 / 510, 12);
  });

  it('puts each angler in a lane of their own', () => {
    const m = layoutDay(
      DAY,
      ZONE,
      [
        stop('s1', '2025-06-14T12:00:00Z', '2025-06-14T13:00:00Z', 'a'),
        stop('s2', '2025-06-14T12:10:00Z', '2025-06-14T12:50:00Z', 'b'),
        stop('s3', '2025-06-14T13:10:00Z', '2025-06-14T13:50:00Z', 'a'),
      ],
      [],
      AFTER,
    );
    expect(m.lanes.map((l) => [l.anglerId, l.stops.map((s) => s.id)])).toEqual([
      ['a', ['s1', 's3']],
      ['b', ['s2']],
    ]);
  });

  it('ticks on the lake clock hour in a zone half an hour off UTC', () => {
    // India Standard Time is UTC+05:30 all year (IANA time zone database): 06:30 local = 01:00Z.
    const m = layoutDay(
      { date: '2025-06-14', startTime: '06:30', checkInTime: '09:00' },
      'Asia/Kolkata',
      [],
      [],
      AFTER,
    );
    expect(m.ticks.map((t) => t.label)).toEqual(['07:00', '08:00', '09:00']);
    expect(m.ticks[0].at).toBeCloseTo(30 / 150, 12);
  });
});
