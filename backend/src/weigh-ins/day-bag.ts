import { countedBag } from '@shoalbook/analytics';
import type { ComputedBag } from '@shoalbook/shared';
import type { Catch } from '../catches/catch.entity';
import type { TournamentEvent } from '../events/tournament-event.entity';

const clean = (lb: number) => Math.round(lb * 1e6) / 1e6;

/**
 * The day's counted bag from its catches under the event's rules (analytics countedBag). Fish that
 * reached the scale: those weighed or dead, and those culled (kept, then replaced: the computation
 * decides again which to count). Released fish and culled short fish never reached it. A known
 * late check-in adds `lateMinutes × latePenaltyLbPerMinute`.
 */
export function computeDayBag(catches: Catch[], event: TournamentEvent, lateMinutes: number | null): ComputedBag {
  const isShort = (c: Catch) => event.minLengthIn !== null && c.lengthIn !== null && c.lengthIn < event.minLengthIn;
  const atScale = catches.filter(
    (c) => c.fate === 'weighed' || c.fate === 'dead' || (c.fate === 'culled' && !isShort(c)),
  );
  const bag = countedBag(
    atScale.map((c) => ({ id: c.id, weightLb: c.weightLb, lengthIn: c.lengthIn, dead: c.fate === 'dead' })),
    {
      fishPerDay: event.fishPerDay,
      minLengthIn: event.minLengthIn,
      deadFishPenaltyLb: event.deadFishPenaltyLb,
      shortFishPenaltyLb: event.shortFishPenaltyLb,
    },
  );
  const late = (lateMinutes ?? 0) * event.latePenaltyLbPerMinute;
  const counted = new Set(bag.counted.map(String));
  const penaltyLb = clean(bag.penaltyLb + late);
  return {
    counted: bag.counted.map(String),
    culled: catches.filter((c) => !counted.has(c.id)).map((c) => c.id),
    short: bag.short.map(String),
    grossLb: bag.grossLb,
    penaltyLb,
    netLb: clean(Math.max(0, bag.grossLb - penaltyLb)),
  };
}
