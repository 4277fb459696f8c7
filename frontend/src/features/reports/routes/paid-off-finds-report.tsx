import { Heading, Link, Text } from '@primer/react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { isApiError } from '../../../lib/api-client';
import { useUnitPreferences } from '../../../lib/journal-access';
import { filterQuery, useReportFilters } from '../api/report-filters';
import { useEventFinds } from '../api/reports-api';
import { DerivedNote } from '../components/derived-note';
import { PaidOffFindsTable } from '../components/paid-off-finds-table';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { percent, percentRange } from '../components/report-labels';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { journalHref, reportPaths } from '../report-paths';

/** /crews/:crewId/reports/events/:eventId/finds: every find of the event and what it gave. */
export function Component() {
  const { crew, lakes, events } = useReportsContext();
  const { eventId = '' } = useParams();
  const { filters } = useReportFilters();
  const units = useUnitPreferences();
  const report = useEventFinds(crew.id, eventId);
  const event = events.find((e) => e.id === eventId);
  const timeZone = lakes.find((l) => l.id === event?.lakeId)?.timeZone ?? 'UTC';
  useDocumentTitle(`Paid-off finds${event ? `: ${event.name}` : ''}`);
  const query = filterQuery({ ...filters, eventId: undefined });

  let body;
  if (report.isPending) body = <LoadingState label="Looking up the finds…" />;
  else if (report.isError)
    body = isApiError(report.error, 404) ? (
      <ReportEmpty
        title="This event is not in the crew’s journal"
        to={reportPaths.events.href(crew.id, '?next=finds')}
        action="Choose an event"
      >
        It may have been deleted, or the link belongs to another crew.
      </ReportEmpty>
    ) : (
      <ErrorState error={report.error} title="The finds could not be loaded" onRetry={() => void report.refetch()} />
    );
  else if (report.data.finds.length === 0)
    body = (
      <ReportEmpty title="No finds marked for this event" to={journalHref.finds(crew.id)} action="Add finds">
        Enter the places you marked in practice for this event (by hand, or import a GPX waypoint file), then log the
        competition catches against them to see which paid off.
      </ReportEmpty>
    );
  else {
    const paid = report.data.paidOff;
    body = (
      <div className={styles.stack}>
        <div>
          <Text as="p" className={`${styles.figure} ${styles.flush}`}>
            {percent(paid.rate)} of the finds fished paid off
          </Text>
          <Text as="p" className={`${styles.muted} ${styles.flush}`}>
            {paid.successes} of {paid.trials} finds fished (visited by a stop, or with a catch) gave fish on competition
            days (likely between {percentRange(paid.lower, paid.upper)}).
          </Text>
        </div>
        <DerivedNote events={report.data.derivedFromCatches ? 1 : 0} />
        <PaidOffFindsTable finds={report.data.finds} crewId={crew.id} units={units} timeZone={timeZone} />
      </div>
    );
  }

  return (
    <section aria-labelledby="paid-off-heading">
      <div className={styles.titleRow}>
        <Heading as="h3" id="paid-off-heading" variant="medium">
          Paid-off finds{event ? `: ${event.name}` : ''}
        </Heading>
        <Link as={RouterLink} to={reportPaths.recap.href(crew.id, eventId, query)}>
          Back to the recap
        </Link>
      </div>
      <ReportFilters
        show={['lakeId', 'eventId']}
        eventRoute={{
          eventId,
          href: (id, q) => reportPaths.eventFinds.href(crew.id, id, q),
          emptyHref: (q) => reportPaths.events.href(crew.id, `${q}${q ? '&' : '?'}next=finds`),
        }}
      />
      {body}
    </section>
  );
}
