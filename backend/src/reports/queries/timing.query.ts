import { Query } from '@nestjs/cqrs';
import type { ReportFilters, TimingView } from '@shoalbook/shared';

/** GET reports/timing: catches against the local clock and the sun/moon periods, weight by hour. */
export class GetTimingQuery extends Query<TimingView> {
  constructor(
    readonly crewId: string,
    readonly filters: ReportFilters,
  ) {
    super();
  }
}
