import { PlusIcon } from '@primer/octicons-react';
import { Button } from '@primer/react';
import { Link } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { EventsTable } from '../../../../../features/events';
import { useLakes } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage } from './journal-page';

/** /crews/:crewId/events: every event of the crew, on every lake. */
export function Component() {
  const { crewId, canWrite } = useJournalPage();
  const lakes = useLakes(crewId);
  return (
    <>
      <JournalHeader
        title="Events"
        lead="Tournaments with their practice and competition days, rules and results."
        actions={
          canWrite && lakes.data?.length ? (
            <Button as={Link} to={journalPaths.newEvent.href(crewId)} variant="primary" leadingVisual={PlusIcon}>
              New event
            </Button>
          ) : undefined
        }
      />
      {lakes.isPending ? <LoadingState label="Loading lakes…" /> : null}
      {lakes.isError ? <ErrorState error={lakes.error} onRetry={() => lakes.refetch()} /> : null}
      {lakes.data ? <EventsTable crewId={crewId} lakes={lakes.data} canWrite={canWrite} /> : null}
    </>
  );
}
