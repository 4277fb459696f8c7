import type {
  EventFormat,
  Fate,
  FishState,
  FindKind,
  FoundHow,
  HardnessGrade,
  Species,
  VegetationDensity,
} from './taxonomy.js';
import type { DepthUnit, LengthUnit, TemperatureUnit, WeightUnit } from './units.js';

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
  /**
   * Optimistic-concurrency version: send it back with a PATCH; a stale one gets 409 "stale_version".
   * Always set by the API (optional only so fixtures can build views without it).
   */
  version?: number;
}

/** Per-event rules; the defaults (5 fish, 12 in) are common practice, not law. */
export interface EventRules {
  fishPerDay: number;
  minLengthIn: number | null;
  deadFishPenaltyLb: number;
  shortFishPenaltyLb: number;
  latePenaltyLbPerMinute: number;
  /** Team (one bag per boat) or individual (a bag per angler). */
  format: EventFormat;
}

export const DEFAULT_EVENT_RULES: EventRules = {
  fishPerDay: 5,
  minLengthIn: 12,
  deadFishPenaltyLb: 0.25,
  shortFishPenaltyLb: 1,
  latePenaltyLbPerMinute: 1,
  format: 'team',
};

/** The field an event or a day was fished against, from the results sheet (all optional). */
export interface FieldContext {
  /** Boats (team) or anglers (individual) in the field: a positive integer. */
  fieldSize: number | null;
  /** The winning weight (lb). */
  winningLb: number | null;
  /** The weight that made the cut or the money (lb). */
  cutLb: number | null;
}

/** Where the boats launch and check in (WGS 84 decimal degrees): the end point of the run back. */
export interface RampPosition {
  lat: number;
  lon: number;
}

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
  /** The event's field (results sheet); optional so fixtures can build views without it. */
  field?: FieldContext;
  /** The launch and check-in ramp, if the angler gave it (null: not given); optional so fixtures can omit it. */
  ramp?: RampPosition | null;
  notes: string;
  /** Always set by the API. */
  version?: number;
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
  /** 'form' (typed in) or 'gpx' (imported from a waypoint file). */
  // The fields below are always set by the API; optional only so fixtures can build views without them.
  source?: FindSource;
  /** What the angler typed, exactly, with its unit (null when not given). */
  entered?: { depth: EnteredDepth | null; waterTemp: EnteredTemperature | null };
  /** Sun and moon at markedAt in the lake's time zone; null when markedAt is unknown. */
  sky?: SkyContext | null;
  version?: number;
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
  // The fields below are always set by the API; optional only so fixtures can build views without them.
  /** The crew member who logged the catch (null for catches logged before this was recorded). */
  loggedBy?: { userId: string; name: string } | null;
  competitionDayId?: string;
  /** Name of the find in findId (null without one). */
  findName?: string | null;
  notes?: string;
  entered?: {
    weight: EnteredWeight;
    length: EnteredLength | null;
    depth: EnteredDepth | null;
    waterTemp: EnteredTemperature | null;
  };
  /** Sun and moon at caughtAt in the lake's time zone. */
  sky?: SkyContext | null;
  version?: number;
}

// ---------------------------------------------------------------------------------------------
// Entered values: what the angler typed, kept exactly, beside the canonical number (lb, in, ft, °F).

/** A weight as typed. For 'lb-oz', `value` is the whole pounds and `ounces` the ounces (3 lb 4 oz). */
export interface EnteredWeight {
  value: number;
  unit: WeightUnit;
  ounces?: number;
}
export interface EnteredLength {
  value: number;
  unit: LengthUnit;
}
export interface EnteredDepth {
  value: number;
  unit: DepthUnit;
}
export interface EnteredTemperature {
  value: number;
  unit: TemperatureUnit;
}

export const FIND_SOURCES = ['form', 'gpx', 'demo'] as const;
export type FindSource = (typeof FIND_SOURCES)[number];

/** Sun and moon around an instant at a lake (instants ISO-8601 UTC; the day is the lake's local day). */
export interface SkyContext {
  /** The lake-local calendar date of the instant (YYYY-MM-DD). */
  date: string;
  sunrise: string | null;
  sunset: string | null;
  moonrise: string | null;
  moonset: string | null;
  /** 0 new, 0.25 first quarter, 0.5 full, 0.75 last quarter (at local noon). */
  moonPhase: number;
  /** Illuminated fraction 0–1 (at local noon). */
  moonIllumination: number;
  /** The solunar period the instant fell in, if any (GET /sky: null). */
  period: { kind: 'major' | 'minor'; start: string; end: string } | null;
}

/** GET /sky?lakeId&date: the day's context and all its solunar periods. */
export interface SkyDayView extends Omit<SkyContext, 'period'> {
  timeZone: string;
  civilDawn: string | null;
  civilDusk: string | null;
  periods: { kind: 'major' | 'minor'; start: string; end: string; centre: string }[];
}

