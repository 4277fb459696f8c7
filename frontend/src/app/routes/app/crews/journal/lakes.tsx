import { PlusIcon } from '@primer/octicons-react';
import { Button } from '@primer/react';
import { Link } from 'react-router-dom';
import { journalPaths } from '../../../../../config/journal-paths';
import { LakesList } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage } from './journal-page';

/** /crews/:crewId/lakes */
export function Component() {
  const { crewId, canWrite } = useJournalPage();
  return (
    <>
      <JournalHeader
        title="Lakes"
        lead="The waters your crew fishes. Each lake's time zone sets the clock for its finds, catches and sun and moon times."
        actions={
          canWrite ? (
            <Button as={Link} to={journalPaths.newLake.href(crewId)} variant="primary" leadingVisual={PlusIcon}>
              New lake
            </Button>
          ) : undefined
        }
      />
      <LakesList crewId={crewId} canWrite={canWrite} />
    </>
  );
}
