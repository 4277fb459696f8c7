import { useConfirm } from '@primer/react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Navigate, Outlet, useLocation, useNavigate, useParams } from 'react-router-dom';
import { AppShell } from '../../../components/layouts/app-shell';
import { paths } from '../../../config/paths';
import { crewsQuery } from '../../../features/crews/api/crews-api';
import { signOut } from '../../../features/auth/api/auth-api';
import { forgetSignedIn, useMe } from '../../../lib/auth';
import { forgetKeptReads } from '../../../lib/offline-reads';
import { deviceDb, sendQueue, useSendQueueDrain } from '../../../lib/send-queue';

/** Frame of every signed-in screen; signing out here sends the person to the sign-in page. */
export function Component() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const location = useLocation();
  const { crewId } = useParams();
  const me = useMe();
  const userId = me.data?.user.id;
  useSendQueueDrain(userId);
  const confirm = useConfirm();
  const crews = useQuery({ ...crewsQuery, enabled: Boolean(me.data) });
  const signOutMutation = useMutation({
    mutationFn: signOut,
    // Even if the server call fails, nothing of this person stays on screen or on the device.
    onSettled: async () => {
      if (userId) await sendQueue.discardAll(userId).catch(() => undefined);
      await forgetKeptReads(deviceDb).catch(() => undefined);
      forgetSignedIn(queryClient);
      navigate(paths.signIn.href(), { replace: true });
    },
  });

  /** Entries not yet sent would be deleted with the rest of this person's data: ask first. */
  const requestSignOut = async () => {
    const unsent = userId ? (await sendQueue.entries(userId).catch(() => [])).length : 0;
    if (
      unsent > 0 &&
      !(await confirm({
        title: `${unsent} ${unsent === 1 ? 'entry has' : 'entries have'} not been sent`,
        content:
          'Signing out deletes them from this phone, and the server never gets them. Stay signed in until they are sent (the badge at the top clears), or sign out and lose them.',
        cancelButtonContent: 'Stay signed in',
        confirmButtonContent: 'Sign out and delete them',
        confirmButtonType: 'danger',
      }))
    )
      return;
    signOutMutation.mutate();
  };

  if (!me.data) return <Navigate to={paths.signIn.href(location.pathname)} replace />;

  // Until GET /crews answers, the memberships that came with /auth/me fill the switcher.
  const crewChoices =
    crews.data?.map((c) => ({ id: c.id, name: c.name, role: c.role })) ??
    me.data.crews.map((m) => ({ id: m.crewId, name: m.crewName, role: m.role }));

  return (
    <AppShell
      userId={me.data.user.id}
      displayName={me.data.user.displayName}
      email={me.data.user.email}
      isSiteAdmin={me.data.user.siteRole === 'admin'}
      crews={crewChoices}
      currentCrewId={crewId}
      onSignOut={() => void requestSignOut()}
    >
      <Outlet />
    </AppShell>
  );
}
