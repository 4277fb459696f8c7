import { useNavigate } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { EventForm, useEvent } from '../../../../../features/events';
import { useLakes } from '../../../../../features/lakes';
import { UnitsNote } from '../../../../../features/journal-units';
import { JournalHeader, useJournalPage, useParam } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/events/:eventId/edit */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const eventId = useParam('eventId');
  const event = useEvent(crewId, eventId);
  const lakes = useLakes(crewId);
  const navigate = useNavigate();
  if (event.isPending || lakes.isPending) return <LoadingState label="Loading the event…" />;
  if (event.isError) return <ErrorState error={event.error} onRetry={() => event.refetch()} />;
  if (lakes.isError) return <ErrorState error={lakes.error} onRetry={() => lakes.refetch()} />;
  const back = () => navigate(journalPaths.event.href(crewId, eventId));
  return (
    <div className={styles.narrow}>
      <JournalHeader title={`Edit ${event.data.name}`} lead={<UnitsNote prefs={prefs} />} />
      {canWrite ? (
        <EventForm crewId={crewId} lakes={lakes.data} event={event.data} prefs={prefs} onSaved={back} onCancel={back} />
      ) : (
        <p className={styles.readOnly}>Viewers cannot change events.</p>
      )}
    </div>
  );
}
