import type { QueryClient } from '@tanstack/react-query';
import { journalKeys } from './journal-keys';
import { deviceDb } from './send-queue/runtime';

/**
 * What the client keeps of a crew follows the crew's journal: every key of a crew's data starts with
 * `journalKeys.crew` (lists, weigh-ins, reports), so one prefix serves both helpers.
 */

/**
 * After any write to the crew's journal (a catch, a stop, a weigh-in, an import, a find…): every cached answer
 * of the crew, reports included, is stale at once instead of after the 30 s stale time. Only queries on screen
 * refetch now; the others refetch when next shown.
 */
export function refreshCrewJournal(queryClient: QueryClient, crewId: string): Promise<void> {
  return queryClient.invalidateQueries({ queryKey: journalKeys.crew(crewId) });
}

/**
 * After leaving or losing a crew: nothing of its journal stays on this device, neither in the query cache nor
 * among the answers kept for reading offline. (The crew's own entry, `['crews', crewId]`, is the caller's: the
 * crew layout still shows its 404 from it.)
 */
export async function forgetCrew(queryClient: QueryClient, crewId: string): Promise<void> {
  queryClient.removeQueries({ queryKey: journalKeys.crew(crewId) });
  const own = `/crews/${crewId}`;
  await deviceDb.keptReads
    .where('path')
    .startsWith(own)
    .filter((r) => r.path === own || r.path.startsWith(`${own}/`) || r.path.startsWith(`${own}?`))
    .delete()
    .catch(() => undefined);
}
