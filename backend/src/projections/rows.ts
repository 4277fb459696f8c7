import type { EventRules, Season } from '@shoalbook/shared';

// Plain rows of the read-model tables as the projector holds them in memory (instants as epoch ms).

export interface LakeRow {
  id: string;
  crewId: string;
  name: string;
  timeZone: string;
  lat: number;
  lon: number;
}

export interface EventRow {
  id: string;
  crewId: string;
  lakeId: string;
  name: string;
  practiceDates: string[];
  competitionDates: string[];
  firstDate: string | null;
  season: Season | null;
  year: number | null;
  rules: EventRules;
  finalPlace: number | null;
  fieldSize: number | null;
  winningLb: number | null;
  cutLb: number | null;
}

export interface DayRow {
  id: string;
  crewId: string;
  eventId: string;
  date: string;
  hasOfficial: boolean;
  officialGrossLb: number | null;
  officialPenaltyLb: number | null;
  officialLb: number | null;
  dayPlace: number | null;
  lateMinutes: number | null;
  fieldSize: number | null;
  winningLb: number | null;
  cutLb: number | null;
}

export interface FindRow {
  id: string;
  crewId: string;
  lakeId: string;
  eventId: string | null;
  name: string;
  kind: string;
  subKind: string;
  depthFt: number | null;
  hardness: number | null;
  waterTempF: number | null;
  lat: number;
  lon: number;
}

export interface CatchRow {
  id: string;
  crewId: string;
  lakeId: string;
  eventId: string;
  competitionDayId: string;
  dayDate: string;
  findId: string | null;
  caughtAtMs: number;
  weightLb: number;
  /** Weight in micro-pounds, an integer, so sums do not depend on the order rows are added in. */
  weightUlb: number;
  lengthIn: number | null;
  species: string;
  fate: string;
  lure: string;
  lat: number | null;
  lon: number | null;
  localMinutes: number;
  minutesFromSunrise: number | null;
  solunarPeriod: string;
  timeOfDay: string;
  loggedBy: string | null;
  /** The fish's state under its day's bag rule (bag-states.ts); '' until the day is counted. */
  bagState: string;
  /** In the day's counted bag: what the "weighed" counts and weights of outcomes and statistics sum. */
  bagCounted: boolean;
}

export interface StopRow {
  id: string;
  crewId: string;
  lakeId: string;
  eventId: string;
  competitionDayId: string;
  findId: string | null;
  arrivedAtMs: number;
  leftAtMs: number | null;
  /** Whole seconds from arrival to leaving; 0 while the angler is still there. */
  seconds: number;
}

export interface OutcomeRow {
  findId: string;
  eventId: string;
  crewId: string;
  lakeId: string;
  kind: string;
  subKind: string;
  depthBand: string;
  hardness: string;
  temperatureBand: string;
  practiced: boolean;
  /** A stop on the find on one of the event's competition days, or a catch on it (practice marks do not count). */
  fished: boolean;
  fishCount: number;
  weighedCount: number;
  weightUlb: number;
  weighedWeightUlb: number;
  firstBiteAtMs: number | null;
  stopCount: number;
  secondsFished: number;
}

export interface GroupStatsRow {
  eventId: string;
  grouping: string;
  groupKey: string;
  crewId: string;
  lakeId: string;
  finds: number;
  findsFished: number;
  findsProducing: number;
  findsWeighed: number;
  fishCount: number;
  weighedCount: number;
  weightUlb: number;
  weighedWeightUlb: number;
  secondsFished: number;
}

/** Pounds → integer micro-pounds (1e-6 lb, far below any scale's resolution). */
export const toMicroLb = (lb: number): number => Math.round(lb * 1e6);
/** Integer micro-pounds → pounds. */
export const fromMicroLb = (ulb: number): number => ulb / 1e6;
