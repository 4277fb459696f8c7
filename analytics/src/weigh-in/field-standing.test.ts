import { describe, expect, it } from 'vitest';
import { fieldStanding, ordinal } from './field-standing.js';

describe('fieldStanding', () => {
  it('writes English ordinals (the usual rule: 11th–13th, else 1st, 2nd, 3rd by the last digit)', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 23, 26, 101, 111, 112].map(ordinal)).toEqual([
      '1st', '2nd', '3rd', '4th', '11th', '12th', '13th', '21st', '22nd', '23rd', '26th', '101st', '111th', '112th',
    ]);
    expect(() => ordinal(0)).toThrow(/positive integer/);
  });

  it('reads a place against the field: 26th of 180 is in the top 15 % (26/180 = 14.4 %, rounded up)', () => {
    const s = fieldStanding({ place: 26, fieldSize: 180, weightLb: 13.8, winningLb: 18, cutLb: 12.5 });
    expect(s.place).toBe('26th of 180 (top 15 %)');
    expect(s.topPercent).toBe(15);
    expect(s.behindWinnerLb).toBe(4.2);
    expect(s.overCutLb).toBe(1.3);
    expect(s.readings).toEqual(['26th of 180 (top 15 %)', '4.20 lb behind the winner', '1.30 lb over the cut']);
    // The winner is 1st of the field, top 1 % of 180 (1/180 = 0.56 %, rounded up) and at the winning weight.
    expect(fieldStanding({ place: 1, fieldSize: 180, weightLb: 18, winningLb: 18, cutLb: null }).readings).toEqual([
      '1st of 180 (top 1 %)',
      'the winning weight',
    ]);
    // Exactly 10 of 100 is the top 10 %, not 11.
    expect(fieldStanding({ place: 10, fieldSize: 100, weightLb: null, winningLb: null, cutLb: null }).topPercent).toBe(10);
  });

  it('leaves out what is not entered and refuses figures that disagree', () => {
    expect(fieldStanding({ place: 7, fieldSize: null, weightLb: 9, winningLb: null, cutLb: 10 }).readings).toEqual([
      '7th',
      '1.00 lb short of the cut',
    ]);
    expect(() => fieldStanding({ place: 181, fieldSize: 180, weightLb: null, winningLb: null, cutLb: null })).toThrow(
      /beyond the field/,
    );
    expect(() => fieldStanding({ place: null, fieldSize: 0, weightLb: null, winningLb: null, cutLb: null })).toThrow(
      /fieldSize/,
    );
  });
});
