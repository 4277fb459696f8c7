import { Link, Text } from '@primer/react';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { paths, safeNextPath } from '../../../config/paths';
import { SignInForm } from '../../../features/auth/components/sign-in-form';

/** /sign-in?next=…: after signing in, back to where the person was headed (an app path only). */
export function Component() {
  useDocumentTitle('Sign in');
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  return (
    <AuthLayout
      title="Sign in"
      footer={
        <>
          <Text>
            New to Shoalbook?{' '}
            <Link as={RouterLink} to={paths.signUp.href(next ?? undefined)} inline>
              Create an account
            </Link>
          </Text>
          <Text>
            <Link as={RouterLink} to={paths.resetPassword.href()} inline>
              Forgot your password?
            </Link>
          </Text>
        </>
      }
    >
      <SignInForm onSignedIn={() => navigate(next ?? paths.home.href(), { replace: true })} />
    </AuthLayout>
  );
}
