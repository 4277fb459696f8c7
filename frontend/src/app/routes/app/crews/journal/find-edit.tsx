import { useNavigate } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { useEvents } from '../../../../../features/events';
import { FindForm, useFind } from '../../../../../features/finds';
import { UnitsNote } from '../../../../../features/journal-units';
import { useLakes } from '../../../../../features/lakes';
import { useSignedInMe } from '../../../../../lib/auth';
import { JournalHeader, useJournalPage, useParam } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/finds/:findId/edit */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const me = useSignedInMe();
  const findId = useParam('findId');
  const find = useFind(crewId, findId);
  const lakes = useLakes(crewId);
  const events = useEvents(crewId);
  const navigate = useNavigate();
  if (!canWrite) return <p className={styles.readOnly}>Viewers cannot change finds.</p>;
  if (find.isPending || lakes.isPending || events.isPending) return <LoadingState label="Loading the find…" />;
  const failed = [find, lakes, events].find((q) => q.isError);
  if (failed) return <ErrorState error={failed.error} onRetry={() => failed.refetch()} />;
  const back = () => navigate(journalPaths.find.href(crewId, findId));
  return (
    <div className={styles.narrow}>
      <JournalHeader title={`Edit ${find.data!.name}`} lead={<UnitsNote prefs={prefs} />} />
      <FindForm
        userId={me.user.id}
        crewId={crewId}
        lakes={lakes.data!}
        events={events.data!}
        find={find.data!}
        prefs={prefs}
        onSaved={back}
        onCancel={back}
      />
    </div>
  );
}
