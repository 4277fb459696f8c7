import { Banner } from '@primer/react';
import { isApiError } from '../../lib/api-client';

/** True when a save failed because the record changed since it was loaded (409 "stale_version"). */
export function isStaleVersion(error: unknown): boolean {
  return isApiError(error, 409, 'stale_version');
}

/**
 * Shown instead of the generic error when someone else saved the record first. Reloading replaces the
 * form with their version, so the angler sees what changed before typing the change again.
 */
export function StaleVersionBanner({ error, what, onReload }: { error: unknown; what: string; onReload: () => void }) {
  if (!isStaleVersion(error)) return null;
  return (
    <Banner
      variant="warning"
      title={`This ${what} was changed elsewhere`}
      description={`Someone saved a change to this ${what} after you opened it, so yours was not saved. Reload the latest version, then make your change again.`}
      primaryAction={<Banner.PrimaryAction onClick={onReload}>Reload the latest</Banner.PrimaryAction>}
    />
  );
}
