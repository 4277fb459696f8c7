import { UnderlineNav } from '@primer/react';
import { Link, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { useEvents } from '../../../../../features/events';
import { CatchesCsvImport, ExportButtons, GpxImport } from '../../../../../features/imports';
import { useLakes } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/import?kind=gpx|csv|export: bring finds and catches in from files, or take the journal out. */
export function Component() {
  const { crewId, canWrite, canExport, prefs } = useJournalPage();
  const [search] = useSearchParams();
  const kind = (['gpx', 'csv', 'export'] as const).find((k) => k === search.get('kind')) ?? 'gpx';
  const lakes = useLakes(crewId);
  const events = useEvents(crewId);
  const tab = (k: 'gpx' | 'csv' | 'export', label: string) => (
    <UnderlineNav.Item
      as={Link}
      to={`${journalPaths.import.href(crewId)}?kind=${k}`}
      aria-current={kind === k ? 'page' : undefined}
    >
      {label}
    </UnderlineNav.Item>
  );
  if (!canWrite) {
    return (
      <>
        <JournalHeader title="Files" />
        <p className={styles.readOnly}>
          Imports and exports carry positions, so they are open to the crew&rsquo;s anglers and owners only.
        </p>
      </>
    );
  }
  return (
    <>
      <JournalHeader
        title="Files"
        lead="Import waypoints and catches from files, or export the journal and a lake's finds."
      />
      <UnderlineNav aria-label="File tasks" className={styles.sectionNav}>
        {tab('gpx', 'Finds from GPX')}
        {tab('csv', 'Catches from CSV')}
        {tab('export', 'Export')}
      </UnderlineNav>
      {lakes.isPending || events.isPending ? <LoadingState label="Loading lakes and events…" /> : null}
      {lakes.isError ? <ErrorState error={lakes.error} onRetry={() => lakes.refetch()} /> : null}
      {events.isError ? <ErrorState error={events.error} onRetry={() => events.refetch()} /> : null}
      {lakes.data && events.data ? (
        <>
          {kind === 'gpx' && lakes.data.length === 0 ? (
            <EmptyState title="Add a lake first">Imported finds are placed on a lake.</EmptyState>
          ) : null}
          {kind === 'gpx' && lakes.data.length ? (
            <GpxImport
              crewId={crewId}
              lakes={lakes.data}
              events={events.data}
              prefs={prefs}
              defaults={{ lakeId: search.get('lakeId') ?? undefined, eventId: search.get('eventId') ?? undefined }}
            />
          ) : null}
          {kind === 'csv' ? (
            <CatchesCsvImport
              crewId={crewId}
              events={events.data}
              lakes={lakes.data}
              prefs={prefs}
              defaultEventId={search.get('eventId') ?? undefined}
            />
          ) : null}
          {kind === 'export' && canExport ? <ExportButtons crewId={crewId} /> : null}
        </>
      ) : null}
    </>
  );
}
