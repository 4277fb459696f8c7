import type { BagPenaltyItem, EventRules, FieldContext, OfficialDifference } from './journal.js';
import type { Fate, FindKind, FishState, Species } from './taxonomy.js';

// Reports (issue 5): routes under /api/crews/:crewId/reports/. Weights in lb, depths in ft, temperatures in °F,
// instants ISO-8601 UTC, dates YYYY-MM-DD local to the lake. Rates are fractions 0–1.

/** Meteorological seasons of the northern hemisphere, from the event's first competition date (lake-local). */
export const SEASONS = ['spring', 'summer', 'fall', 'winter'] as const;
export type Season = (typeof SEASONS)[number];
export const SEASON_LABELS: Record<Season, string> = {
  spring: 'Spring',
  summer: 'Summer',
  fall: 'Fall',
  winter: 'Winter',
};

/**
 * Filters common to the report routes (query parameters). `season`, `year`, `from` and `to` select events by
 * their first competition date (lake-local): Mar–May spring, Jun–Aug summer, Sep–Nov fall, Dec–Feb winter.
 */
export interface ReportFilters {
  lakeId?: string;
  eventId?: string;
  season?: Season;
  year?: number;
  /** YYYY-MM-DD, inclusive. */
  from?: string;
  to?: string;
}

/** Groupings of the hit-rate report. */
export const HIT_RATE_GROUPINGS = [
  'kind',
  'subKind',
  'depthBand',
  'hardness',
  'temperatureBand',
  'solunarPeriod',
  'timeOfDay',
] as const;
export type HitRateGroupingKey = (typeof HIT_RATE_GROUPINGS)[number];
/** Groupings whose unit is the catch, not the find: a find's catches fall in different periods. */
export const CATCH_UNIT_GROUPINGS: readonly HitRateGroupingKey[] = ['solunarPeriod', 'timeOfDay'];
export const HIT_RATE_GROUPING_LABELS: Record<HitRateGroupingKey, string> = {
  kind: 'Kind of place',
  subKind: 'Sub-kind',
  depthBand: 'Depth band',
  hardness: 'Hardness grade',
  temperatureBand: 'Water temperature',
  solunarPeriod: 'Sun and moon period',
  timeOfDay: 'Time of day',
};

/**
 * Time-of-day bands by the lake's local clock. Shoalbook's own choice, not a standard:
 * early (before 08:00), morning (08–11), midday (11–14), afternoon (14–17), late (17:00 and after).
 */
export const TIME_OF_DAY_BANDS = ['early', 'morning', 'midday', 'afternoon', 'late'] as const;
export type TimeOfDayBand = (typeof TIME_OF_DAY_BANDS)[number];
export const TIME_OF_DAY_LABELS: Record<TimeOfDayBand, string> = {
  early: 'Early (before 8:00)',
  morning: 'Morning (8:00–11:00)',
  midday: 'Midday (11:00–14:00)',
  afternoon: 'Afternoon (14:00–17:00)',
  late: 'Late (17:00 on)',
};

/** Solunar grouping keys: a catch in a major or minor period, or in neither ('none'). */
export const SOLUNAR_KEYS = ['major', 'minor', 'none'] as const;
export type SolunarKey = (typeof SOLUNAR_KEYS)[number];

/** A proportion with its Wilson 95 % interval and its empirical-Bayes shrunk value (all fractions; rate NaN → null). */
export interface Rate {
  successes: number;
  trials: number;
  /** successes / trials; null when trials = 0. */
  rate: number | null;
  lower: number;
  upper: number;
  /** Shrunk toward the rate over all groups shown (small groups move most); null without any trials at all. */
  shrunk: number | null;
}

/**
 * One group of the hit-rate report.
 *
 * For the find groupings (kind, subKind, depthBand, hardness, temperatureBand) the unit is the find fished in an
 * event: a find counts as fished in an event when it has a stop on one of the event's competition days or produced a
 * catch in it (ADR 0008; a practice mark alone does not count). `producing` = finds with at least one fish / finds fished;
 * `weighed` = finds with a weighed fish / finds fished.
 *
 * For the catch groupings (solunarPeriod, timeOfDay) the unit is the catch, since one find's catches fall in
 * different periods: `fishCount`, `weightLb` and `shareOfFish` (this group's fish / all fish, as a Rate) are set;
 * the find counts are 0, `producing` equals `shareOfFish` (so ranks and charts read the same field for both units)
 * and `weighed` = weighed fish / the group's fish.
 */
