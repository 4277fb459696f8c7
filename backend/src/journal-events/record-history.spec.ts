import { describe, expect, it } from 'vitest';
import { figureChanges, type JournalStep } from './record-history';

const at = (hhmm: string) => new Date(`2025-04-12T${hhmm}:00.000Z`);
const step = (payload: Record<string, unknown>, hhmm: string, actorId: string | null = 'u1'): JournalStep => ({
  payload,
  occurredAt: at(hhmm),
  actorId,
});

describe('figureChanges (a record history from its journal states)', () => {
  it('lists the first recording, then each figure that changed, with who and when', () => {
    const steps = [
      step({ id: 'c1', weightLb: 3.45, lengthIn: null, lure: 'jig' }, '12:42'),
      step({ id: 'c1', weightLb: 3.45, lengthIn: null, lure: 'crankbait' }, '13:00'), // no figure changed
      step({ id: 'c1', weightLb: 3.54, lengthIn: 16.5, lure: 'crankbait' }, '19:02', 'u2'),
    ];
    expect(figureChanges(steps, ['weightLb', 'lengthIn'])).toEqual([
      { field: 'weightLb', from: null, to: 3.45, at: at('12:42'), actorId: 'u1', first: true },
      { field: 'weightLb', from: 3.45, to: 3.54, at: at('19:02'), actorId: 'u2', first: false },
      { field: 'lengthIn', from: null, to: 16.5, at: at('19:02'), actorId: 'u2', first: false },
    ]);
  });

  it('keeps a figure taken away (to null) and ignores a deletion event that carries no figures', () => {
    const steps = [
      step({ officialLb: 17.62, dayPlace: 26 }, '20:00'),
      step({ officialLb: null, dayPlace: 26 }, '20:05'),
      step({ id: 'w1' }, '20:10'),
    ];
    expect(figureChanges(steps, ['officialLb', 'dayPlace'])).toEqual([
      { field: 'officialLb', from: null, to: 17.62, at: at('20:00'), actorId: 'u1', first: true },
      { field: 'dayPlace', from: null, to: 26, at: at('20:00'), actorId: 'u1', first: true },
      { field: 'officialLb', from: 17.62, to: null, at: at('20:05'), actorId: 'u1', first: false },
    ]);
  });

  it('has nothing to say of a record never recorded', () => {
    expect(figureChanges([], ['weightLb'])).toEqual([]);
  });
});
