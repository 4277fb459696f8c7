import { Heading, Link, Text } from '@primer/react';
import { Link as RouterLink } from 'react-router-dom';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { filterQuery, useReportFilters } from '../api/report-filters';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { journalHref, reportPaths } from '../report-paths';

/** /crews/:crewId/reports: what each report answers, with the filters that all of them share. */
export function Component() {
  const { crew, lakes, events } = useReportsContext();
  const { filters } = useReportFilters();
  useDocumentTitle(`Reports · ${crew.name}`);
  const query = filterQuery(filters);
  const eventQuery = filterQuery({ ...filters, eventId: undefined });
  const chosenEvent = filters.eventId ? events.find((e) => e.id === filters.eventId) : undefined;

  const reports = [
    {
      title: 'Hit rates',
      text: 'Which kinds of finds produced fish: by kind, depth, hardness, water temperature, sun and moon.',
      href: reportPaths.hitRates.href(crew.id, query),
    },
    {
      title: 'Same lake, across events',
      text: 'How a lake’s pattern changed from one event to the next, and whether the change is more than chance.',
      href: reportPaths.lakeComparison.href(crew.id, query),
    },
    {
      title: 'Event recap',
      text: chosenEvent
        ? `Bag by day, standings, big fish and the finds that produced at ${chosenEvent.name}.`
        : 'Bag by day, standings, big fish and the finds that produced, ready to print or send.',
      href: chosenEvent
        ? reportPaths.recap.href(crew.id, chosenEvent.id, eventQuery)
        : reportPaths.events.href(crew.id, query),
    },
    {
      title: 'Paid-off finds',
      text: 'Every find of an event with what it gave: weighed fish, fish, a blank, or never fished.',
      href: chosenEvent
        ? reportPaths.eventFinds.href(crew.id, chosenEvent.id, eventQuery)
        : reportPaths.events.href(crew.id, `${query}${query ? '&' : '?'}next=finds`),
    },
    {
      title: 'Timing',
      text: 'When the fish bit: catches against the time of day, sunrise and the solunar periods.',
      href: reportPaths.timing.href(crew.id, query),
    },
    {
      title: 'Find map',
      text: 'Finds plotted around the lake’s reference point, marked by kind and by what they gave.',
      href: reportPaths.map.href(crew.id, query),
    },
  ];

  return (
    <section aria-labelledby="reports-home-heading">
      <Heading as="h3" id="reports-home-heading" variant="medium" className={styles.srOnly}>
        All reports
      </Heading>
      <ReportFilters />
      {lakes.length === 0 || events.length === 0 ? (
        <ReportEmpty
          title="Reports fill in as the journal does"
          to={lakes.length === 0 ? journalHref.lakes(crew.id) : journalHref.events(crew.id)}
          action={lakes.length === 0 ? 'Add a lake' : 'Add an event'}
        >
          Enter a lake, an event on it with its practice and competition days, the finds you marked in practice and the
          fish you caught on them. Each report below then shows what paid off.
        </ReportEmpty>
      ) : null}
      <ul className={styles.reportLinks} aria-label="Reports">
        {reports.map((report) => (
          <li key={report.title} className={styles.card}>
            <Link as={RouterLink} to={report.href} className={styles.cardTitle}>
              {report.title}
            </Link>
            <Text as="p" size="small" className={styles.muted}>
              {report.text}
            </Text>
          </li>
        ))}
      </ul>
    </section>
  );
}