export interface HitRateGroupView {
  /** null = not recorded (no depth, no hardness grade …). */
  key: string | null;
  label: string;
  finds: number;
  findsFished: number;
  findsProducing: number;
  findsWeighed: number;
  fishCount: number;
  weighedCount: number;
  weightLb: number;
  producing: Rate;
  weighed: Rate;
  /** Share of all fish of the report in this group (catch groupings; for find groupings too, for reference). */
  shareOfFish: Rate;
  /** Time on the group's finds over their stops, whole seconds (0 for the catch groupings). */
  secondsFished: number;
  /**
   * Fish per hour fished: the group's fish in the events with stops recorded over that time; null without any
   * timed stop (catch groupings, or events whose fished counts are derived from catches).
   */
  fishPerHour: number | null;
  /** 1 = best by the shrunk rate (producing for find groupings, share of fish for catch groupings). */
  rank: number;
}

export interface HitRatesView {
  by: HitRateGroupingKey;
  /** 'find' or 'catch': what one trial is (see HitRateGroupView). */
  unit: 'find' | 'catch';
  groups: HitRateGroupView[];
  overall: {
    finds: number;
    findsFished: number;
    findsProducing: number;
    fishCount: number;
    /** Of `fishCount`, the fish in a day's counted bag (the one bag rule). */
    countedCount: number;
    weightLb: number;
    producing: Rate;
    secondsFished: number;
    fishPerHour: number | null;
  };
  /**
   * Events in the selection whose competition days have catches but no stops (logged before stops existed): their
   * finds count as fished by the catches alone (one stop per find and day with a catch), so their figures are
   * "derived from catches" and have no time fished.
   */
  derivedEvents: number;
  /** Plain-words readings, e.g. "Hard bottom produced on 14 of 40 finds fished (35 %, 22–50 %)." */
  readings: string[];
  /** Events the figures cover. */
  eventCount: number;
}

export interface ReportEventRef {
  id: string;
  name: string;
  /** First competition date (lake-local), or null. */
  firstDate: string | null;
  season: Season | null;
  year: number | null;
  /** Catches but no stops on its competition days: "fished" is derived from the catches (see HitRatesView). */
  derivedFromCatches: boolean;
}

export type EventRate = Rate & { findsFished: number; fishPerHour: number | null };

export interface LakeComparisonView {
  lake: { id: string; name: string };
  by: HitRateGroupingKey;
  /** Oldest first. */
  events: ReportEventRef[];
  /** Each event's bags and its place against its field, by event id: events of different difficulty side by side. */
  results: Record<string, EventTotals>;
  groups: { key: string | null; label: string; perEvent: Record<string, EventRate> }[];
  /**
   * Differences of the producing rate between consecutive events, and first against last (Newcombe hybrid
   * score interval, Fisher exact p-value, from @shoalbook/analytics compareProportions). difference = a − b.
   */
  comparisons: {
    key: string | null;
    label: string;
    a: string;
    b: string;
    difference: number | null;
    lower: number;
    upper: number;
    pValue: number;
    /** p < 0.05 and the interval excludes 0. */
    moreThanChance: boolean;
    reading: string;
  }[];
}

/** A fish in a report (no position). */
export interface ReportFish {
  catchId: string;
  caughtAt: string;
  weightLb: number;
  lengthIn: number | null;
  species: Species;
  fate: Fate;
  findId: string | null;
  findName: string | null;
  lure: string;
  /** Local calendar date of the competition day. */
  day: string;
}

/** A fish of a recap day with what the bag rule made of it. */
export interface RecapFish extends ReportFish {
  state: FishState;
  /** Reached the scale (counted fish and short fish brought in). */
  weighed: boolean;
  penaltyLb: number;
}

/** A place and a weight read against the field the angler entered (analytics fieldStanding). */
export interface StandingView {
  /** "26th of 180 (top 15 %)"; null without a place. */
  place: string | null;
  topPercent: number | null;
  behindWinnerLb: number | null;
  overCutLb: number | null;
  readings: string[];
}

/**
 * An event's bags over its days. officialLb: per day the official weight where recorded, else the computed net;
 * differenceLb = officialLb − netLb; standing: the final place and the total against the event's field.
 */
export interface EventTotals {
  netLb: number;
  officialLb: number;
  differenceLb: number;
  finalPlace: number | null;
  standing: StandingView;
}

