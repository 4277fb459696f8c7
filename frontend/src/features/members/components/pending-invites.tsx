import type { InviteView } from '@shoalbook/shared';
import { Button, Text } from '@primer/react';
import { ROLE_LABELS } from '../../../lib/authorization';
import styles from './pending-invites.module.css';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** Invites that nobody has accepted yet, each with a revoke button. */
export function PendingInvites({
  invites,
  busyInviteId,
  onRevoke,
}: {
  invites: InviteView[];
  busyInviteId?: string | null;
  onRevoke: (invite: InviteView) => void;
}) {
  return (
    <ul className={styles.list} aria-label="Pending invites">
      {invites.map((invite) => (
        <li key={invite.id} className={styles.item}>
          <div>
            <Text weight="semibold" className={styles.email}>
              {invite.email}
            </Text>
            <Text as="p" size="small" className={styles.meta}>
              {ROLE_LABELS[invite.role]} · link works until {dateFormat.format(new Date(invite.expiresAt))}
            </Text>
          </div>
          <Button
            size="small"
            onClick={() => onRevoke(invite)}
            loading={busyInviteId === invite.id}
            aria-label={`Revoke the invite for ${invite.email}`}
          >
            Revoke
          </Button>
        </li>
      ))}
    </ul>
  );
}
