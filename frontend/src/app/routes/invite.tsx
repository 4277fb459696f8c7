import { Banner } from '@primer/react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../components/feedback/query-states';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { useDocumentTitle } from '../../components/layouts/page-header';
import { paths } from '../../config/paths';
import { AcceptInvite } from '../../features/invites/components/accept-invite';
import { useMe } from '../../lib/auth';

/** /invite?token=…: open to everyone; accepting needs a signed-in account. */
export function Component() {
  useDocumentTitle('Crew invite');
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');
  const me = useMe();

  return (
    <AuthLayout title="Crew invite">
      {!token ? (
        <Banner
          variant="warning"
          title="This link is incomplete"
          description="Open the invite link exactly as it came in the e-mail."
        />
      ) : me.isPending ? (
        <LoadingState />
      ) : me.isError ? (
        <ErrorState error={me.error} onRetry={() => void me.refetch()} />
      ) : (
        <AcceptInvite token={token} me={me.data} onAccepted={(crewId) => navigate(paths.crew.href(crewId))} />
      )}
    </AuthLayout>
  );
}
