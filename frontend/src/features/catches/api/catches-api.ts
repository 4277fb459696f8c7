import type { CatchHistoryField, Fate, RecordChange, Species } from '@shoalbook/shared';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys, LIVE_DAY_REFETCH_MS, queryString } from '../../../lib/journal-keys';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import { sendFromForm, type FormSendResult } from '../../../lib/send-queue';
import type { CatchWithSky } from '../../../lib/journal-types';
import type { DepthEntry, LengthEntry, TemperatureEntry, WeightEntry } from '../../../lib/units';

/** Body of POST /catches: the weight, length, depth and temperature as typed, each with its unit. */
export interface CatchInput {
  competitionDayId: string;
  /** "HH:MM" on the lake's clock, on the competition day. */
  caughtAt: string;
  findId?: string;
  /** Given instead of findId: the server attributes the catch to the nearest find within radiusM. */
  lat?: number;
  lon?: number;
  radiusM?: number;
  species: Species;
  weight: WeightEntry;
  length: LengthEntry | null;
  lure: string;
  technique: string;
  depth: DepthEntry | null;
  waterTemp: TemperatureEntry | null;
  fate: Fate;
  notes?: string;
  photoId?: string | null;
}

/**
 * Body of PATCH /catches/:catchId: only what changed (an unchanged weight is not re-sent, so what was typed
 * stays exactly as typed), plus the version the form was loaded with (409 "stale_version" when outdated).
 */
export type CatchChanges = Partial<Omit<CatchInput, 'competitionDayId' | 'findId'>> & {
  findId?: string | null;
  version: number;
};

const catchPath = (crewId: string, catchId: string) => crewApiPath(crewId, `/catches/${encodeURIComponent(catchId)}`);
const catchKey = (crewId: string, catchId: string) => [...journalKeys.allCatches(crewId), 'one', catchId] as const;

/** The crew's catches of an event or a day; `live` keeps a day on screen current with other members' entries. */
export function useCatches(
  crewId: string,
  filter: { eventId?: string; competitionDayId?: string },
  { live = false }: { live?: boolean } = {},
) {
  return useQuery({
    queryKey: journalKeys.catches(crewId, filter),
    queryFn: () => api.get<CatchWithSky[]>(crewApiPath(crewId, `/catches${queryString(filter)}`)),
    enabled: Boolean(filter.eventId || filter.competitionDayId),
    refetchInterval: live ? LIVE_DAY_REFETCH_MS : false,
  });
}

/** One catch with its sun and moon context. */
export function useCatch(crewId: string, catchId: string) {
  return useQuery({
    queryKey: catchKey(crewId, catchId),
    queryFn: () => api.get<CatchWithSky>(catchPath(crewId, catchId)),
  });
}

/** Every change to the catch's weight and length, from the crew's journal (refreshed with the catch). */
export function useCatchHistory(crewId: string, catchId: string) {
  return useQuery({
    queryKey: [...catchKey(crewId, catchId), 'history'] as const,
    queryFn: () => api.get<RecordChange<CatchHistoryField>[]>(`${catchPath(crewId, catchId)}/history`),
  });
}

/**
 * Save changes to a catch through the send queue (on the water there may be no signal): the answer when the
 * server has it at once, else 'waiting' while the queue keeps the change. Lists and the weigh-in are refreshed
 * (a changed weight or fate recounts the bag); the queue refreshes them again when a waiting change is sent.
 */
export function useUpdateCatch(userId: string, crewId: string, catchId: string, label = 'Changes to a catch') {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: CatchChanges): Promise<FormSendResult<CatchWithSky>> => {
      return sendFromForm<CatchWithSky>({
        userId,
        crewId,
        kind: 'edit-catch',
        method: 'PATCH',
        path: catchPath(crewId, catchId),
        body: changes,
        recordId: catchId,
        label,
      });
    },
    onSuccess: (result) => {
      if (result.kind !== 'sent') return;
      queryClient.setQueryData(catchKey(crewId, catchId), result.answer);
      return refreshCrewJournal(queryClient, crewId);
    },
  });
}

/** Log one catch; the day's catches and its weigh-in change with it. */
export function useLogCatch(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CatchInput) => api.post<CatchWithSky>(crewApiPath(crewId, '/catches'), input),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}

export function useDeleteCatch(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (catchId: string) => api.delete(catchPath(crewId, catchId)),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}
