import { Heading, Text } from '@primer/react';
import { useSearchParams } from 'react-router-dom';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { useUnitPreferences } from '../../../lib/journal-access';
import { formatWeight } from '../../../lib/units';
import { useReportFilters } from '../api/report-filters';
import { useHitRates } from '../api/reports-api';
import { GroupingSwitch, readGrouping } from '../components/grouping-switch';
import { HitRateChart } from '../components/hit-rate-chart';
import { HitRatesTable, HitRatesTimeTable } from '../components/hit-rates-table';
import { ReadingsList } from '../components/readings-list';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { DerivedNote } from '../components/derived-note';
import {
  CATCH_BASED_GROUPINGS,
  GROUPING_LABELS,
  hoursMinutes,
  percent,
  percentRange,
  perHour,
} from '../components/report-labels';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { journalHref } from '../report-paths';

/** /crews/:crewId/reports/hit-rates: which kinds of finds produced, with honest intervals. */
export function Component() {
  const { crew } = useReportsContext();
  const units = useUnitPreferences();
  const { filters } = useReportFilters();
  const [params, setParams] = useSearchParams();
  const by = readGrouping(params);
  const report = useHitRates(crew.id, by, filters);
  useDocumentTitle(`Hit rates · ${crew.name}`);

  const setBy = (next: string) =>
    setParams(
      (current) => {
        const copy = new URLSearchParams(current);
        copy.set('by', next);
        return copy;
      },
      { replace: true },
    );

  const catchBased = CATCH_BASED_GROUPINGS.includes(by);
  return (
    <section aria-labelledby="hit-rates-heading">
      <Heading as="h3" id="hit-rates-heading" variant="medium">
        Hit rates: which finds paid off
      </Heading>
      <ReportFilters />
      <div className={styles.toolbar}>
        <GroupingSwitch value={by} onChange={setBy} />
      </div>
      {report.isPending ? (
        <LoadingState label="Counting finds…" />
      ) : report.isError ? (
        <ErrorState
          error={report.error}
          title="The hit rates could not be loaded"
          onRetry={() => void report.refetch()}
        />
      ) : report.data.groups.length === 0 ||
        (catchBased ? report.data.overall.fishCount === 0 : report.data.overall.findsFished === 0) ? (
        <ReportEmpty
          title="No finds fished for these filters yet"
          to={journalHref.finds(crew.id)}
          action="Go to the finds"
        >
          Hit rates need practice finds and competition catches tied to them. Enter your finds (by hand or from a GPX
          file), log the fish you caught on competition days against the find they came from, then come back. Or widen
          the filters above.
        </ReportEmpty>
      ) : (
        <div className={styles.stack}>
          <Text as="p" className={styles.muted}>
            {catchBased
              ? `${report.data.overall.fishCount} fish caught, ${report.data.overall.countedCount} counted, ${formatWeight(report.data.overall.weightLb, units.weight)} in all${report.data.overall.fishPerHour !== null ? `; ${perHour(report.data.overall.fishPerHour)} over ${hoursMinutes(report.data.overall.secondsFished)} on the water` : ''}. Sun-and-moon periods and times of day are counted by fish, not by find: one find’s fish fall in several periods.`
              : `Overall, ${report.data.overall.findsProducing} of ${report.data.overall.findsFished} finds fished produced a fish (${percent(report.data.overall.producing.rate)}, likely ${percentRange(report.data.overall.producing.lower, report.data.overall.producing.upper)}); ${report.data.overall.fishCount} fish caught, ${report.data.overall.countedCount} counted${report.data.overall.fishPerHour !== null ? `, ${perHour(report.data.overall.fishPerHour)} over ${hoursMinutes(report.data.overall.secondsFished)} fished` : ''}.`}
          </Text>
          <DerivedNote events={report.data.derivedEvents} />
          <div className={styles.splitEven}>
            <div className={styles.panel}>
              <Heading as="h4" variant="small" className={styles.panelTitle}>
                By {GROUPING_LABELS[by].toLowerCase()}
              </Heading>
              <HitRateChart
                groups={report.data.groups}
                unit={catchBased ? 'catch' : 'find'}
                title={`Hit rate by ${GROUPING_LABELS[by].toLowerCase()}, with likely ranges`}
              />
              <ReadingsList readings={report.data.readings} />
            </div>
            <div className={styles.panel}>
              <HitRatesTable groups={report.data.groups} catchBased={catchBased} units={units} />
              <HitRatesTimeTable groups={report.data.groups} catchBased={catchBased} />
            </div>
          </div>
        </div>
      )}
    </section>
  );
}
