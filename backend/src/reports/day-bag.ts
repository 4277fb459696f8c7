import { countedBag } from '@shoalbook/analytics';
import type { EventRules } from '@shoalbook/shared';
import type { ReportCatch } from './report-catches';

const clean = (lb: number) => Math.round(lb * 1e6) / 1e6;

export interface DayBag {
  counted: string[];
  grossLb: number;
  penaltyLb: number;
  netLb: number;
}

/**
 * A day's counted bag under the event's rules (@shoalbook/analytics countedBag), by the same rule as the
 * weigh-in screen: the fish that reached the scale are those weighed or dead, and those culled unless short;
 * released fish never did. A known late check-in adds lateMinutes × latePenaltyLbPerMinute.
 */
export function dayBag(catches: readonly ReportCatch[], rules: EventRules, lateMinutes: number | null): DayBag {
  const isShort = (c: ReportCatch) =>
    rules.minLengthIn !== null && c.lengthIn !== null && c.lengthIn < rules.minLengthIn;
  const atScale = catches.filter(
    (c) => c.fate === 'weighed' || c.fate === 'dead' || (c.fate === 'culled' && !isShort(c)),
  );
  const bag = countedBag(
    atScale.map((c) => ({ id: c.catchId, weightLb: c.weightLb, lengthIn: c.lengthIn, dead: c.fate === 'dead' })),
    {
      fishPerDay: rules.fishPerDay,
      minLengthIn: rules.minLengthIn,
      deadFishPenaltyLb: rules.deadFishPenaltyLb,
      shortFishPenaltyLb: rules.shortFishPenaltyLb,
    },
  );
  const penaltyLb = clean(bag.penaltyLb + (lateMinutes ?? 0) * rules.latePenaltyLbPerMinute);
  return {
    counted: bag.counted.map(String),
    grossLb: bag.grossLb,
    penaltyLb,
    netLb: clean(Math.max(0, bag.grossLb - penaltyLb)),
  };
}
