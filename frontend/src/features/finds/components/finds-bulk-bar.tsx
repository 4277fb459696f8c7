import { TrashIcon } from '@primer/octicons-react';
import { Banner, Button, Dialog, FormControl, Select, Text } from '@primer/react';
import { FIND_KINDS, FIND_KIND_LABELS, FIND_SUB_KINDS, type FindKind } from '@shoalbook/shared';
import { useState } from 'react';
import { useBulkDeleteFinds, useBulkUpdateFinds } from '../api/finds-api';
import styles from './finds-bulk-bar.module.css';

const NO_EVENT = 'none';

/**
 * What to do with the finds chosen in the table: set their kind (and sub-kind) or their event, or delete
 * them, all in one request each (all of them or none). Deleting asks first and says what stays.
 */
export function FindsBulkBar({
  crewId,
  findIds,
  events,
  onDone,
}: {
  crewId: string;
  findIds: string[];
  /** The events of the finds' lake, to move the finds to. */
  events: readonly { id: string; name: string }[];
  onDone: () => void;
}) {
  const update = useBulkUpdateFinds(crewId);
  const remove = useBulkDeleteFinds(crewId);
  const [kind, setKind] = useState<FindKind>('hard-bottom');
  const [subKind, setSubKind] = useState('');
  const [eventId, setEventId] = useState(events[0]?.id ?? NO_EVENT);
  const [confirming, setConfirming] = useState(false);
  const [done, setDone] = useState<string | null>(null);
  const count = findIds.length;
  const finds = count === 1 ? '1 find' : `${count} finds`;
  const failure = update.error ?? remove.error;
  const busy = update.isPending || remove.isPending;

  const run = async (action: () => Promise<string>) => {
    setDone(null);
    try {
      setDone(await action());
      onDone();
    } catch {
      // Shown from the mutation's error below; the selection stays for another try.
    }
  };

  return (
    <section aria-label="Chosen finds" className={styles.bar}>
      {count === 0 ? (
        <Text as="p" className={styles.count}>
          Tick finds in the table (or every row the filter matches) to set their kind or event, or delete them, in one
          go.
        </Text>
      ) : (
        <Text as="p" weight="semibold" className={styles.count}>
          {finds} chosen
        </Text>
      )}
      {done ? (
        <Text as="p" role="status" className={styles.done}>
          {done}
        </Text>
      ) : null}
      {count > 0 ? (
        <>
          <div className={styles.group}>
            <FormControl>
              <FormControl.Label>Kind</FormControl.Label>
              <Select
                value={kind}
                onChange={(e) => {
                  setKind(e.target.value as FindKind);
                  setSubKind('');
                }}
              >
                {FIND_KINDS.map((k) => (
                  <Select.Option key={k} value={k}>
                    {FIND_KIND_LABELS[k]}
                  </Select.Option>
                ))}
              </Select>
            </FormControl>
            <FormControl>
              <FormControl.Label>Sub-kind</FormControl.Label>
              <Select value={subKind} onChange={(e) => setSubKind(e.target.value)}>
                <Select.Option value="">None</Select.Option>
                {FIND_SUB_KINDS[kind].map((s) => (
                  <Select.Option key={s} value={s}>
                    {s}
                  </Select.Option>
                ))}
              </Select>
            </FormControl>
            <Button
              disabled={busy}
              onClick={() =>
                run(async () => {
                  const r = await update.mutateAsync({ findIds, kind, subKind });
                  return `${r.updated} finds are now ${FIND_KIND_LABELS[kind].toLowerCase()}.`;
                })
              }
            >
              Set kind
            </Button>
          </div>
          <div className={styles.group}>
            <FormControl>
              <FormControl.Label>Event</FormControl.Label>
              <Select value={eventId} onChange={(e) => setEventId(e.target.value)}>
                {events.map((ev) => (
                  <Select.Option key={ev.id} value={ev.id}>
                    {ev.name}
                  </Select.Option>
                ))}
                <Select.Option value={NO_EVENT}>No event</Select.Option>
              </Select>
            </FormControl>
            <Button
              disabled={busy}
              onClick={() =>
                run(async () => {
                  const target = eventId === NO_EVENT ? null : eventId;
                  const r = await update.mutateAsync({ findIds, eventId: target });
                  const name = events.find((ev) => ev.id === target)?.name;
                  return name
                    ? `${r.updated} finds now belong to ${name}.`
                    : `${r.updated} finds belong to no event now.`;
                })
              }
            >
              Set event
            </Button>
          </div>
          <Button variant="danger" leadingVisual={TrashIcon} disabled={busy} onClick={() => setConfirming(true)}>
            {`Delete ${finds}`}
          </Button>
          {failure ? (
            <Banner
              variant="critical"
              layout="compact"
              title="Nothing was changed"
              description={failure instanceof Error ? failure.message : 'Something went wrong.'}
            />
          ) : null}
        </>
      ) : null}
      {confirming ? (
        <Dialog
          title={`Delete ${finds}?`}
          role="alertdialog"
          onClose={() => setConfirming(false)}
          footerButtons={[
            { content: 'Keep them', onClick: () => setConfirming(false), autoFocus: true },
            {
              content: remove.isPending ? 'Deleting…' : `Delete ${finds}`,
              buttonType: 'danger',
              loading: remove.isPending,
              onClick: () =>
                run(async () => {
                  const r = await remove.mutateAsync(findIds);
                  setConfirming(false);
                  const kept = r.catchesUnattached + r.stopsUnattached;
                  const catches = `${r.catchesUnattached} catch${r.catchesUnattached === 1 ? '' : 'es'}`;
                  const stops = `${r.stopsUnattached} stop${r.stopsUnattached === 1 ? '' : 's'}`;
                  return `${r.deleted} finds deleted.${kept ? ` ${catches} and ${stops} stay, with no find.` : ''}`;
                }),
            },
          ]}
        >
          <Text as="p">
            Catches and stops at these finds stay in the journal with their data, attached to no find. This cannot be
            undone.
          </Text>
        </Dialog>
      ) : null}
    </section>
  );
}