export interface PracticeDayView {
  id: string;
  eventId: string;
  date: string;
  notes: string;
  waterTempF: number | null;
  entered: { waterTemp: EnteredTemperature | null };
  version: number;
}

export interface CompetitionDayView {
  id: string;
  eventId: string;
  date: string;
  /** Local "HH:MM" in the lake's time zone. */
  startTime: string | null;
  checkInTime: string | null;
  weatherNotes: string;
  waterTempF: number | null;
  entered: { waterTemp: EnteredTemperature | null };
  version: number;
}

// ---------------------------------------------------------------------------------------------
// Requests. Canonical fields (weightLb …) or entered values ({value, unit}) may be given; not both.

export interface CreateLakeRequest {
  name: string;
  region?: string;
  timeZone: string;
  lat: number;
  lon: number;
  areaAcres?: number | null;
  notes?: string;
}
/** Every PATCH carries the version it was based on. */
export type UpdateLakeRequest = Partial<CreateLakeRequest> & { version: number };

export interface CreateEventRequest {
  lakeId: string;
  name: string;
  organiser?: string;
  practiceDates?: string[];
  competitionDates: string[];
  rules?: Partial<EventRules>;
  entryFee?: number | null;
  payout?: number | null;
  finalPlace?: number | null;
  field?: Partial<FieldContext>;
  /** Both coordinates together; null clears it. */
  ramp?: RampPosition | null;
  notes?: string;
}
/** lakeId cannot change. Dropping a date with finds or catches on it gets 409 "day_in_use". */
export type UpdateEventRequest = Partial<Omit<CreateEventRequest, 'lakeId'>> & { version: number };

export interface UpdatePracticeDayRequest {
  notes?: string;
  waterTempF?: number | null;
  waterTemp?: EnteredTemperature | null;
  version: number;
}
export interface UpdateCompetitionDayRequest {
  startTime?: string | null;
  checkInTime?: string | null;
  weatherNotes?: string;
  waterTempF?: number | null;
  waterTemp?: EnteredTemperature | null;
  version: number;
}

export interface AddFindRequest {
  /** A client-made id (UUID v7, RFC 9562), so a find marked offline keeps its id; the server makes one when omitted. */
  id?: string;
  lakeId: string;
  eventId?: string | null;
  /** One of the event's practice dates; derived from markedAt when omitted. */
  practiceDate?: string | null;
  name: string;
  markedAt?: string | null;
  lat: number;
  lon: number;
  depthFt?: number | null;
  depth?: EnteredDepth | null;
  kind: FindKind;
  subKind?: string;
  hardness?: HardnessGrade | null;
  vegetationDensity?: VegetationDensity | null;
  baitSeen?: boolean;
  fishMarked?: number | null;
  frequencyKhz?: number | null;
  foundHow?: FoundHow | null;
  waterTempF?: number | null;
  waterTemp?: EnteredTemperature | null;
  notes?: string;
  photoId?: string | null;
}
export type UpdateFindRequest = Partial<Omit<AddFindRequest, 'id' | 'lakeId'>> & { version: number };

export interface LogCatchRequest {
  /** A client-made id (UUID v7, RFC 9562), so a catch logged offline keeps its id; the server makes one when omitted. */
  id?: string;
  competitionDayId: string;
  /** ISO-8601 instant, or "HH:MM" local time on the competition day. */
  caughtAt: string;
  findId?: string | null;
  /** With lat/lon and no findId, the catch is attributed to the nearest find within radiusM. */
  lat?: number | null;
  lon?: number | null;
  /** Attribution radius in metres, default 50. */
  radiusM?: number;
  species: string;
  lengthIn?: number | null;
  length?: EnteredLength | null;
  weightLb?: number;
  weight?: EnteredWeight;
  lure?: string;
  technique?: string;
  depthFt?: number | null;
  depth?: EnteredDepth | null;
  waterTempF?: number | null;
  waterTemp?: EnteredTemperature | null;
  fate: Fate;
  notes?: string;
  photoId?: string | null;
}
export type UpdateCatchRequest = Partial<Omit<LogCatchRequest, 'id' | 'competitionDayId'>> & { version: number };

/** Default radius for attributing a catch to a find by coordinates (m). Our choice. */
export const DEFAULT_ATTRIBUTION_RADIUS_M = 50;
/** Imported waypoints within this distance of a find (or of an earlier row) are flagged as duplicates (m). */
export const DUPLICATE_FIND_RADIUS_M = 15;

// ---------------------------------------------------------------------------------------------
// Weigh-ins

