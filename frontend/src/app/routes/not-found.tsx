import { LinkButton, Text } from '@primer/react';
import { Link as RouterLink } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { useDocumentTitle } from '../../components/layouts/page-header';
import { paths } from '../../config/paths';

/** Any path the app does not know. */
export function Component() {
  useDocumentTitle('Page not found');
  return (
    <AuthLayout title="Nothing at this address">
      <Text as="p">The page may have moved, or the link was cut short.</Text>
      <LinkButton as={RouterLink} to={paths.home.href()} variant="primary" block>
        Go to your crews
      </LinkButton>
    </AuthLayout>
  );
}
