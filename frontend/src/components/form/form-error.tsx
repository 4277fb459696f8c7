import { Banner } from '@primer/react';
import { ApiRequestError } from '../../lib/api-client';

/**
 * The form-level message of a failed submission. When the server named fields, their messages sit beside the
 * fields under the screen's own labels; this banner only says how many need a look (the server's summary names
 * the API's fields, which mean nothing on the screen), so nobody misses them on a small screen.
 */
export function FormError({ error, title = 'That did not go through' }: { error: unknown; title?: string }) {
  if (!error) return null;
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  const fields = error instanceof ApiRequestError && error.fieldErrors ? Object.keys(error.fieldErrors).length : 0;
  const description =
    fields === 0
      ? message
      : `${fields === 1 ? 'One field needs' : `${fields} fields need`} a look: the fields that need a look are marked below, each with what to change.`;
  return <Banner variant="critical" layout="compact" title={title} description={description} />;
}