export interface RecordWeighInRequest {
  grossLb?: number | null;
  penaltyLb?: number | null;
  officialLb?: number | null;
  dayPlace?: number | null;
  lateMinutes?: number | null;
  /** The day's field from the results sheet. */
  fieldSize?: number | null;
  winningLb?: number | null;
  cutLb?: number | null;
  /** The version of the recorded weigh-in this change is based on; omitted only for the first recording. */
  version?: number;
}

export interface OfficialWeighIn {
  grossLb: number | null;
  penaltyLb: number | null;
  officialLb: number | null;
  dayPlace: number | null;
  lateMinutes: number | null;
  /** The day's field (optional so older fixtures can build views without it). */
  fieldSize?: number | null;
  winningLb?: number | null;
  cutLb?: number | null;
  /** Send it back with the next PUT (409 "stale_version" when someone saved in between). */
  version?: number;
}

/** What the bag rule made of one fish. */
export interface BagFishVerdict {
  catchId: string;
  state: FishState;
  /** In the counted bag (a counted dead fish has state 'dead' and counted true). */
  counted: boolean;
  /** Reached the scale: counted fish and short fish brought in; culled and released fish never do. */
  weighed: boolean;
  penaltyLb: number;
}

/** One penalty, itemised. */
export interface BagPenaltyItem {
  kind: 'dead' | 'short' | 'late';
  catchId: string | null;
  lb: number;
  minutes?: number;
}

/** One bag (the boat's in a team event, an angler's in an individual one). */
export interface BagView {
  /** The angler of an individual bag; null for a team bag. */
  anglerId: string | null;
  /** Catch ids counted, highest value first. */
  counted: string[];
  fish: BagFishVerdict[];
  penalties: BagPenaltyItem[];
  grossLb: number;
  penaltyLb: number;
  netLb: number;
  /** Live bag: the counted fish a better one replaces (null while the limit is not filled). */
  nextToCull: string | null;
  /** A new legal live fish improves the bag when it weighs more than this (0 while the limit is not filled). */
  mustBeatLb: number;
}

/** A day's bags by the one bag rule (analytics dayBag), with the day's sums. */
export interface ComputedBag {
  format: EventFormat;
  bags: BagView[];
  /** Every counted catch of the day. */
  counted: string[];
  /** Every catch of the day, with its state. */
  fish: BagFishVerdict[];
  penalties: BagPenaltyItem[];
  grossLb: number;
  /** Dead and short fish penalties, plus the late penalty when the official lateMinutes is known. */
  penaltyLb: number;
  netLb: number;
}

/** One event's line in the events list: its fish and its weight, by the one bag rule and the official figures. */
export interface EventTally {
  eventId: string;
  /** Every catch logged on its competition days. */
  fishCaught: number;
  /** Fish in the counted bags. */
  fishCounted: number;
  /** Sum over days of the official weight where entered, else the computed net. */
  totalLb: number;
  /** Every competition day has its official weight entered. */
  allOfficial: boolean;
}

/** Official figure minus Shoalbook's own computation (null where the official one is not entered). */
export interface OfficialDifference {
  grossLb: number | null;
  penaltyLb: number | null;
  netLb: number | null;
}

export interface WeighInDayView {
  competitionDayId: string;
  date: string;
  computed: ComputedBag;
  official: OfficialWeighIn | null;
  /** Official minus computed, beside both (neither is ever overwritten). */
  difference: OfficialDifference;
  catches: CatchView[];
}

export interface WeighInsView {
  days: WeighInDayView[];
  totals: {
    computedNetLb: number;
    /** Sum over days of the official weight where recorded, else the computed net. */
    officialLb: number;
    /** officialLb − computedNetLb. */
    differenceLb: number;
    finalPlace: number | null;
    field: FieldContext;
  };
}

// ---------------------------------------------------------------------------------------------
// Imports

export interface DuplicateOf {
  findId: string | null;
  name: string;
  distanceM: number;
  /** True when the match is an earlier row of the same file (findId is then null). */
  inFile?: boolean;
  /** Index of that earlier row, when inFile. */
  rowIndex?: number;
}

export interface FindImportRow {
  index: number;
  name: string;
  lat: number | null;
  lon: number | null;
  markedAt: string | null;
  depthFt: number | null;
  /** The kind the file names for this waypoint (`<type>`, as Shoalbook's GPX export writes it); else the import's. */
  kind: FindKind | null;
  /** The waypoint's description (`<desc>`), kept as the find's notes. */
  notes: string;
  error: string | null;
  duplicateOf: DuplicateOf | null;
}

/** Answer of POST /finds/bulk-update. */
export interface BulkUpdateFindsResult {
  updated: number;
}

/** Answer of POST /finds/bulk-delete: the catches and stops that lost their find stay in the journal. */
export interface BulkDeleteFindsResult {
  deleted: number;
  catchesUnattached: number;
  stopsUnattached: number;
}

