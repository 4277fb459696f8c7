import { GetEventFindsHandler } from './event-finds.handler';
import { GetEventRecapHandler } from './event-recap.handler';
import { GetFindMapHandler } from './find-map.handler';
import { GetHitRatesHandler } from './hit-rates.handler';
import { GetLakeComparisonHandler } from './lake-comparison.handler';
import { GetTimingHandler } from './timing.handler';

export const REPORT_QUERY_HANDLERS = [
  GetHitRatesHandler,
  GetLakeComparisonHandler,
  GetEventRecapHandler,
  GetEventFindsHandler,
  GetTimingHandler,
  GetFindMapHandler,
];
