import { cleanLb, daySummary, type DayBag, type FishVerdict } from '@shoalbook/analytics';
import type {
  BagFishVerdict,
  BagView,
  ComputedBag,
  EventRules,
  Fate,
  OfficialDifference,
  OfficialWeighIn,
} from '@shoalbook/shared';

/** What the bag rule reads of a catch (a Catch entity, a report's catch fact or a projector row). */
export interface BagCatch {
  id: string;
  weightLb: number;
  lengthIn: number | null;
  fate: Fate | string;
  /** The crew member who logged it: an individual event's bag is per angler. */
  loggedBy?: string | null;
}

const verdict = (v: FishVerdict): BagFishVerdict => ({
  catchId: String(v.id),
  state: v.state,
  counted: v.counted,
  weighed: v.weighed,
  penaltyLb: v.penaltyLb,
});

function bagView(b: DayBag): BagView {
  return {
    anglerId: b.anglerId,
    counted: b.counted.map(String),
    fish: b.fish.map(verdict),
    penalties: b.penalties.map((p) => ({
      kind: p.kind,
      catchId: p.fishId === null ? null : String(p.fishId),
      lb: p.lb,
      ...(p.minutes !== undefined ? { minutes: p.minutes } : {}),
    })),
    grossLb: b.grossLb,
    penaltyLb: b.penaltyLb,
    netLb: b.netLb,
    nextToCull: b.nextToCull === null ? null : String(b.nextToCull),
    mustBeatLb: b.mustBeatLb,
  };
}

/**
 * A competition day's bags under the event's rules: the one bag rule (@shoalbook/analytics daySummary) that the
 * weigh-in screen, the recap, the lake comparison and the projection all use. A known late check-in (the
 * official lateMinutes) adds its penalty.
 */
export function bagOfDay(catches: readonly BagCatch[], rules: EventRules, lateMinutes: number | null): ComputedBag {
  const day = daySummary(
    catches.map((c) => ({
      id: c.id,
      weightLb: c.weightLb,
      lengthIn: c.lengthIn,
      fate: c.fate as Fate,
      anglerId: c.loggedBy ?? null,
    })),
    rules,
    { lateMinutes },
  );
  const bags = day.bags.map(bagView);
  return {
    format: day.format,
    bags,
    counted: day.counted.map(String),
    fish: day.fish.map(verdict),
    penalties: bags.flatMap((b) => b.penalties),
    grossLb: day.grossLb,
    penaltyLb: day.penaltyLb,
    netLb: day.netLb,
  };
}

const minus = (official: number | null | undefined, computed: number) =>
  official === null || official === undefined ? null : cleanLb(official - computed);

/** Official minus computed, for each figure the angler entered from the scale slip (never overwriting either). */
export function differenceOf(official: OfficialWeighIn | null, computed: ComputedBag): OfficialDifference {
  return {
    grossLb: minus(official?.grossLb, computed.grossLb),
    penaltyLb: minus(official?.penaltyLb, computed.penaltyLb),
    netLb: minus(official?.officialLb, computed.netLb),
  };
}

/**
 * An event's weight over its days, official figures first: each day's official weight where recorded, else the
 * net the bag rule computed; the computed net beside it and their difference (official − computed).
 */
export function eventWeight(days: readonly { computedNetLb: number; officialLb: number | null | undefined }[]): {
  computedNetLb: number;
  officialLb: number;
  differenceLb: number;
} {
  const computedNetLb = cleanLb(days.reduce((sum, d) => sum + d.computedNetLb, 0));
  const officialLb = cleanLb(days.reduce((sum, d) => sum + (d.officialLb ?? d.computedNetLb), 0));
  return { computedNetLb, officialLb, differenceLb: cleanLb(officialLb - computedNetLb) };
}
