import type { Fate, FindKind, FoundHow, HardnessGrade, Species, VegetationDensity } from './taxonomy.js';

/** Storage units: what the API stores and returns. Display conversion happens in the client. */
export interface LakeView {
  id: string;
  name: string;
  region: string;
  /** IANA time zone, e.g. "America/Chicago". */
  timeZone: string;
  lat: number;
  lon: number;
  areaAcres: number | null;
  notes: string;
}

/** Per-event rules; the defaults (5 fish, 12 in) are common practice, not law. */
export interface EventRules {
  fishPerDay: number;
  minLengthIn: number | null;
  deadFishPenaltyLb: number;
  shortFishPenaltyLb: number;
  latePenaltyLbPerMinute: number;
}

export const DEFAULT_EVENT_RULES: EventRules = {
  fishPerDay: 5,
  minLengthIn: 12,
  deadFishPenaltyLb: 0.25,
  shortFishPenaltyLb: 1,
  latePenaltyLbPerMinute: 1,
};

export interface EventView {
  id: string;
  lakeId: string;
  name: string;
  organiser: string;
  /** Local calendar dates (YYYY-MM-DD) in the lake's time zone. */
  practiceDates: string[];
  competitionDates: string[];
  rules: EventRules;
  entryFee: number | null;
  payout: number | null;
  finalPlace: number | null;
  notes: string;
}

export interface FindView {
  id: string;
  lakeId: string;
  eventId: string | null;
  practiceDate: string | null;
  name: string;
  /** When the find was marked (ISO-8601 UTC), if known. */
  markedAt: string | null;
  /** Null when positions are hidden from the caller (viewer without permission). */
  lat: number | null;
  lon: number | null;
  depthFt: number | null;
  kind: FindKind;
  subKind: string;
  hardness: HardnessGrade | null;
  vegetationDensity: VegetationDensity | null;
  baitSeen: boolean;
  fishMarked: number | null;
  frequencyKhz: number | null;
  foundHow: FoundHow | null;
  waterTempF: number | null;
  notes: string;
  photoId: string | null;
}

export interface CatchView {
  id: string;
  eventId: string;
  competitionDate: string;
  caughtAt: string;
  findId: string | null;
  /** Distance to the attributed find when attributed from coordinates (m). */
  attributionDistanceM: number | null;
  lat: number | null;
  lon: number | null;
  species: Species;
  lengthIn: number | null;
  weightLb: number;
  lure: string;
  technique: string;
  depthFt: number | null;
  waterTempF: number | null;
  fate: Fate;
  photoId: string | null;
  /** Relative weight looks implausible for the length: flagged for a second look, never changed. */
  weightFlagged: boolean;
}
