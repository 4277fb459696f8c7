import { PlusIcon, UploadIcon } from '@primer/octicons-react';
import { Button, FormControl, Select } from '@primer/react';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { useEvents } from '../../../../../features/events';
import { FindsBulkBar, FindsTable, useFinds } from '../../../../../features/finds';
import { UnitsNote } from '../../../../../features/journal-units';
import { useLakes } from '../../../../../features/lakes';
import { WaitingEntries } from '../../../../../components/send-queue/waiting-entries';
import { useSignedInMe } from '../../../../../lib/auth';
import type { SendKind } from '../../../../../lib/device-db';
import { JournalHeader, useJournalPage } from './journal-page';
import styles from './journal.module.css';

const FIND_WRITES: SendKind[] = ['find'];

/** /crews/:crewId/finds?lakeId=: the practice finds of one lake, in a table made for thousands of rows. */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const me = useSignedInMe();
  const [search, setSearch] = useSearchParams();
  const lakes = useLakes(crewId);
  const lakeId = search.get('lakeId') ?? lakes.data?.[0]?.id ?? '';
  const lake = lakes.data?.find((l) => l.id === lakeId);
  const finds = useFinds(crewId, { lakeId: lakeId || undefined });
  const events = useEvents(crewId, lakeId || undefined);
  // Chosen finds, by id; only those still listed count (a find deleted elsewhere drops out).
  const [selected, setSelected] = useState<Record<string, boolean>>({});
  const chosen = (finds.data ?? []).filter((f) => selected[f.id]).map((f) => f.id);

  const actions =
    canWrite && lake ? (
      <>
        <Button as={Link} to={journalPaths.import.href(crewId, { kind: 'gpx', lakeId })} leadingVisual={UploadIcon}>
          Import GPX
        </Button>
        <Button as={Link} to={journalPaths.newFind.href(crewId, { lakeId })} variant="primary" leadingVisual={PlusIcon}>
          New find
        </Button>
      </>
    ) : undefined;

  return (
    <div className={styles.stack}>
      <JournalHeader title="Finds" lead={<UnitsNote prefs={prefs} />} actions={actions} />
      {lakes.isPending ? <LoadingState label="Loading lakes…" /> : null}
      {lakes.isError ? <ErrorState error={lakes.error} onRetry={() => lakes.refetch()} /> : null}
      {lakes.data?.length === 0 ? (
        <EmptyState title="Add a lake first">
          Finds are marked on a lake; add one under Lakes, then record or import your waypoints.
        </EmptyState>
      ) : null}
      {lakes.data && lakes.data.length > 1 ? (
        <div className={styles.dayPicker}>
          <FormControl>
            <FormControl.Label>Lake</FormControl.Label>
            <Select
              value={lakeId}
              onChange={(e) => {
                setSelected({});
                setSearch({ lakeId: e.target.value });
              }}
            >
              {lakes.data.map((l) => (
                <Select.Option key={l.id} value={l.id}>
                  {l.name}
                </Select.Option>
              ))}
            </Select>
          </FormControl>
        </div>
      ) : null}
      {lake ? <WaitingEntries userId={me.user.id} crewId={crewId} scope={lake.id} kinds={FIND_WRITES} /> : null}
      {lake && finds.isPending ? <LoadingState label="Loading finds…" /> : null}
      {lake && finds.isError ? <ErrorState error={finds.error} onRetry={() => finds.refetch()} /> : null}
      {lake && finds.data?.length === 0 ? (
        <EmptyState title={`No finds on ${lake.name} yet`}>
          {canWrite
            ? 'Record a place you marked in practice (position, depth, bottom, what the sonar showed), or import a GPX waypoint file.'
            : 'Finds appear here once an angler records them.'}
        </EmptyState>
      ) : null}
      {lake && finds.data?.length && canWrite ? (
        <FindsBulkBar crewId={crewId} findIds={chosen} events={events.data ?? []} onDone={() => setSelected({})} />
      ) : null}
      {lake && finds.data?.length ? (
        <FindsTable
          crewId={crewId}
          finds={finds.data}
          prefs={prefs}
          timeZoneOf={() => lake.timeZone}
          selection={canWrite ? { selected, onChange: setSelected } : undefined}
        />
      ) : null}
    </div>
  );
}
