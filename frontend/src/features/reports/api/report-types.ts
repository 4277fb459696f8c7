import type { FindKind } from '@shoalbook/shared';

/**
 * Answer shapes of the report routes (GET /api/crews/:crewId/reports/…), written from the reports contract.
 * Weights are lb, depths ft, temperatures °F (canonical); the screens convert for display.
 */

/** A share with its Wilson 95 % interval and the empirical-Bayes shrunk rate (all 0–1). */
export interface Rate {
  successes: number;
  trials: number;
  rate: number;
  lower: number;
  upper: number;
  shrunk: number;
}

export const HIT_RATE_GROUPINGS = ['kind', 'subKind', 'depthBand', 'hardness', 'temperatureBand', 'solunarPeriod', 'timeOfDay'] as const;
export type HitRateGrouping = (typeof HIT_RATE_GROUPINGS)[number];

/**
 * One group of a hit-rate report. For solunarPeriod and timeOfDay the unit is the catch, not the find
 * (one find's fish fall in different periods): those groups are read by fishCount, weightLb and shareOfFish.
 */
export interface HitRateGroup {
  key: string;
  label: string;
  finds: number;
  findsFished: number;
  findsProducing: number;
  findsWeighed: number;
  fishCount: number;
  weightLb: number;
  producing: Rate;
  weighed: Rate;
  rank: number | null;
  /** Catch-based groupings: share of all fish (0–1). */
  shareOfFish?: number;
}

export interface HitRatesReport {
  by: HitRateGrouping;
  groups: HitRateGroup[];
  overall: { findsFished: number; findsProducing: number; producing: Rate };
  readings: string[];
}

export type Season = 'spring' | 'summer' | 'fall' | 'winter';

export interface ComparedEvent {
  id: string;
  name: string;
  firstDate: string;
  season: Season;
  year: number;
}

export interface LakeComparisonGroup {
  key: string;
  label: string;
  perEvent: Record<string, Rate & { findsFished: number }>;
}

export interface EventComparison {
  key: string;
  label: string;
  a: string;
  b: string;
  /** Rate of b minus rate of a (0–1 scale), with its 95 % interval. */
  difference: number;
  lower: number;
  upper: number;
  pValue: number;
  moreThanChance: boolean;
  reading: string;
}

export interface LakeComparisonReport {
  lake: { id: string; name: string };
  events: ComparedEvent[];
  groups: LakeComparisonGroup[];
  comparisons: EventComparison[];
}

/** One fish as the recap shows it. */
export interface RecapFish {
  catchId: string;
  weightLb: number;
  lengthIn?: number | null;
  caughtAt?: string;
  species?: string;
  fate?: string;
  findId?: string | null;
  findName?: string | null;
}

export interface RecapDay {
  date: string;
  counted: RecapFish[];
  culled: RecapFish[];
  grossLb: number;
  penaltyLb: number;
  netLb: number;
  official: { grossLb?: number | null; penaltyLb?: number | null; officialLb?: number | null; dayPlace?: number | null; lateMinutes?: number | null } | null;
  dayPlace: number | null;
}

export interface EventRecap {
  event: {
    id: string;
    name: string;
    lake: { id: string; name: string; timeZone?: string } | string;
    dates: string[];
    rules?: { fishPerDay?: number; minLengthIn?: number | null } & Record<string, unknown>;
    finalPlace: number | null;
  };
  days: RecapDay[];
  totals: { netLb: number; officialLb: number | null; finalPlace: number | null };
  producingFinds: Array<{ findId: string; name: string; kind: FindKind; subKind: string | null; fishCount: number; weightLb: number }>;
  timeline: Array<{ caughtAt: string; weightLb: number; cumulativeBagLb: number; day: string }>;
  bigFish: RecapFish | null;
  findsFished: number;
  findsPracticed: number;
  shareOfPracticePaidOff: Rate;
}

export const FIND_OUTCOMES = ['weighed', 'caught', 'fished-blank', 'not-fished'] as const;
export type FindOutcome = (typeof FIND_OUTCOMES)[number];

export interface EventFindRow {
  findId: string;
  name: string;
  kind: FindKind;
  subKind: string | null;
  depthFt: number | null;
  hardness: number | null;
  waterTempF: number | null;
  fished: boolean;
  fishCount: number;
  weighedCount: number;
  weightLb: number;
  firstBiteAt: string | null;
  outcome: FindOutcome;
}

export interface EventFindsReport {
  finds: EventFindRow[];
  paidOff: Rate;
}

export type SolunarPeriodKind = 'major' | 'minor';

export interface TimingCatch {
  catchId: string;
  caughtAt: string;
  /** Minutes after local midnight at the lake. */
  localMinutes: number;
  minutesFromSunrise: number | null;
  solunarPeriod: SolunarPeriodKind | null;
  weightLb: number;
  fate: string;
}

export interface TimingReport {
  catches: TimingCatch[];
  byHour: Array<{ hour: number; fishCount: number; weightLb: number }>;
}

export interface MapFind {
  findId: string;
  name: string;
  /** Metres east / north of the lake's reference point; null when positions are hidden from viewers. */
  xM: number | null;
  yM: number | null;
  kind: FindKind;
  outcome: FindOutcome;
  fishCount: number;
  weightLb: number;
}

export interface FindMapReport {
  lake: { lat: number | null; lon: number | null };
  finds: MapFind[];
  catches: Array<{ catchId: string; findId: string | null; xM: number | null; yM: number | null; weightLb: number }>;
}
