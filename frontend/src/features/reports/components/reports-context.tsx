import type { CrewView, EventView, LakeView } from '@shoalbook/shared';
import { useOutletContext } from 'react-router-dom';

/** What every report screen receives from the reports layout. */
export interface ReportsContext {
  crew: CrewView;
  lakes: LakeView[];
  events: EventView[];
}

/** The crew and its lakes and events, loaded once by the reports layout. */
export function useReportsContext(): ReportsContext {
  return useOutletContext<ReportsContext>();
}
