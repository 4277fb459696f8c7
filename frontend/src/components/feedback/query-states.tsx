import { Banner, Button, Spinner, Stack, Text } from '@primer/react';
import type { ReactNode } from 'react';
import { ApiRequestError } from '../../lib/api-client';
import styles from './query-states.module.css';

/** Shown while data is on its way; announced politely to screen readers. */
export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <div className={styles.centered} role="status" aria-live="polite">
      <Stack direction="horizontal" align="center" gap="condensed">
        <Spinner size="small" srText={null} />
        <Text>{label}</Text>
      </Stack>
    </div>
  );
}

/** A failed load, with the server's own sentence and a way to try again. */
export function ErrorState({
  error,
  title = 'This could not be loaded',
  onRetry,
}: {
  error: unknown;
  title?: string;
  onRetry?: () => void;
}) {
  return (
    <Banner
      variant="critical"
      title={title}
      description={<ErrorDescription error={error} />}
      primaryAction={onRetry ? <Banner.PrimaryAction onClick={onRetry}>Try again</Banner.PrimaryAction> : undefined}
    />
  );
}

function ErrorDescription({ error }: { error: unknown }) {
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  const requestId = error instanceof ApiRequestError ? error.requestId : undefined;
  return (
    <>
      {message}
      {requestId ? (
        <Text as="span" size="small">
          {' '}
          (reference {requestId})
        </Text>
      ) : null}
    </>
  );
}

/** Nothing here yet: says what will appear and, where it helps, how to add it. */
export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className={styles.empty}>
      <Text as="p" weight="semibold" className={styles.emptyTitle}>
        {title}
      </Text>
      {children ? <div className={styles.emptyBody}>{children}</div> : null}
      {action ? <div>{action}</div> : null}
    </div>
  );
}

/** A retry button for places where a banner would be too loud. */
export function RetryButton({ onRetry }: { onRetry: () => void }) {
  return (
    <Button size="small" onClick={onRetry}>
      Try again
    </Button>
  );
}
