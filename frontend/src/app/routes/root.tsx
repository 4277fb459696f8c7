import { Banner, Button } from '@primer/react';
import { Outlet, isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { LoadingState } from '../../components/feedback/query-states';
import styles from './root.module.css';

/** Everything renders inside this; it adds nothing visible. */
export function RootLayout() {
  return <Outlet />;
}

/** Shown while the first route's code and data load. */
export function RootHydrateFallback() {
  return (
    <div className={styles.fallback}>
      <LoadingState label="Opening Shoalbook…" />
    </div>
  );
}

/** Last resort for a failed route load (server unreachable, a chunk that did not arrive). */
export function RootErrorBoundary() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Something went wrong.';
  return (
    <div className={styles.fallback}>
      <Banner
        variant="critical"
        title="Shoalbook could not open this page"
        description={message}
        primaryAction={<Button onClick={() => window.location.reload()}>Reload</Button>}
      />
    </div>
  );
}
