import { Banner, Heading, Text } from '@primer/react';
import { FIND_KIND_LABELS } from '@shoalbook/shared';
import { createColumnHelper } from '@tanstack/react-table';
import { useEffect } from 'react';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { useUnitPreferences } from '../../../lib/journal-access';
import { formatWeight } from '../../../lib/units';
import { useReportFilters } from '../api/report-filters';
import type { MapFind } from '../api/report-types';
import { useFindMap } from '../api/reports-api';
import { FindMapChart } from '../components/find-map-chart';
import { OutcomeBadge } from '../components/outcome-badge';
import { ReportEmpty } from '../components/report-empty';
import { ReportFilters } from '../components/report-filters';
import { ReportTable } from '../components/report-table';
import { useReportsContext } from '../components/reports-context';
import styles from '../components/reports.module.css';
import { journalHref } from '../report-paths';

const column = createColumnHelper<MapFind>();

/** /crews/:crewId/reports/map: the lake's finds by position, kind and outcome. */
export function Component() {
  const { crew, lakes } = useReportsContext();
  const { filters, setFilters } = useReportFilters();
  const units = useUnitPreferences();
  const report = useFindMap(crew.id, filters);
  useDocumentTitle(`Find map · ${crew.name}`);

  // A map shows one lake; open the first when none is chosen.
  useEffect(() => {
    if (!filters.lakeId && lakes[0]) setFilters({ lakeId: lakes[0].id });
  }, [filters.lakeId, lakes, setFilters]);

  let body;
  if (lakes.length === 0)
    body = (
      <ReportEmpty title="No lakes yet" to={journalHref.lakes(crew.id)} action="Add a lake">
        Add a lake with its reference point, then the finds you marked on it; the map plots them around that point.
      </ReportEmpty>
    );
  else if (!filters.lakeId || report.isPending) body = <LoadingState label="Plotting the finds…" />;
  else if (report.isError)
    body = (
      <ErrorState error={report.error} title="The map could not be loaded" onRetry={() => void report.refetch()} />
    );
  else if (report.data.finds.length === 0)
    body = (
      <ReportEmpty title="No finds on this lake for these filters" to={journalHref.finds(crew.id)} action="Add finds">
        Mark your practice finds with their positions (by hand or from a GPX waypoint file) and they appear here by kind
        and by what they gave.
      </ReportEmpty>
    );
  else {
    const hidden = report.data.positionsHidden || report.data.finds.every((f) => f.xM === null || f.yM === null);
    body = hidden ? (
      <div className={styles.stack}>
        <Banner
          variant="info"
          title="Positions are hidden"
          description="This crew keeps the positions of its finds from viewers. The finds are listed without them; an owner can change this in the crew settings."
        />
        <ReportTable
          data={report.data.finds}
          caption="Finds of this lake, without positions"
          getRowId={(f) => f.findId}
          columns={[
            column.accessor('name', { header: 'Find' }),
            column.accessor((f) => FIND_KIND_LABELS[f.kind], { id: 'kind', header: 'Kind' }),
            column.accessor('outcome', {
              header: 'Outcome',
              cell: (info) => <OutcomeBadge outcome={info.getValue()} />,
            }),
            column.accessor('fishCount', { header: 'Fish', meta: { numeric: true } }),
            column.accessor('weightLb', {
              header: 'Weight',
              cell: (info) => formatWeight(info.getValue(), units.weight),
              meta: { numeric: true },
            }),
          ]}
        />
      </div>
    ) : (
      <div className={styles.panel}>
        <Text as="p" className={styles.muted}>
          {report.data.finds.length} finds and {report.data.catches.length} catches tied to them. Distances are in
          metres from the lake’s reference point; north is up.
        </Text>
        <FindMapChart report={report.data} unit={units.weight} />
      </div>
    );
  }

  return (
    <section aria-labelledby="find-map-heading">
      <Heading as="h3" id="find-map-heading" variant="medium">
        Find map
      </Heading>
      <ReportFilters show={['lakeId', 'eventId']} />
      {body}
    </section>
  );
}
