import { Query } from '@nestjs/cqrs';
import type { HitRateGroupingKey, HitRatesView, ReportFilters } from '@shoalbook/shared';

/** GET reports/hit-rates: the crew's finds (or catches) grouped, with rates, intervals, ranks and readings. */
export class GetHitRatesQuery extends Query<HitRatesView> {
  constructor(
    readonly crewId: string,
    readonly filters: ReportFilters,
    readonly by: HitRateGroupingKey,
  ) {
    super();
  }
}
