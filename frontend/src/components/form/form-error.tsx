import { Banner } from '@primer/react';
import { ApiRequestError } from '../../lib/api-client';

/**
 * The form-level message of a failed submission. When the server also named fields, those messages sit
 * beside the fields; this banner says so, so nobody misses them on a small screen.
 */
export function FormError({ error, title = 'That did not go through' }: { error: unknown; title?: string }) {
  if (!error) return null;
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  const hasFieldErrors =
    error instanceof ApiRequestError && error.fieldErrors && Object.keys(error.fieldErrors).length > 0;
  return (
    <Banner
      variant="critical"
      layout="compact"
      title={title}
      description={hasFieldErrors ? `${message} The fields that need a look are marked below.` : message}
    />
  );
}
