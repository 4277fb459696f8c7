import type { CatchRow, DayRow, EventRow, FindRow, GroupStatsRow, LakeRow, OutcomeRow, StopRow } from './rows';
import { tableSpec } from './sql-values';

// Column lists of the read-model tables (the migrations Migration20261220120000 and Migration20261231000000 create them).

export const LAKE_TABLE = tableSpec<LakeRow>('rm_lake', ['id'], {
  id: 'str',
  crewId: 'str',
  name: 'str',
  timeZone: 'str',
  lat: 'num',
  lon: 'num',
});

export const EVENT_TABLE = tableSpec<EventRow>('rm_event', ['id'], {
  id: 'str',
  crewId: 'str',
  lakeId: 'str',
  name: 'str',
  practiceDates: 'json',
  competitionDates: 'json',
  firstDate: 'str',
  season: 'str',
  year: 'num',
  rules: 'json',
  finalPlace: 'num',
  fieldSize: 'num',
  winningLb: 'num',
  cutLb: 'num',
});

export const DAY_TABLE = tableSpec<DayRow>('rm_competition_day', ['id'], {
  id: 'str',
  crewId: 'str',
  eventId: 'str',
  date: 'str',
  hasOfficial: 'bool',
  officialGrossLb: 'num',
  officialPenaltyLb: 'num',
  officialLb: 'num',
  dayPlace: 'num',
  lateMinutes: 'num',
  fieldSize: 'num',
  winningLb: 'num',
  cutLb: 'num',
});

export const FIND_TABLE = tableSpec<FindRow>('rm_find', ['id'], {
  id: 'str',
  crewId: 'str',
  lakeId: 'str',
  eventId: 'str',
  name: 'str',
  kind: 'str',
  subKind: 'str',
  depthFt: 'num',
  hardness: 'num',
  waterTempF: 'num',
  lat: 'num',
  lon: 'num',
});

export const CATCH_TABLE = tableSpec<CatchRow>('rm_catch_fact', ['id'], {
  id: 'str',
  crewId: 'str',
  lakeId: 'str',
  eventId: 'str',
  competitionDayId: 'str',
  dayDate: 'str',
  findId: 'str',
  caughtAtMs: 'instant',
  weightLb: 'num',
  weightUlb: 'num',
  lengthIn: 'num',
  species: 'str',
  fate: 'str',
  lure: 'str',
  lat: 'num',
  lon: 'num',
  localMinutes: 'num',
  minutesFromSunrise: 'num',
  solunarPeriod: 'str',
  timeOfDay: 'str',
  loggedBy: 'str',
  bagState: 'str',
  bagCounted: 'bool',
});

export const STOP_TABLE = tableSpec<StopRow>('rm_stop', ['id'], {
  id: 'str',
  crewId: 'str',
  lakeId: 'str',
  eventId: 'str',
  competitionDayId: 'str',
  findId: 'str',
  arrivedAtMs: 'instant',
  leftAtMs: 'instant',
  seconds: 'num',
});

export const OUTCOME_TABLE = tableSpec<OutcomeRow>('rm_find_outcome', ['findId', 'eventId'], {
  findId: 'str',
  eventId: 'str',
  crewId: 'str',
  lakeId: 'str',
  kind: 'str',
  subKind: 'str',
  depthBand: 'str',
  hardness: 'str',
  temperatureBand: 'str',
  practiced: 'bool',
  fished: 'bool',
  fishCount: 'num',
  weighedCount: 'num',
  weightUlb: 'num',
  weighedWeightUlb: 'num',
  firstBiteAtMs: 'instant',
  stopCount: 'num',
  secondsFished: 'num',
});

export const GROUP_STATS_TABLE = tableSpec<GroupStatsRow>('rm_group_stats', ['eventId', 'grouping', 'groupKey'], {
  eventId: 'str',
  grouping: 'str',
  groupKey: 'str',
  crewId: 'str',
  lakeId: 'str',
  finds: 'num',
  findsFished: 'num',
  findsProducing: 'num',
  findsWeighed: 'num',
  fishCount: 'num',
  weighedCount: 'num',
  weightUlb: 'num',
  weighedWeightUlb: 'num',
  secondsFished: 'num',
});
