import { Button } from '@primer/react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { EventForm } from '../../../../../features/events';
import { useLakes } from '../../../../../features/lakes';
import { UnitsNote } from '../../../../../features/journal-units';
import { JournalHeader, useJournalPage } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/events/new?lakeId= */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const [search] = useSearchParams();
  const lakes = useLakes(crewId);
  const navigate = useNavigate();
  return (
    <div className={styles.narrow}>
      <JournalHeader title="New event" lead={<UnitsNote prefs={prefs} />} />
      {!canWrite ? <p className={styles.readOnly}>Viewers read the journal; an angler or owner adds events.</p> : null}
      {canWrite && lakes.isPending ? <LoadingState label="Loading lakes…" /> : null}
      {canWrite && lakes.isError ? <ErrorState error={lakes.error} onRetry={() => lakes.refetch()} /> : null}
      {canWrite && lakes.data?.length === 0 ? (
        <EmptyState
          title="Add a lake first"
          action={
            <Button as={Link} to={journalPaths.newLake.href(crewId)} variant="primary">
              New lake
            </Button>
          }
        >
          Every event takes place on a lake; its time zone sets the clock of the event&rsquo;s days.
        </EmptyState>
      ) : null}
      {canWrite && lakes.data?.length ? (
        <EventForm
          crewId={crewId}
          lakes={lakes.data}
          lakeId={search.get('lakeId') ?? undefined}
          prefs={prefs}
          onSaved={(event) => navigate(journalPaths.event.href(crewId, event.id))}
          onCancel={() => navigate(-1)}
        />
      ) : null}
    </div>
  );
}
