import { Text } from '@primer/react';
import type { SendKind } from '../../lib/device-db';
import { useSendEntries } from '../../lib/send-queue';
import { EntryStateLabel } from './entry-state';
import styles from './send-queue.module.css';

/**
 * Entries of one crew (and, if given, one scope such as a competition day) still on this device: shown at once
 * beside the records the server already has, so a fish logged without signal is visibly kept. `kinds` keeps
 * only those kinds of entry (a list of catches shows the catches waiting).
 */
export function WaitingEntries({
  userId,
  crewId,
  scope,
  kinds,
}: {
  userId: string;
  crewId: string;
  scope?: string;
  kinds?: SendKind[];
}) {
  const entries = useSendEntries(userId).filter(
    (e) => e.crewId === crewId && (!scope || e.scope === scope) && (!kinds || kinds.includes(e.kind)),
  );
  if (entries.length === 0) return null;
  return (
    <section aria-label="Not sent yet" className={styles.waiting}>
      <ul className={styles.list}>
        {entries.map((e) => (
          <li key={e.seq} className={styles.item}>
            <EntryStateLabel state={e.state} /> <Text>{e.label}</Text>
            {e.state === 'needs-you' && e.lastError ? (
              <Text as="p" size="small" className={styles.message}>
                The server refused it: {e.lastError.message} Use “needs you” at the top of the page to send it again or
                discard it.
              </Text>
            ) : null}
          </li>
        ))}
      </ul>
    </section>
  );
}

/** The header badge's wording, also quoted by the lists. */
export function badgeText(count: number, needsYou = 0): string {
  if (needsYou > 0) return `${needsYou} need${needsYou === 1 ? 's' : ''} you`;
  return `${count} waiting to send`;
}
