import { GraphIcon } from '@primer/octicons-react';
import { Heading, UnderlineNav } from '@primer/react';
import type { CrewView } from '@shoalbook/shared';
import { Link as RouterLink, Outlet, useLocation, useOutletContext, useSearchParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { filterQuery, readFilters } from '../api/report-filters';
import { useReportEvents, useReportLakes } from '../api/reports-api';
import type { ReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { reportPaths } from '../report-paths';

/** /crews/:crewId/reports/*: loads the crew's lakes and events once and shows the list of reports. */
export function Component() {
  const { crew } = useOutletContext<{ crew: CrewView }>();
  const { pathname } = useLocation();
  const [params] = useSearchParams();
  const lakes = useReportLakes(crew.id);
  const events = useReportEvents(crew.id);

  if (lakes.isPending || events.isPending) return <LoadingState label="Opening the reports…" />;
  if (lakes.isError || events.isError) {
    return (
      <ErrorState
        error={lakes.error ?? events.error}
        title="The reports could not be opened"
        onRetry={() => {
          void lakes.refetch();
          void events.refetch();
        }}
      />
    );
  }

  const filters = readFilters(params);
  const query = filterQuery(filters);
  const eventQuery = filterQuery({ ...filters, eventId: undefined });
  const eventMatch = /\/reports\/events\/([^/]+)/.exec(pathname);
  const eventId = eventMatch ? decodeURIComponent(eventMatch[1]) : filters.eventId;
  const tabs = [
    {
      id: 'home',
      label: 'Overview',
      href: reportPaths.home.href(crew.id, query),
      current: pathname.endsWith('/reports'),
    },
    {
      id: 'hit-rates',
      label: 'Hit rates',
      href: reportPaths.hitRates.href(crew.id, query),
      current: pathname.endsWith('/hit-rates'),
    },
    {
      id: 'lake',
      label: 'Same lake, across events',
      href: reportPaths.lakeComparison.href(crew.id, query),
      current: pathname.endsWith('/lake-comparison'),
    },
    {
      id: 'recap',
      label: 'Event recap',
      href: eventId ? reportPaths.recap.href(crew.id, eventId, eventQuery) : reportPaths.events.href(crew.id, query),
      current: /\/reports\/events(\/[^/]+)?$/.test(pathname),
    },
    {
      id: 'finds',
      label: 'Paid-off finds',
      href: eventId
        ? reportPaths.eventFinds.href(crew.id, eventId, eventQuery)
        : reportPaths.events.href(crew.id, `${query}${query ? '&' : '?'}next=finds`),
      current: /\/reports\/events\/[^/]+\/finds$/.test(pathname),
    },
    {
      id: 'timing',
      label: 'Timing',
      href: reportPaths.timing.href(crew.id, query),
      current: pathname.endsWith('/timing'),
    },
    { id: 'map', label: 'Find map', href: reportPaths.map.href(crew.id, query), current: pathname.endsWith('/map') },
  ];

  return (
    <div className="sb-reports">
      <Heading as="h2" variant="medium" className="sb-no-print">
        <GraphIcon /> Reports
      </Heading>
      <UnderlineNav aria-label="Reports" className={`${styles.reportNav} sb-no-print`}>
        {tabs.map((tab) => (
          <UnderlineNav.Item key={tab.id} as={RouterLink} to={tab.href} aria-current={tab.current ? 'page' : undefined}>
            {tab.label}
          </UnderlineNav.Item>
        ))}
      </UnderlineNav>
      <Outlet context={{ crew, lakes: lakes.data, events: events.data } satisfies ReportsContext} />
    </div>
  );
}
