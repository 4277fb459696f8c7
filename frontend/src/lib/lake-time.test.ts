import { describe, expect, it } from 'vitest';
import { clockOrDash, dayLabel, isClockTime } from './lake-time';

// The wall-clock rules themselves are tested once, in @shoalbook/shared (lake-time.test.ts).
describe('lake clock on screen', () => {
  it('shows a nullable instant on the lake’s clock, or a dash', () => {
    expect(clockOrDash('2025-04-12T11:40:00Z', 'America/Chicago')).toBe('06:40');
    expect(clockOrDash(null, 'America/Chicago')).toBe('—');
  });

  it('labels a calendar date without shifting it by the viewer’s zone', () => {
    expect(dayLabel('2025-04-12')).toBe('Sat, 12 Apr 2025');
  });

  it('accepts a typed 24-hour time with stray spaces and refuses others', () => {
    expect(isClockTime(' 06:40 ')).toBe(true);
    expect(isClockTime('6:40')).toBe(false);
    expect(isClockTime('25:00')).toBe(false);
  });
});
