import { Query } from '@nestjs/cqrs';
import type { HitRateGroupingKey, LakeComparisonView, ReportFilters } from '@shoalbook/shared';

/** GET reports/lake-comparison: one grouping side by side for the events on one lake. */
export class GetLakeComparisonQuery extends Query<LakeComparisonView> {
  constructor(
    readonly crewId: string,
    readonly lakeId: string,
    readonly by: HitRateGroupingKey,
    readonly filters: ReportFilters,
    readonly eventIds: string[] | undefined,
  ) {
    super();
  }
}
