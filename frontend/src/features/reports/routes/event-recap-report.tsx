import { Button, Heading, Link, Text } from '@primer/react';
import { useEffect } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { isApiError } from '../../../lib/api-client';
import { useMe } from '../../../lib/auth';
import { canWriteJournal } from '../../../lib/authorization';
import { useUnitPreferences } from '../../../lib/journal-access';
import { dayLabel } from '../../../lib/lake-time';
import { formatLength, formatWeight } from '../../../lib/units';
import { filterQuery, useReportFilters } from '../api/report-filters';
import { useEventRecap } from '../api/reports-api';
import { BagByDay, ordinalPlace } from '../components/bag-by-day';
import { ProducingFindsTable } from '../components/producing-finds-table';
import { ReadingsList } from '../components/readings-list';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { DerivedBadge, DerivedNote } from '../components/derived-note';
import { hoursMinutes, percent, percentRange, perHour } from '../components/report-labels';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { SendRecapButton } from '../components/send-recap-dialog';
import { WeightTimeline } from '../components/weight-timeline';
import '../components/print.css';
import { journalHref, reportPaths } from '../report-paths';

/** While a recap is on screen, the print stylesheet hides the app's navigation and filters. */
function usePrintLayout() {
  useEffect(() => {
    document.body.classList.add('sb-printing-recap');
    return () => document.body.classList.remove('sb-printing-recap');
  }, []);
}

