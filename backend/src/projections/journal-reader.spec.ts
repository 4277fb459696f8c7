import { describe, expect, it } from 'vitest';
import { GapPolicy } from './journal-reader';
import type { JournalRecord } from './journal-record';

const rec = (seq: number): JournalRecord => ({
  seq,
  crewId: 'c',
  type: 'FindAdded',
  aggregateType: 'find',
  aggregateId: `f${seq}`,
  payload: {},
});

describe('GapPolicy', () => {
  it('applies only the gap-free run after the checkpoint while a gap is young', () => {
    let now = 1000;
    const gaps = new GapPolicy(5000, () => now);
    const first = gaps.contiguous([rec(1), rec(2), rec(4), rec(5)], 0);
    expect(first.usable.map((r) => r.seq)).toEqual([1, 2]);
    expect(first).toMatchObject({ last: 2, waiting: true });
    now += 4999;
    expect(gaps.contiguous([rec(4), rec(5)], 2)).toMatchObject({ last: 2, waiting: true });
    // The open transaction commits: seq 3 appears and everything applies.
    expect(gaps.contiguous([rec(3), rec(4), rec(5)], 2)).toMatchObject({ last: 5, waiting: false });
  });

  it('skips a gap that stays open past the timeout (a rolled-back transaction)', () => {
    let now = 0;
    const gaps = new GapPolicy(5000, () => now);
    expect(gaps.contiguous([rec(3)], 1).waiting).toBe(true);
    now = 5000;
    const later = gaps.contiguous([rec(3)], 1);
    expect(later.usable.map((r) => r.seq)).toEqual([3]);
    expect(later.last).toBe(3);
  });

  it('ignores records at or before the checkpoint (the same event delivered twice)', () => {
    const gaps = new GapPolicy(5000);
    expect(gaps.contiguous([rec(1), rec(2), rec(3)], 2)).toMatchObject({ last: 3, waiting: false });
    expect(gaps.contiguous([rec(1), rec(2), rec(3)], 2).usable.map((r) => r.seq)).toEqual([3]);
  });

  it('passes at once a gap known to be settled (events deleted with their crew), but waits on any other', () => {
    const gaps = new GapPolicy(5000, () => 0);
    expect(gaps.contiguous([rec(1), rec(4), rec(5)], 0, [[2, 3]])).toMatchObject({ last: 5, waiting: false });
    expect(gaps.contiguous([rec(1), rec(4), rec(5)], 0, [[2, 2]])).toMatchObject({ last: 1, waiting: true });
  });
});
