import { Text } from '@primer/react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../../components/layouts/page-header';
import { paths } from '../../../config/paths';
import { CreateCrewForm } from '../../../features/crews/components/create-crew-form';
import { useSignedInMe } from '../../../lib/auth';
import styles from './pages.module.css';

/** /crews/new: "create your first crew" when someone has none, "start another" otherwise. */
export function Component() {
  const me = useSignedInMe();
  const navigate = useNavigate();
  const first = me.crews.length === 0;
  return (
    <div className={styles.narrow}>
      <PageHeader
        title={first ? 'Create your first crew' : 'Start another crew'}
        lead="A crew is the people who share one journal: you, your partner or co-angler, and anyone you want reading along, such as a coach."
      />
      {first ? (
        <Text as="p" className={styles.note}>
          Were you invited to someone else&rsquo;s crew? Open the link in that e-mail instead; it brings you straight
          in.
        </Text>
      ) : null}
      <CreateCrewForm onCreated={(crew) => navigate(paths.crew.href(crew.id))} />
    </div>
  );
}
