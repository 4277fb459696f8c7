import type { FindOutcome } from '@shoalbook/shared';

/** A find's outcome in words the table and the map share. */
export function outcomeOf(o: { fished: boolean; fishCount: number; weighedCount: number }): FindOutcome {
  if (o.weighedCount > 0) return 'weighed';
  if (o.fishCount > 0) return 'caught';
  return o.fished ? 'fished-blank' : 'not-fished';
}
