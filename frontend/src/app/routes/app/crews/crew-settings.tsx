import { Heading } from '@primer/react';
import { useNavigate } from 'react-router-dom';
import { useDocumentTitle } from '../../../../components/layouts/page-header';
import { paths } from '../../../../config/paths';
import { CrewSettingsForm } from '../../../../features/crews/components/crew-settings-form';
import { LeaveCrew } from '../../../../features/crews/components/leave-crew';
import { MembersPanel } from '../../../../features/members/components/members-panel';
import { useSignedInMe } from '../../../../lib/auth';
import { canManageCrew } from '../../../../lib/authorization';
import { useCrew } from './crew-layout';
import styles from './crew.module.css';

/** /crews/:crewId/settings: members for everyone; invites and settings for owners; leave for all. */
export function Component() {
  const crew = useCrew();
  const me = useSignedInMe();
  const navigate = useNavigate();
  const owner = canManageCrew(crew.role);
  useDocumentTitle(`${crew.name}: crew & members`);

  return (
    <>
      <MembersPanel
        crewId={crew.id}
        crewName={crew.name}
        ownUserId={me.user.id}
        canManage={owner}
        onLeft={() => navigate(paths.home.href())}
      />
      {owner ? (
        <section aria-labelledby="crew-settings-heading" className={styles.section}>
          <Heading as="h2" id="crew-settings-heading" variant="medium">
            Crew settings
          </Heading>
          <CrewSettingsForm key={crew.id} crew={crew} />
        </section>
      ) : null}
      <section aria-labelledby="leave-heading" className={styles.section}>
        <Heading as="h2" id="leave-heading" variant="medium">
          Leave the crew
        </Heading>
        <LeaveCrew
          crewId={crew.id}
          crewName={crew.name}
          ownUserId={me.user.id}
          onLeft={() => navigate(paths.home.href())}
        />
      </section>
    </>
  );
}
