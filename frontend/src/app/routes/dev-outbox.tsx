import { Banner, Button, Link, Text } from '@primer/react';
import { SyncIcon } from '@primer/octicons-react';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router-dom';
import { BrandMark } from '../../components/brand/brand-mark';
import { EmptyState, ErrorState, LoadingState } from '../../components/feedback/query-states';
import { PageHeader } from '../../components/layouts/page-header';
import { paths } from '../../config/paths';
import { outboxQuery } from '../../features/dev-outbox/api/outbox-api';
import { OutboxList } from '../../features/dev-outbox/components/outbox-list';
import { isApiError } from '../../lib/api-client';
import styles from './dev-outbox.module.css';

/** /dev/outbox: the mail the local fake SMTP server caught. The server offers it in development only. */
export function Component() {
  const outbox = useQuery(outboxQuery);
  return (
    <div className={styles.page}>
      <header className={styles.bar}>
        <RouterLink to={paths.home.href()} className={styles.brand}>
          <BrandMark size={28} />
          <span>Shoalbook</span>
        </RouterLink>
        <Text className={styles.badge}>Development</Text>
      </header>
      <main className={styles.main}>
        <PageHeader
          title="Local outbox"
          lead="Mail Shoalbook sent while running on this machine: invites and password-reset links land here instead of a real inbox."
          actions={
            <Button leadingVisual={SyncIcon} onClick={() => void outbox.refetch()} loading={outbox.isFetching}>
              Refresh
            </Button>
          }
        />
        {outbox.isPending ? (
          <LoadingState label="Loading messages…" />
        ) : outbox.isError ? (
          isApiError(outbox.error, 404) ? (
            <Banner
              variant="info"
              title="No outbox here"
              description="The outbox exists only while Shoalbook runs in development mode. In production, mail goes to real inboxes."
            />
          ) : isApiError(outbox.error, 401) || isApiError(outbox.error, 403) ? (
            <Banner
              variant="warning"
              title="Only the site admin reads the outbox"
              description={
                <>
                  The messages hold password-reset and invite links, so they are shown to a signed-in site admin only.
                  In the demo, sign in as admin@demo.test.{' '}
                  <Link as={RouterLink} to={paths.signIn.href(paths.devOutbox.href())} inline>
                    Sign in as the site admin
                  </Link>
                </>
              }
            />
          ) : (
            <ErrorState
              error={outbox.error}
              title="The outbox could not be read"
              onRetry={() => void outbox.refetch()}
            />
          )
        ) : outbox.data.length === 0 ? (
          <EmptyState title="No mail yet">
            Send an invite or ask for a password reset, then refresh this page.
          </EmptyState>
        ) : (
          <OutboxList messages={outbox.data} />
        )}
      </main>
    </div>
  );
}