export interface FindImportPreview {
  rows: FindImportRow[];
  /** Rows without an error (duplicates included: they are skipped on commit unless skipDuplicates=false). */
  accepted: number;
  rejected: number;
  duplicates: number;
}

export interface ImportRowError {
  index: number;
  /** 1-based line in the CSV (header = 1), for CSV imports. */
  line?: number;
  field?: string;
  message: string;
}

export interface FindImportResult {
  imported: number;
  skipped: number;
  errors: ImportRowError[];
}

export interface CatchImportRow {
  index: number;
  line: number;
  caughtAt: string | null;
  species: string | null;
  weightLb: number | null;
  lengthIn: number | null;
  findId: string | null;
  attributionDistanceM: number | null;
  weightFlagged: boolean;
  /** The catch already logged, or the earlier line of this file, that this row repeats; skipped on import. */
  duplicateOf: CatchDuplicateOf | null;
  errors: { field: string; message: string }[];
}

/** `catchId` of the logged catch, or null with the `line` of the file that came first. */
export interface CatchDuplicateOf {
  catchId: string | null;
  line?: number;
}

export interface CatchImportPreview {
  rows: CatchImportRow[];
  /** Rows without an error (duplicates included: they are skipped on import). */
  accepted: number;
  rejected: number;
  duplicates: number;
}

export interface CatchImportResult {
  imported: number;
  /** Rows skipped because they repeat a catch already logged or an earlier line. */
  skipped: number;
  errors: ImportRowError[];
}

/** Columns of the catch CSV (GET /catches/import/template). Units default to lb, in, ft, F when blank. */
export const CATCH_CSV_COLUMNS = [
  'date',
  'time',
  'species',
  'weight',
  'weight_unit',
  'weight_oz',
  'length',
  'length_unit',
  'fate',
  'lure',
  'technique',
  'depth',
  'depth_unit',
  'water_temp',
  'water_temp_unit',
  'find_name',
  'lat',
  'lon',
  'notes',
] as const;

// ---------------------------------------------------------------------------------------------
// Photos and exports

export interface PhotoView {
  id: string;
  contentType: string;
  width: number;
  height: number;
  byteSize: number;
}

export interface JournalExport {
  format: 'shoalbook-journal';
  version: 1;
  exportedAt: string;
  crewId: string;
  /** Says the file holds exact positions: keep it private. */
  notice: string;
  lakes: LakeView[];
  events: (EventView & {
    practiceDays: PracticeDayView[];
    competitionDays: CompetitionDayView[];
    weighIns: (OfficialWeighIn & { competitionDayId: string })[];
  })[];
  finds: FindView[];
  catches: CatchView[];
}

// ---------------------------------------------------------------------------------------------
// The append-only journal_event table (read by the read-model projections, in seq order).
// Imports write one FindAdded (payload.source = 'gpx') or CatchLogged per imported record.

export const JOURNAL_EVENT_TYPES = [
  'LakeCreated',
  'LakeUpdated',
  'LakeDeleted',
  'EventCreated',
  'EventUpdated',
  'EventDeleted',
  'PracticeDayUpdated',
  'CompetitionDayUpdated',
  'FindAdded',
  'FindUpdated',
  'FindDeleted',
  'CatchLogged',
  'CatchUpdated',
  'CatchDeleted',
  'WeighInRecorded',
  'PhotoUploaded',
  'StopLogged',
  'StopUpdated',
  'StopDeleted',
] as const;
export type JournalEventType = (typeof JOURNAL_EVENT_TYPES)[number];

// ---------------------------------------------------------------------------------------------
// A record's history, read back from the journal: every change to a figure stays there.

/** The figures of a catch whose every change is shown as its history. */
export const CATCH_HISTORY_FIELDS = ['weightLb', 'lengthIn'] as const;
/** The official figures of a day's weigh-in whose every change is shown as its history. */
export const WEIGH_IN_HISTORY_FIELDS = [
  'grossLb',
  'penaltyLb',
  'officialLb',
  'lateMinutes',
  'dayPlace',
  'fieldSize',
  'winningLb',
  'cutLb',
] as const;
export type CatchHistoryField = (typeof CATCH_HISTORY_FIELDS)[number];
export type WeighInHistoryField = (typeof WEIGH_IN_HISTORY_FIELDS)[number];

/** One change to one figure, oldest first in a history; weights in lb, lengths in inches (canonical). */
export interface RecordChange<F extends string = CatchHistoryField | WeighInHistoryField> {
  field: F;
  /** null when the figure had no value before (always so for the first recording). */
  from: number | null;
  to: number | null;
  /** When the change was written (ISO-8601 UTC). */
  at: string;
  /** The crew member who made it (display name); null if the account no longer exists. */
  byName: string | null;
  /** The record's first recording rather than a later change. */
  first: boolean;
}
