import { Heading, Link, Text } from '@primer/react';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { dayLabel } from '../../../lib/lake-time';
import { filterQuery, useReportFilters } from '../api/report-filters';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { journalHref, reportPaths } from '../report-paths';

/** /crews/:crewId/reports/events: choose the event whose recap (or paid-off finds, ?next=finds) to open. */
export function Component() {
  const { crew, lakes, events } = useReportsContext();
  const { filters } = useReportFilters();
  const [params] = useSearchParams();
  const toFinds = params.get('next') === 'finds';
  useDocumentTitle(`Choose an event · ${crew.name}`);
  const lakeName = new Map(lakes.map((l) => [l.id, l.name]));
  const shown = events
    .filter((e) => !filters.lakeId || e.lakeId === filters.lakeId)
    .filter((e) => !filters.year || e.competitionDates.some((d) => d.startsWith(String(filters.year))))
    .sort((a, b) => (b.competitionDates[0] ?? '').localeCompare(a.competitionDates[0] ?? ''));
  const query = filterQuery({ ...filters, eventId: undefined });

  return (
    <section aria-labelledby="event-picker-heading">
      <Heading as="h3" id="event-picker-heading" variant="medium">
        {toFinds ? 'Paid-off finds: choose an event' : 'Event recap: choose an event'}
      </Heading>
      <ReportFilters show={['lakeId', 'year']} />
      {shown.length === 0 ? (
        <ReportEmpty title="No events for these filters" to={journalHref.events(crew.id)} action="Go to the events">
          Enter an event with its competition days, then log the catches and weigh-ins of each day to see its recap.
        </ReportEmpty>
      ) : (
        <ul className={styles.reportLinks} aria-label="Events">
          {shown.map((event) => (
            <li key={event.id} className={styles.card}>
              <Link
                as={RouterLink}
                to={
                  toFinds
                    ? reportPaths.eventFinds.href(crew.id, event.id, query)
                    : reportPaths.recap.href(crew.id, event.id, query)
                }
                className={styles.cardTitle}
              >
                {event.name}
              </Link>
              <Text as="p" size="small" className={styles.muted}>
                {lakeName.get(event.lakeId) ?? 'Unknown lake'} ·{' '}
                {event.competitionDates.length
                  ? event.competitionDates.map(dayLabel).join(', ')
                  : 'no competition days'}
                {event.finalPlace ? ` · finished ${ordinal(event.finalPlace)}` : ''}
              </Text>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** 1 → "1st", 12 → "12th", 22 → "22nd". */
export function ordinal(n: number): string {
  const teen = n % 100 >= 11 && n % 100 <= 13;
  const suffix = teen ? 'th' : n % 10 === 1 ? 'st' : n % 10 === 2 ? 'nd' : n % 10 === 3 ? 'rd' : 'th';
  return `${n}${suffix}`;
}
