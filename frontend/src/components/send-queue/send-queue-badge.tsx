import { UploadIcon } from '@primer/octicons-react';
import { Button, Dialog, Text } from '@primer/react';
import { useState } from 'react';
import type { SendEntry } from '../../lib/device-db';
import { sendQueue, useSendEntries } from '../../lib/send-queue';
import { EntryStateLabel } from './entry-state';
import { badgeText } from './waiting-entries';
import styles from './send-queue.module.css';

/**
 * The header's count of what is still on this device. Hidden when the queue is empty; opens the list, where a
 * refused entry can be sent again or discarded on purpose (nothing is dropped without the angler's say).
 */
export function SendQueueBadge({ userId }: { userId: string }) {
  const entries = useSendEntries(userId);
  const [open, setOpen] = useState(false);
  const needsYou = entries.filter((e) => e.state === 'needs-you').length;
  if (entries.length === 0 && !open) return null;
  return (
    <>
      <Button
        className={styles.badge}
        variant={needsYou ? 'danger' : 'default'}
        leadingVisual={UploadIcon}
        count={entries.length}
        aria-label={`${badgeText(entries.length, needsYou)}: show the send queue`}
        onClick={() => setOpen(true)}
      >
        {needsYou ? 'Needs you' : 'Waiting to send'}
      </Button>
      {open ? (
        <Dialog title="Send queue" onClose={() => setOpen(false)} width="large">
          <SendQueueList userId={userId} entries={entries} />
        </Dialog>
      ) : null}
    </>
  );
}

function SendQueueList({ userId, entries }: { userId: string; entries: SendEntry[] }) {
  if (entries.length === 0) return <Text as="p">Everything has been sent.</Text>;
  const waiting = entries.filter((e) => e.state === 'waiting').length;
  return (
    <div>
      <Text as="p">
        These entries are kept on this phone until the server has them. They are sent in order, by themselves, when
        there is signal.
      </Text>
      {waiting ? (
        <Button onClick={() => void sendQueue.drain(userId, { now: true }).catch(() => undefined)}>
          Try sending now
        </Button>
      ) : null}
      <ul className={styles.list}>
        {entries.map((e) => (
          <SendQueueItem key={e.seq} entry={e} />
        ))}
      </ul>
    </div>
  );
}

function SendQueueItem({ entry }: { entry: SendEntry }) {
  const [confirming, setConfirming] = useState(false);
  return (
    <li className={styles.entry}>
      <EntryStateLabel state={entry.state} /> <Text weight="semibold">{entry.label}</Text>
      {entry.lastError ? (
        <Text as="p" size="small" className={styles.message}>
          {entry.state === 'needs-you' ? 'The server refused it: ' : 'Last try: '}
          {entry.lastError.message}
        </Text>
      ) : null}
      {entry.state === 'needs-you' ? (
        <>
          <EnteredValues body={entry.body} />
          <div className={styles.actions}>
            <Button onClick={() => void sendQueue.resend(entry.seq!)}>Send again</Button>
            {confirming ? (
              <Button variant="danger" onClick={() => void sendQueue.discard(entry.seq!)}>
                Discard it for good
              </Button>
            ) : (
              <Button onClick={() => setConfirming(true)}>Discard…</Button>
            )}
          </div>
        </>
      ) : null}
    </li>
  );
}

/** What the angler entered, so nothing of it is lost even if they discard the entry. */
function EnteredValues({ body }: { body: unknown }) {
  if (!body || typeof body !== 'object') return null;
  const rows = Object.entries(body as Record<string, unknown>).filter(
    ([k, v]) => k !== 'id' && v !== null && v !== '' && v !== undefined,
  );
  return (
    <dl className={styles.values}>
      {rows.map(([k, v]) => (
        <div key={k} style={{ display: 'contents' }}>
          <dt>{k}</dt>
          <dd>{typeof v === 'object' ? Object.values(v as object).join(' ') : String(v)}</dd>
        </div>
      ))}
    </dl>
  );
}
