import { describe, expect, it } from 'vitest';
import { findCatchDuplicates } from './catch-duplicates';

const at = (iso: string) => new Date(iso);
const fish = (over: Partial<Parameters<typeof findCatchDuplicates>[1][number]> = {}) => ({
  id: null,
  competitionDayId: 'd1',
  caughtAt: at('2024-04-12T12:30:00Z'),
  species: 'largemouth',
  weightLb: 3.25,
  line: 2,
  ...over,
});

describe('findCatchDuplicates', () => {
  it('matches a logged catch of the same day, minute, species and weight to the hundredth', () => {
    const logged = [{ ...fish(), id: 'c1' }];
    expect(
      findCatchDuplicates(logged, [
        fish({ caughtAt: at('2024-04-12T12:30:59Z'), weightLb: 3.2549 }), // same minute, same hundredth
        fish({ caughtAt: at('2024-04-12T12:31:00Z') }), // the next minute
        fish({ weightLb: 3.26 }),
        fish({ species: 'spotted' }),
        fish({ competitionDayId: 'd2' }),
      ]),
    ).toEqual([{ catchId: 'c1' }, null, null, null, null]);
  });

  it('names the earlier line of the file that a row repeats', () => {
    expect(findCatchDuplicates([], [fish({ line: 2 }), fish({ line: 3 }), fish({ line: 4, weightLb: 2 })])).toEqual([
      null,
      { catchId: null, line: 2 },
      null,
    ]);
  });
});
