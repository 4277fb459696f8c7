import { Query } from '@nestjs/cqrs';
import type { FindMapView, ReportFilters } from '@shoalbook/shared';

/** GET reports/find-map: a lake's finds and catches in metres from its reference point. Null for a lake not the crew's. */
export class GetFindMapQuery extends Query<FindMapView | null> {
  constructor(
    readonly crewId: string,
    readonly lakeId: string,
    readonly filters: ReportFilters,
    readonly showPositions: boolean,
  ) {
    super();
  }
}