export interface RecapDay {
  competitionDayId: string;
  date: string;
  /** The counted fish by the one bag rule (@shoalbook/analytics dayBag) under the event's rules. */
  counted: ReportFish[];
  /** Every fish of the day, with its state (counted, culled, released, short or dead). */
  fish: RecapFish[];
  penalties: BagPenaltyItem[];
  grossLb: number;
  penaltyLb: number;
  netLb: number;
  official: {
    grossLb: number | null;
    penaltyLb: number | null;
    officialLb: number | null;
    dayPlace: number | null;
    lateMinutes: number | null;
  } | null;
  /** Official minus computed, beside both. */
  difference: OfficialDifference;
  dayPlace: number | null;
  /** The day's field from the results sheet. */
  field: FieldContext;
  /** The day's place and weight (official where entered) against its field. */
  standing: StandingView;
}

export interface EventRecapView {
  event: {
    id: string;
    name: string;
    lake: { id: string; name: string; timeZone: string };
    dates: { practice: string[]; competition: string[] };
    rules: EventRules;
    finalPlace: number | null;
    field: FieldContext;
  };
  days: RecapDay[];
  totals: EventTotals;
  producingFinds: {
    findId: string;
    name: string;
    kind: FindKind;
    subKind: string;
    fishCount: number;
    weightLb: number;
  }[];
  /** Every fish by time; cumulativeBagLb = that day's best legal bag so far (the bag as it stood after the fish). */
  timeline: { catchId: string; caughtAt: string; weightLb: number; cumulativeBagLb: number; day: string }[];
  bigFish: ReportFish | null;
  /** Fish caught (every fate) and, of them, in a day's counted bag. */
  fishCaught: number;
  fishCounted: number;
  findsFished: number;
  /** Time on finds over the event's stops (whole seconds), and the fish caught in stops per hour of it. */
  secondsFished: number;
  fishPerHour: number | null;
  /** Catches but no stops: findsFished counts the finds with a catch (derived from catches), and no time is known. */
  derivedFromCatches: boolean;
  /** Finds marked in the event's practice. */
  findsPracticed: number;
  /** Practice finds that produced a fish / practice finds. */
  shareOfPracticePaidOff: Rate;
  readings: string[];
}

/** Outcomes of a find in an event, best first. */
export const FIND_OUTCOMES = ['weighed', 'caught', 'fished-blank', 'not-fished'] as const;
export type FindOutcome = (typeof FIND_OUTCOMES)[number];

export interface PaidOffFindView {
  findId: string;
  name: string;
  kind: FindKind;
  subKind: string;
  depthFt: number | null;
  hardness: number | null;
  waterTempF: number | null;
  /** True when the find was marked in this event's practice (false: an older find that produced here). */
  practiced: boolean;
  fished: boolean;
  /** Stops on the find in the event; derived from catches (one per day with a catch) where no stops were logged. */
  stopCount: number;
  /** Time on the find over its stops, whole minutes; null when derived from catches. */
  minutesFished: number | null;
  fishPerHour: number | null;
  fishCount: number;
  weighedCount: number;
  weightLb: number;
  firstBiteAt: string | null;
  outcome: FindOutcome;
}

export interface EventFindsView {
  finds: PaidOffFindView[];
  /** Finds with a fish / finds fished. */
  paidOff: Rate;
  /** See EventRecapView.derivedFromCatches. */
  derivedFromCatches: boolean;
}

export interface TimingCatch {
  catchId: string;
  caughtAt: string;
  /** Minutes after local midnight (lake's zone, wall clock). */
  localMinutes: number;
  /** Minutes after the day's sunrise (negative before it); null when the sun does not rise. */
  minutesFromSunrise: number | null;
  solunarPeriod: 'major' | 'minor' | null;
  weightLb: number;
  fate: Fate;
  eventId: string;
  day: string;
}

export interface TimingView {
  /** At most 5,000 catches in time order, thinned evenly (first and last kept) when there are more. */
  catches: TimingCatch[];
  /** Every catch the filters select; more than catches.length when the scatter was thinned. */
  totalCatches: number;
  /** Local clock hour 0–23. */
  byHour: { hour: number; fishCount: number; weightLb: number }[];
}

export interface FindMapView {
  lake: { id: string; name: string; lat: number; lon: number };
  /** True when positions are hidden from the caller (viewer, crew setting): xM/yM are null. */
  positionsHidden: boolean;
  finds: {
    findId: string;
    name: string;
    xM: number | null;
    yM: number | null;
    kind: FindKind;
    outcome: FindOutcome;
    fishCount: number;
    weightLb: number;
  }[];
  catches: { catchId: string; findId: string | null; xM: number | null; yM: number | null; weightLb: number }[];
}

export interface RecapEmailRequest {
  userIds: string[];
}
export interface RecapEmailResult {
  sent: number;
}

export interface ProjectionRebuildResult {
  events: number;
  durationMs: number;
}
