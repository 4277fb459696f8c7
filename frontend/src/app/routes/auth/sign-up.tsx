import { Link, Text } from '@primer/react';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { paths, safeNextPath } from '../../../config/paths';
import { SignUpForm } from '../../../features/auth/components/sign-up-form';

/** /sign-up?next=…&email=…: an invite link pre-fills the address it was sent to. */
export function Component() {
  useDocumentTitle('Create an account');
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  return (
    <AuthLayout
      title="Create an account"
      lead={<p>One account for every crew you fish with. Your crew&rsquo;s finds stay inside the crew.</p>}
      footer={
        <Text>
          Already have an account?{' '}
          <Link as={RouterLink} to={paths.signIn.href(next ?? undefined)} inline>
            Sign in
          </Link>
        </Text>
      }
    >
      <SignUpForm
        defaultEmail={params.get('email') ?? ''}
        onSignedUp={() => navigate(next ?? paths.home.href(), { replace: true })}
      />
    </AuthLayout>
  );
}
