import { demoJournal, smallJournal, type DemoJournal } from '@shoalbook/fixtures';
import { describe, expect, it } from 'vitest';
import { catchTimeProblem } from './catch-window';

// Offsets from the IANA time zone database: America/Chicago is UTC−5 (CDT) from the second Sunday of March
// to the first Sunday of November, UTC−6 (CST) otherwise; America/New_York is one hour ahead (US Energy
// Policy Act of 2005 dates, recalled from memory).
const CHICAGO = 'America/Chicago';
const day = { date: '2024-04-12', startTime: '06:30', checkInTime: '15:00' };
const at = (iso: string) => new Date(iso);

describe('catchTimeProblem: a catch inside its competition day, on the lake clock', () => {
  it('accepts the start and the check-in themselves and everything between', () => {
    expect(catchTimeProblem(at('2024-04-12T11:30:00Z'), day, CHICAGO)).toBeNull(); // 06:30 CDT
    expect(catchTimeProblem(at('2024-04-12T06:30:00-05:00'), day, CHICAGO)).toBeNull();
    expect(catchTimeProblem(at('2024-04-12T20:00:00Z'), day, CHICAGO)).toBeNull(); // 15:00 CDT
    expect(catchTimeProblem(at('2024-04-12T17:12:00Z'), day, CHICAGO)).toBeNull();
  });

  it('refuses a minute before the start and a second after check-in, saying the window', () => {
    expect(catchTimeProblem(at('2024-04-12T11:29:00Z'), day, CHICAGO)).toBe(
      'Catches on 2024-04-12 count from the 06:30 start to the 15:00 check-in (lake time, America/Chicago); 06:29 is before the start.',
    );
    expect(catchTimeProblem(at('2024-04-12T20:00:01Z'), day, CHICAGO)).toBe(
      'Catches on 2024-04-12 count from the 06:30 start to the 15:00 check-in (lake time, America/Chicago); 15:00:01 is after check-in.',
    );
  });

  it('reads the bounds in the lake’s zone, not UTC: 06:30 in New York is 05:30 in Chicago', () => {
    expect(catchTimeProblem(at('2024-04-12T10:30:00Z'), day, 'America/New_York')).toBeNull();
    expect(catchTimeProblem(at('2024-04-12T10:30:00Z'), day, CHICAGO)).toMatch(/05:30 is before the start/);
    // The same wall-clock start is 12:30 UTC in Chicago's winter (CST, UTC−6).
    const winter = { date: '2024-01-20', startTime: '06:30', checkInTime: null };
    expect(catchTimeProblem(at('2024-01-20T12:29:00Z'), winter, CHICAGO)).toMatch(/06:29 is before the start/);
    expect(catchTimeProblem(at('2024-01-20T12:30:00Z'), winter, CHICAGO)).toBeNull();
  });

  it('uses only the bounds the day has; with neither, any time on the date', () => {
    const startOnly = { date: '2024-04-12', startTime: '06:30', checkInTime: null };
    expect(catchTimeProblem(at('2024-04-13T04:59:00Z'), startOnly, CHICAGO)).toBeNull(); // 23:59 CDT
    expect(catchTimeProblem(at('2024-04-12T11:00:00Z'), startOnly, CHICAGO)).toBe(
      'Catches on 2024-04-12 count from the 06:30 start on (lake time, America/Chicago); 06:00 is before the start.',
    );
    const checkInOnly = { date: '2024-04-12', startTime: null, checkInTime: '15:00' };
    expect(catchTimeProblem(at('2024-04-12T05:00:00Z'), checkInOnly, CHICAGO)).toBeNull(); // 00:00 CDT
    expect(catchTimeProblem(at('2024-04-12T20:01:00Z'), checkInOnly, CHICAGO)).toBe(
      'Catches on 2024-04-12 count until the 15:00 check-in (lake time, America/Chicago); 15:01 is after check-in.',
    );
    const open = { date: '2024-04-12', startTime: null, checkInTime: null };
    expect(catchTimeProblem(at('2024-04-12T05:00:00Z'), open, CHICAGO)).toBeNull();
  });

  it('still refuses another date first, in lake time', () => {
    // 2024-04-13T02:00Z is 21:00 on the 12th in Chicago: the right date there, but after check-in.
    expect(catchTimeProblem(at('2024-04-13T02:00:00Z'), day, CHICAGO)).toMatch(/21:00 is after check-in/);
    expect(catchTimeProblem(at('2024-04-13T14:00:00Z'), day, CHICAGO)).toBe(
      'The catch time falls on 2024-04-13 (lake time, America/Chicago), not on the competition day 2024-04-12.',
    );
  });

  it('moves a start the clocks skip (02:30 on 2024-03-10 in Chicago) on by the gap, to 03:30 CDT', () => {
    const springForward = { date: '2024-03-10', startTime: '02:30', checkInTime: null };
    expect(catchTimeProblem(at('2024-03-10T08:29:00Z'), springForward, CHICAGO)).toMatch(/03:29 is before the start/);
    expect(catchTimeProblem(at('2024-03-10T08:30:00Z'), springForward, CHICAGO)).toBeNull();
  });

  it('accepts every catch of the demo and the small test journal (fixtures) under the rule', () => {
    const outside = (journal: DemoJournal) =>
      journal.catches.flatMap((c) => {
        const lake = journal.lakes.find((l) => l.id === journal.events.find((e) => e.id === c.eventId)!.lakeId)!;
        const d = journal.competitionDays.find((x) => x.eventId === c.eventId && x.date === c.competitionDate)!;
        const problem = catchTimeProblem(
          new Date(c.caughtAt),
          { date: d.date, startTime: d.startLocal, checkInTime: d.checkInLocal },
          lake.timeZone,
        );
        return problem ? [`${c.id}: ${problem}`] : [];
      });
    const demo = demoJournal();
    expect(demo.catches.length).toBeGreaterThan(300);
    expect(outside(demo)).toEqual([]);
    expect(outside(smallJournal())).toEqual([]);
  });
});
