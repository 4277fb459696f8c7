import { useNavigate } from 'react-router-dom';
import { filterQuery, useReportFilters, type ReportFilters } from '../api/report-filters';
import { ReportFiltersBar } from './report-filters-bar';
import { useReportsContext } from './reports-context';

/**
 * The filter bar wired to the address: changes go into the query string. On an event's own report
 * (`eventRoute`), picking another event opens that event's report with the other filters kept.
 */
export function ReportFilters({
  show,
  eventRoute,
}: {
  show?: ReadonlyArray<keyof ReportFilters>;
  eventRoute?: {
    eventId: string;
    href: (eventId: string, query: string) => string;
    emptyHref: (query: string) => string;
  };
}) {
  const { lakes, events } = useReportsContext();
  const { filters, setFilters, clearFilters } = useReportFilters();
  const navigate = useNavigate();
  return (
    <ReportFiltersBar
      filters={filters}
      lakes={lakes}
      events={events}
      onChange={setFilters}
      onClear={clearFilters}
      show={show}
      currentEventId={eventRoute?.eventId}
      onEventChange={
        eventRoute
          ? (eventId) => {
              const query = filterQuery({ ...filters, eventId: undefined });
              navigate(eventId ? eventRoute.href(eventId, query) : eventRoute.emptyHref(query));
            }
          : undefined
      }
    />
  );
}
