import { Banner, Link, LinkButton, Text } from '@primer/react';
import { useState } from 'react';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { useDocumentTitle } from '../../../components/layouts/page-header';
import { paths } from '../../../config/paths';
import { ResetConfirmForm } from '../../../features/auth/components/reset-confirm-form';
import { ResetRequestForm } from '../../../features/auth/components/reset-request-form';

/** /reset-password asks for a link; /reset-password?token=… (from the e-mail) sets the new password. */
export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token');
  const [done, setDone] = useState(false);
  const title = token ? 'Choose a new password' : 'Reset your password';
  useDocumentTitle(title);

  return (
    <AuthLayout
      title={done ? 'Password changed' : title}
      lead={
        token || done ? undefined : (
          <p>Enter the e-mail you sign in with and we will send you a link to choose a new password.</p>
        )
      }
      footer={
        <Text>
          <Link as={RouterLink} to={paths.signIn.href()} inline>
            Back to sign-in
          </Link>
        </Text>
      }
    >
      {done ? (
        <>
          <Banner
            variant="success"
            title="Your new password is set"
            description="For safety, every device that was signed in to this account has been signed out."
          />
          <LinkButton as={RouterLink} to={paths.signIn.href()} variant="primary" size="large" block>
            Sign in with the new password
          </LinkButton>
        </>
      ) : token ? (
        <ResetConfirmForm token={token} onDone={() => setDone(true)} />
      ) : (
        <ResetRequestForm />
      )}
    </AuthLayout>
  );
}
