import { useQueryClient } from '@tanstack/react-query';
import { liveQuery } from 'dexie';
import { useEffect, useState } from 'react';
import type { SendEntry } from '../device-db';
import { refreshCrewJournal } from '../crew-cache';
import { BACKGROUND_SYNC_TAG, sendQueue } from './runtime';

/** The signed-in user's entries, live: they change as the queue drains or the angler acts. */
export function useSendEntries(userId: string | undefined): SendEntry[] {
  const [entries, setEntries] = useState<SendEntry[]>([]);
  useEffect(() => {
    if (!userId) return;
    const subscription = liveQuery(() => sendQueue.entries(userId)).subscribe({
      next: setEntries,
      error: () => setEntries([]),
    });
    return () => subscription.unsubscribe();
  }, [userId]);
  return userId ? entries : [];
}

/**
 * While someone is signed in: drain now, when the network comes back, when the tab is shown again and when
 * the service worker's background sync fires; refresh the crew's lists as entries are acknowledged.
 */
export function useSendQueueDrain(userId: string | undefined): void {
  const queryClient = useQueryClient();
  useEffect(() => {
    if (!userId) return;
    const drain = (now = false) => void sendQueue.drain(userId, { now }).catch(() => undefined);
    const online = () => drain(true);
    const visible = () => {
      if (document.visibilityState === 'visible') drain();
    };
    const fromWorker = (event: MessageEvent) => {
      if ((event.data as { type?: string } | null)?.type === BACKGROUND_SYNC_TAG) drain(true);
    };
    const stopSent = sendQueue.onSent((entry) => {
      void refreshCrewJournal(queryClient, entry.crewId);
    });
    window.addEventListener('online', online);
    document.addEventListener('visibilitychange', visible);
    navigator.serviceWorker?.addEventListener('message', fromWorker);
    drain();
    return () => {
      window.removeEventListener('online', online);
      document.removeEventListener('visibilitychange', visible);
      navigator.serviceWorker?.removeEventListener('message', fromWorker);
      stopSent();
      sendQueue.stop();
    };
  }, [userId, queryClient]);
}
