import { fieldStanding } from '@shoalbook/analytics';
import type { FieldContext, StandingView } from '@shoalbook/shared';

const EMPTY: StandingView = { place: null, topPercent: null, behindWinnerLb: null, overCutLb: null, readings: [] };

/**
 * A place and a weight against the field from the results sheet (analytics fieldStanding). Place and field are
 * entered on different records, so they can disagree (a place beyond the field): then the place is read alone.
 */
export function standingOf(place: number | null, weightLb: number | null, field: FieldContext): StandingView {
  const input = { place, weightLb, fieldSize: field.fieldSize, winningLb: field.winningLb, cutLb: field.cutLb };
  try {
    return fieldStanding(input);
  } catch {
    try {
      return fieldStanding({ ...input, fieldSize: null });
    } catch {
      return EMPTY;
    }
  }
}
