import { Heading, Text } from '@primer/react';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { useUnitPreferences } from '../../../lib/journal-access';
import { useReportFilters } from '../api/report-filters';
import { useTiming } from '../api/reports-api';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { CatchTimingScatter, WeightByHourChart } from '../components/timing-charts';
import { journalHref } from '../report-paths';

const countOf = (n: number) => n.toLocaleString('en-US');

/** /crews/:crewId/reports/timing: when the fish bit, against sunrise and the solunar periods. */
export function Component() {
  const { crew } = useReportsContext();
  const { filters } = useReportFilters();
  const units = useUnitPreferences();
  const report = useTiming(crew.id, filters);
  useDocumentTitle(`Timing · ${crew.name}`);

  let body;
  if (report.isPending) body = <LoadingState label="Sorting catches by the clock…" />;
  else if (report.isError)
    body = (
      <ErrorState
        error={report.error}
        title="The timing report could not be loaded"
        onRetry={() => void report.refetch()}
      />
    );
  else if (report.data.catches.length === 0)
    body = (
      <ReportEmpty title="No catches for these filters" to={journalHref.catches(crew.id)} action="Go to the catches">
        Log competition catches with the time each fish was caught (the lake’s own clock); this report then shows them
        against sunrise and the sun-and-moon periods. Or widen the filters above.
      </ReportEmpty>
    );
  else {
    const { catches, totalCatches } = report.data;
    const thinned = totalCatches > catches.length;
    const inPeriods = catches.filter((c) => c.solunarPeriod !== null).length;
    body = (
      <div className={styles.stack}>
        <Text as="p" className={styles.muted}>
          {countOf(totalCatches)} fish; {countOf(inPeriods)} of{' '}
          {thinned ? `the ${countOf(catches.length)} shown` : 'them'} ({Math.round((inPeriods / catches.length) * 100)}{' '}
          %) came during a solunar period.
        </Text>
        <div className={styles.panel}>
          <Heading as="h4" variant="small" className={styles.panelTitle}>
            Each fish by the clock
          </Heading>
          {thinned ? (
            <Text as="p" className={styles.muted}>
              Showing {countOf(catches.length)} of {countOf(totalCatches)} fish, evenly thinned over time (the first and
              the last kept); the weight by hour counts every fish.
            </Text>
          ) : null}
          <CatchTimingScatter catches={catches} unit={units.weight} />
        </div>
        <div className={styles.panel}>
          <Heading as="h4" variant="small" className={styles.panelTitle}>
            Weight by hour
          </Heading>
          <WeightByHourChart byHour={report.data.byHour} unit={units.weight} />
        </div>
      </div>
    );
  }

  return (
    <section aria-labelledby="timing-heading">
      <Heading as="h3" id="timing-heading" variant="medium">
        Timing: when the fish bit
      </Heading>
      <ReportFilters />
      {body}
    </section>
  );
}
