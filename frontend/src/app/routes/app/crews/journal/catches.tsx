import { Button, FormControl, Select } from '@primer/react';
import { Link, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { CatchesTable, useCatches } from '../../../../../features/catches';
import { useEvents } from '../../../../../features/events';
import { useFinds } from '../../../../../features/finds';
import { UnitsNote } from '../../../../../features/journal-units';
import { useLakes } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/catches?eventId=: every catch of an event; logging happens on the event's competition days. */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const [search, setSearch] = useSearchParams();
  const events = useEvents(crewId);
  const lakes = useLakes(crewId);
  const sorted = [...(events.data ?? [])].sort((a, b) =>
    (b.competitionDates[0] ?? '').localeCompare(a.competitionDates[0] ?? ''),
  );
  const eventId = search.get('eventId') ?? sorted[0]?.id ?? '';
  const event = sorted.find((e) => e.id === eventId);
  const lake = lakes.data?.find((l) => l.id === event?.lakeId);
  const catches = useCatches(crewId, { eventId: eventId || undefined });
  const finds = useFinds(crewId, { lakeId: lake?.id });

  return (
    <div className={styles.stack}>
      <JournalHeader
        title="Catches"
        lead={<UnitsNote prefs={prefs} />}
        actions={
          canWrite && event ? (
            <>
              <Button as={Link} to={journalPaths.import.href(crewId, { kind: 'csv', eventId: event.id })}>
                Import CSV
              </Button>
              <Button as={Link} to={journalPaths.event.href(crewId, event.id, 'days')} variant="primary">
                Log catches
              </Button>
            </>
          ) : undefined
        }
      />
      {events.isPending || lakes.isPending ? <LoadingState label="Loading events…" /> : null}
      {events.isError ? <ErrorState error={events.error} onRetry={() => events.refetch()} /> : null}
      {events.data?.length === 0 ? (
        <EmptyState title="No events yet">
          Catches belong to an event&rsquo;s competition day: add an event under Events first.
        </EmptyState>
      ) : null}
      {sorted.length ? (
        <div className={styles.dayPicker}>
          <FormControl>
            <FormControl.Label>Event</FormControl.Label>
            <Select value={eventId} onChange={(e) => setSearch({ eventId: e.target.value })}>
              {sorted.map((e) => (
                <Select.Option key={e.id} value={e.id}>
                  {e.name}
                </Select.Option>
              ))}
            </Select>
          </FormControl>
        </div>
      ) : null}
      {event && catches.isPending ? <LoadingState label="Loading catches…" /> : null}
      {event && catches.isError ? <ErrorState error={catches.error} onRetry={() => catches.refetch()} /> : null}
      {event && lake && catches.data ? (
        <CatchesTable
          crewId={crewId}
          catches={catches.data}
          finds={finds.data ?? []}
          prefs={prefs}
          timeZone={lake.timeZone}
          canWrite={canWrite}
          caption={`Catches of ${event.name}`}
        />
      ) : null}
    </div>
  );
}
