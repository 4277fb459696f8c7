import { useNavigate } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { journalPaths } from '../../../../../config/journal-paths';
import { LakeForm, useLake } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage, useParam } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/lakes/:lakeId/edit */
export function Component() {
  const { crewId, canWrite } = useJournalPage();
  const lakeId = useParam('lakeId');
  const lake = useLake(crewId, lakeId);
  const navigate = useNavigate();
  if (lake.isPending) return <LoadingState label="Loading the lake…" />;
  if (lake.isError) return <ErrorState error={lake.error} onRetry={() => lake.refetch()} />;
  const back = () => navigate(journalPaths.lake.href(crewId, lakeId));
  return (
    <div className={styles.narrow}>
      <JournalHeader title={`Edit ${lake.data.name}`} />
      {canWrite ? (
        <LakeForm crewId={crewId} lake={lake.data} onSaved={back} onCancel={back} />
      ) : (
        <p className={styles.readOnly}>Viewers cannot change lakes.</p>
      )}
    </div>
  );
}
