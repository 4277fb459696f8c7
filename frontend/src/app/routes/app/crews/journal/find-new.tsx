import { useNavigate, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { useEvents } from '../../../../../features/events';
import { FindForm } from '../../../../../features/finds';
import { UnitsNote } from '../../../../../features/journal-units';
import { useLakes } from '../../../../../features/lakes';
import { useSignedInMe } from '../../../../../lib/auth';
import { JournalHeader, useJournalPage } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/finds/new?lakeId=&eventId= */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const me = useSignedInMe();
  const [search] = useSearchParams();
  const lakes = useLakes(crewId);
  const events = useEvents(crewId);
  const navigate = useNavigate();
  if (!canWrite) return <p className={styles.readOnly}>Viewers read the journal; an angler or owner records finds.</p>;
  if (lakes.isPending || events.isPending) return <LoadingState label="Loading lakes and events…" />;
  if (lakes.isError) return <ErrorState error={lakes.error} onRetry={() => lakes.refetch()} />;
  if (events.isError) return <ErrorState error={events.error} onRetry={() => events.refetch()} />;
  if (lakes.data.length === 0) return <EmptyState title="Add a lake first">A find is marked on a lake.</EmptyState>;
  return (
    <div className={styles.narrow}>
      <JournalHeader title="New find" lead={<UnitsNote prefs={prefs} />} />
      <FindForm
        userId={me.user.id}
        crewId={crewId}
        lakes={lakes.data}
        events={events.data}
        defaults={{ lakeId: search.get('lakeId') ?? undefined, eventId: search.get('eventId') ?? undefined }}
        prefs={prefs}
        onSaved={(find) => navigate(journalPaths.find.href(crewId, find.id))}
        onCancel={() => navigate(-1)}
      />
    </div>
  );
}
