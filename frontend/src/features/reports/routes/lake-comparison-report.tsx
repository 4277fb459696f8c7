import { Heading, Text } from '@primer/react';
import { useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { useUnitPreferences } from '../../../lib/journal-access';
import { useReportFilters } from '../api/report-filters';
import { HIT_RATE_GROUPINGS } from '../api/report-types';
import { useLakeComparison } from '../api/reports-api';
import { ComparisonsList } from '../components/comparisons-list';
import { GroupingSwitch, readGrouping } from '../components/grouping-switch';
import { LakeComparisonChart } from '../components/lake-comparison-chart';
import { DerivedNote } from '../components/derived-note';
import { EventResultsTable } from '../components/event-results-table';
import { LakeComparisonTable } from '../components/lake-comparison-table';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { GROUPING_LABELS } from '../components/report-labels';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { journalHref } from '../report-paths';

/** Groupings that the lake comparison offers (find-based ones: a find belongs to one event). */
const COMPARISON_GROUPINGS = HIT_RATE_GROUPINGS.filter((g) => g !== 'solunarPeriod' && g !== 'timeOfDay');

/** /crews/:crewId/reports/lake-comparison: how one lake's pattern changed from event to event. */
export function Component() {
  const { crew, lakes, events } = useReportsContext();
  const { filters, setFilters } = useReportFilters();
  const [params, setParams] = useSearchParams();
  const by = readGrouping(params, COMPARISON_GROUPINGS);
  const report = useLakeComparison(crew.id, by, { ...filters, eventId: undefined });
  const units = useUnitPreferences();
  useDocumentTitle(`Same lake, across events · ${crew.name}`);

  // With no lake chosen, open the lake with the most events: that is where a comparison says most.
  const busiestLake = [...lakes].sort(
    (a, b) => events.filter((e) => e.lakeId === b.id).length - events.filter((e) => e.lakeId === a.id).length,
  )[0];
  useEffect(() => {
    if (!filters.lakeId && busiestLake) setFilters({ lakeId: busiestLake.id });
  }, [filters.lakeId, busiestLake, setFilters]);

  const setBy = (next: string) =>
    setParams(
      (current) => {
        const copy = new URLSearchParams(current);
        copy.set('by', next);
        return copy;
      },
      { replace: true },
    );

  let body;
  if (lakes.length === 0) {
    body = (
      <ReportEmpty title="No lakes yet" to={journalHref.lakes(crew.id)} action="Add a lake">
        Add a lake and at least two events on it, with their finds and catches, to see how its pattern changes from one
        event to the next.
      </ReportEmpty>
    );
  } else if (!filters.lakeId) {
    body = <Text as="p">Choose a lake above.</Text>;
  } else if (report.isPending) {
    body = <LoadingState label="Comparing events…" />;
  } else if (report.isError) {
    body = (
      <ErrorState
        error={report.error}
        title="The comparison could not be loaded"
        onRetry={() => void report.refetch()}
      />
    );
  } else if (report.data.events.length < 2) {
    body = (
      <ReportEmpty
        title={`${report.data.lake.name} has ${report.data.events.length === 1 ? 'one event' : 'no events'} for these filters`}
        to={journalHref.events(crew.id)}
        action="Go to the events"
      >
        A comparison needs two or more events on the same lake with finds fished. Enter another event on this lake (its
        finds and catches), or widen the season and date filters above.
      </ReportEmpty>
    );
  } else {
    const { events: compared, groups, comparisons, results } = report.data;
    body = (
      <div className={styles.stack}>
        <div className={styles.split}>
          <div className={styles.panel}>
            <Heading as="h4" variant="small" className={styles.panelTitle}>
              {GROUPING_LABELS[by]} on {report.data.lake.name}, event by event
            </Heading>
            <LakeComparisonChart
              events={compared}
              groups={groups}
              title={`Hit rate by ${GROUPING_LABELS[by].toLowerCase()} for each event on ${report.data.lake.name}`}
            />
          </div>
          <div className={styles.panel}>
            <Heading as="h4" variant="small" className={styles.panelTitle}>
              What changed
            </Heading>
            <ComparisonsList comparisons={comparisons} />
          </div>
        </div>
        <DerivedNote events={compared.filter((e) => e.derivedFromCatches).length} />
        <LakeComparisonTable events={compared} groups={groups} />
        <EventResultsTable events={compared} results={results} units={units} />
      </div>
    );
  }

  return (
    <section aria-labelledby="lake-comparison-heading">
      <Heading as="h3" id="lake-comparison-heading" variant="medium">
        Same lake, across events
      </Heading>
      <ReportFilters show={['lakeId', 'season', 'year', 'from', 'to']} />
      <div className={styles.toolbar}>
        <GroupingSwitch value={by} onChange={setBy} options={COMPARISON_GROUPINGS} />
      </div>
      {body}
    </section>
  );
}
