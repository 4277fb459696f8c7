import { Label, Text } from '@primer/react';
import type { ReactNode } from 'react';
import type { SendEntry } from '../../lib/device-db';

/** How the screens mark a write still on this phone: waiting to send, or refused and waiting for the angler. */
export function EntryStateLabel({ state }: { state: SendEntry['state'] }) {
  return state === 'needs-you' ? (
    <Label variant="danger">Needs you</Label>
  ) : (
    <Label variant="attention">Waiting to send</Label>
  );
}

/** A form's word after a save that is kept on this phone for want of signal: the label, then what it means. */
export function WaitingToSendNote({ children, size = 'small' }: { children: ReactNode; size?: 'small' | 'medium' }) {
  return (
    <>
      <EntryStateLabel state="waiting" /> <Text size={size}>{children}</Text>
    </>
  );
}
