import { describe, expect, it } from 'vitest';
import { eventsWithChangedRows, groupBy } from './read-model-store';
import type { OutcomeRow } from './rows';
import { OUTCOME_TABLE } from './tables';

const outcome = (findId: string, eventId: string, fishCount: number): OutcomeRow => ({
  findId,
  eventId,
  crewId: 'c',
  lakeId: 'l',
  kind: 'hard-bottom',
  subKind: '',
  depthBand: '',
  hardness: '',
  temperatureBand: '',
  practiced: false,
  fished: fishCount > 0,
  fishCount,
  stopCount: fishCount > 0 ? 1 : 0,
  secondsFished: 0,
  weighedCount: 0,
  weightUlb: fishCount * 2_000_000,
  weighedWeightUlb: 0,
  firstBiteAtMs: fishCount ? 1_790_000_000_000 : null,
});

describe('eventsWithChangedRows', () => {
  it('names only the events whose outcome rows were added, removed or changed', () => {
    const before = [outcome('f1', 'e1', 3), outcome('f1', 'e2', 1), outcome('f2', 'e3', 2)];
    const after = [outcome('f1', 'e1', 3), outcome('f1', 'e2', 2), outcome('f2', 'e4', 1)];
    expect([...eventsWithChangedRows(OUTCOME_TABLE, before, after)].sort()).toEqual(['e2', 'e3', 'e4']);
  });

  it('names none when the rows are equal, and sees a change in any column', () => {
    const rows = [outcome('f1', 'e1', 3)];
    expect(eventsWithChangedRows(OUTCOME_TABLE, rows, [outcome('f1', 'e1', 3)]).size).toBe(0);
    expect([...eventsWithChangedRows(OUTCOME_TABLE, rows, [{ ...rows[0]!, kind: 'vegetation' }])]).toEqual(['e1']);
    expect([...eventsWithChangedRows(OUTCOME_TABLE, rows, [{ ...rows[0]!, firstBiteAtMs: 1 }])]).toEqual(['e1']);
  });
});

describe('groupBy', () => {
  it('keeps input order within a group and drops rows without a key', () => {
    const groups = groupBy(['a1', 'b1', 'a2', 'x'], (s) => (s === 'x' ? null : s[0]!));
    expect([...groups]).toEqual([
      ['a', ['a1', 'a2']],
      ['b', ['b1']],
    ]);
  });
});
