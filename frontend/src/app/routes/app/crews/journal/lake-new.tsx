import { useNavigate } from 'react-router-dom';
import { journalPaths } from '../../../../../config/journal-paths';
import { LakeForm } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/lakes/new */
export function Component() {
  const { crewId, canWrite } = useJournalPage();
  const navigate = useNavigate();
  return (
    <div className={styles.narrow}>
      <JournalHeader title="New lake" />
      {canWrite ? (
        <LakeForm
          crewId={crewId}
          onSaved={(lake) => navigate(journalPaths.lake.href(crewId, lake.id))}
          onCancel={() => navigate(journalPaths.lakes.href(crewId))}
        />
      ) : (
        <p className={styles.readOnly}>Viewers read the journal; an angler or owner of the crew adds lakes.</p>
      )}
    </div>
  );
}
