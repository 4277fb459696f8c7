import type {
  EventFindsView,
  EventRecapView,
  FindMapView,
  HitRateGroupView,
  HitRateGroupingKey,
  HitRatesView,
  LakeComparisonView,
  PaidOffFindView,
  ReportEventRef,
  ReportFish,
  TimingView,
} from '@shoalbook/shared';

/**
 * Answer shapes of the report routes (GET /api/crews/:crewId/reports/…): the shared contract's types
 * (@shoalbook/shared reports.ts), under the names the report screens use. Weights lb, depths ft,
 * temperatures °F (canonical); the screens convert for display.
 */
export type { FindOutcome, Rate, RecapDay, Season, TimingCatch } from '@shoalbook/shared';
export { HIT_RATE_GROUPINGS, CATCH_UNIT_GROUPINGS } from '@shoalbook/shared';

export type HitRateGrouping = HitRateGroupingKey;
export type HitRateGroup = HitRateGroupView;
export type HitRatesReport = HitRatesView;
export type ComparedEvent = ReportEventRef;
export type LakeComparisonReport = LakeComparisonView;
export type LakeComparisonGroup = LakeComparisonView['groups'][number];
export type EventComparison = LakeComparisonView['comparisons'][number];
export type RecapFish = ReportFish;
export type EventRecap = EventRecapView;
export type EventFindRow = PaidOffFindView;
export type EventFindsReport = EventFindsView;
export type TimingReport = TimingView;
export type FindMapReport = FindMapView;
export type MapFind = FindMapView['finds'][number];

/** Outcomes of a find in an event, best first (the contract's list). */
export { FIND_OUTCOMES } from '@shoalbook/shared';
