import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Navigate, Outlet, useLocation, useNavigate, useParams } from 'react-router-dom';
import { AppShell } from '../../../components/layouts/app-shell';
import { paths } from '../../../config/paths';
import { crewsQuery } from '../../../features/crews/api/crews-api';
import { signOut } from '../../../features/auth/api/auth-api';
import { forgetSignedIn, useMe } from '../../../lib/auth';

/** Frame of every signed-in screen; signing out here sends the person to the sign-in page. */
export function Component() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const location = useLocation();
  const { crewId } = useParams();
  const me = useMe();
  const crews = useQuery({ ...crewsQuery, enabled: Boolean(me.data) });
  const signOutMutation = useMutation({
    mutationFn: signOut,
    // Even if the server call fails, nothing of this person stays on screen.
    onSettled: () => {
      forgetSignedIn(queryClient);
      navigate(paths.signIn.href(), { replace: true });
    },
  });

  if (!me.data) return <Navigate to={paths.signIn.href(location.pathname)} replace />;

  // Until GET /crews answers, the memberships that came with /auth/me fill the switcher.
  const crewChoices =
    crews.data?.map((c) => ({ id: c.id, name: c.name, role: c.role })) ??
    me.data.crews.map((m) => ({ id: m.crewId, name: m.crewName, role: m.role }));

  return (
    <AppShell
      displayName={me.data.user.displayName}
      email={me.data.user.email}
      isSiteAdmin={me.data.user.siteRole === 'admin'}
      crews={crewChoices}
      currentCrewId={crewId}
      onSignOut={() => signOutMutation.mutate()}
    >
      <Outlet />
    </AppShell>
  );
}