/** /crews/:crewId/reports/events/:eventId: the event recap, print-friendly, and sendable by e-mail. */
export function Component() {
  const { crew, lakes, events } = useReportsContext();
  const { eventId = '' } = useParams();
  const { filters } = useReportFilters();
  const units = useUnitPreferences();
  const me = useMe();
  const recap = useEventRecap(crew.id, eventId);
  usePrintLayout();
  useDocumentTitle(recap.data ? `Recap: ${recap.data.event.name}` : 'Event recap');

  const eventView = events.find((e) => e.id === eventId);
  const lake = lakes.find((l) => l.id === eventView?.lakeId);
  const lakeFromRecap = recap.data?.event.lake ?? null;
  const timeZone = lakeFromRecap?.timeZone ?? lake?.timeZone ?? 'UTC';
  const lakeName = lakeFromRecap?.name ?? lake?.name ?? '';
  const query = filterQuery({ ...filters, eventId: undefined });

  const filtersBar = (
    <ReportFilters
      show={['lakeId', 'eventId']}
      eventRoute={{
        eventId,
        href: (id, q) => reportPaths.recap.href(crew.id, id, q),
        emptyHref: (q) => reportPaths.events.href(crew.id, q),
      }}
    />
  );

  if (recap.isPending)
    return (
      <>
        {filtersBar}
        <LoadingState label="Putting the recap together…" />
      </>
    );
  if (recap.isError) {
    return (
      <>
        {filtersBar}
        {isApiError(recap.error, 404) ? (
          <ReportEmpty
            title="This event is not in the crew’s journal"
            to={reportPaths.events.href(crew.id)}
            action="Choose an event"
          >
            It may have been deleted, or the link belongs to another crew.
          </ReportEmpty>
        ) : (
          <ErrorState error={recap.error} title="The recap could not be loaded" onRetry={() => void recap.refetch()} />
        )}
      </>
    );
  }

  const data = recap.data;
  const noFish = data.days.every((d) => d.fish.length === 0);
  const paid = data.shareOfPracticePaidOff;

  return (
    <>
      {filtersBar}
      <article className={`${styles.stack} sb-print-area`} aria-labelledby="recap-heading">
        <div className={styles.titleRow}>
          <div>
            <Heading as="h3" id="recap-heading" variant="large">
              {data.event.name}
            </Heading>
            <Text as="p" className={styles.muted}>
              {lakeName} · {data.event.dates.competition.map(dayLabel).join(', ')}
            </Text>
          </div>
          <div className={`${styles.toolbar} sb-no-print`}>
            <Button onClick={() => window.print()}>Print</Button>
            {canWriteJournal(crew.role) ? (
              <SendRecapButton
                crewId={crew.id}
                eventId={eventId}
                eventName={data.event.name}
                myUserId={me.data?.user.id}
              />
            ) : null}
            <Link as={RouterLink} to={reportPaths.eventFinds.href(crew.id, eventId, query)}>
              Every find of this event
            </Link>
          </div>
        </div>

        {noFish ? (
          <ReportEmpty
            title="No fish logged for this event yet"
            to={journalHref.event(crew.id, eventId)}
            action="Open the event"
          >
            Log each competition day’s catches (by hand or from a CSV file) and the official weigh-in figures; the recap
            then shows the bag by day, the standings and the big fish.
          </ReportEmpty>
        ) : null}

        <div className={styles.cards}>
          <div className={styles.card}>
            <span className={styles.muted}>Event total</span>
            <span className={styles.figure}>
              {formatWeight(data.totals.officialLb ?? data.totals.netLb, units.weight)}
            </span>
            <span className={styles.muted}>
              {data.days.some((d) => d.official?.officialLb !== null && d.official?.officialLb !== undefined)
                ? `official where recorded; our count ${formatWeight(data.totals.netLb, units.weight)}`
                : 'our count (no official figures)'}
            </span>
          </div>
          <div className={styles.card}>
            <span className={styles.muted}>Final place</span>
            <span className={styles.figure}>{ordinalPlace(data.totals.finalPlace ?? data.event.finalPlace)}</span>
          </div>
          <div className={styles.card}>
            <span className={styles.muted}>Big fish</span>
            {data.bigFish ? (
              <>
                <span className={styles.figure}>{formatWeight(data.bigFish.weightLb, units.weight)}</span>
                <span className={styles.muted}>
                  {[
                    data.bigFish.lengthIn ? formatLength(data.bigFish.lengthIn, units.length) : null,
                    data.bigFish.species,
                    data.bigFish.findName ? `on ${data.bigFish.findName}` : null,
                    data.bigFish.caughtAt ? dayLabel(data.bigFish.caughtAt.slice(0, 10)) : null,
                  ]
                    .filter(Boolean)
                    .join(' · ')}
                </span>
              </>
            ) : (
              <span className={styles.figure}>—</span>
            )}
          </div>
          <div className={styles.card}>
            <span className={styles.muted}>Fish</span>
            <span className={styles.figure}>
              {data.fishCaught} caught, {data.fishCounted} counted
            </span>
            <span className={styles.muted}>
              {data.derivedFromCatches ? (
                <>
                  {data.findsFished} finds fished <DerivedBadge />
                </>
              ) : data.fishPerHour !== null ? (
                `${perHour(data.fishPerHour)} on finds over ${hoursMinutes(data.secondsFished)} fished at ${data.findsFished} finds`
              ) : (
                `${data.findsFished} finds fished; no stop has a leaving time yet`
              )}
            </span>
          </div>
          <div className={styles.card}>
            <span className={styles.muted}>Practice that paid off</span>
            <span className={styles.figure}>{percent(paid.rate)}</span>
            <span className={styles.muted}>
              {paid.successes} of {paid.trials} finds practised gave fish (likely {percentRange(paid.lower, paid.upper)}
              ); {data.findsFished} of {data.findsPracticed} were fished
            </span>
          </div>
        </div>

        <DerivedNote events={data.derivedFromCatches ? 1 : 0} />

        <ReadingsList readings={data.readings ?? []} title="The event in plain words" />

        <section aria-labelledby="recap-days-heading">
          <Heading as="h4" id="recap-days-heading" variant="medium">
            Bag by day
          </Heading>
          <BagByDay days={data.days} units={units} timeZone={timeZone} />
        </section>

        {data.timeline.length > 0 ? (
          <section aria-labelledby="recap-timeline-heading" className={styles.panel}>
            <Heading as="h4" id="recap-timeline-heading" variant="medium">
              How the bag grew
            </Heading>
            <WeightTimeline timeline={data.timeline} timeZone={timeZone} unit={units.weight} />
          </section>
        ) : null}

        <section aria-labelledby="recap-finds-heading">
          <Heading as="h4" id="recap-finds-heading" variant="medium">
            Finds that produced
          </Heading>
          {data.producingFinds.length ? (
            <ProducingFindsTable finds={data.producingFinds} crewId={crew.id} units={units} />
          ) : (
            <Text as="p" className={styles.muted}>
              No catch of this event is tied to a find yet. Choose the find when logging a catch, or give its position
              and Shoalbook ties it to the nearest find.
            </Text>
          )}
        </section>
      </article>
    </>
  );
}
