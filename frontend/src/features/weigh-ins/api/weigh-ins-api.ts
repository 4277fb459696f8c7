import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys, LIVE_DAY_REFETCH_MS } from '../../../lib/journal-keys';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import type { RecordChange, WeighInHistoryField } from '@shoalbook/shared';
import type { RecordWeighInRequest, WeighInsView } from '../../../lib/journal-types';

/** GET /events/:eventId/weigh-ins: each day's counted bag (from the catches and the event's rules) and the totals. */
export function useWeighIns(crewId: string, eventId: string, { live = false }: { live?: boolean } = {}) {
  return useQuery({
    queryKey: journalKeys.weighIns(crewId, eventId),
    queryFn: () => api.get<WeighInsView>(crewApiPath(crewId, `/events/${encodeURIComponent(eventId)}/weigh-ins`)),
    refetchInterval: live ? LIVE_DAY_REFETCH_MS : false,
  });
}

/** Every change to a day's official figures, from the crew's journal; refreshed with the event's weigh-ins. */
export function useWeighInHistory(crewId: string, eventId: string, dayId: string) {
  return useQuery({
    queryKey: [...journalKeys.weighIns(crewId, eventId), 'history', dayId] as const,
    queryFn: () =>
      api.get<RecordChange<WeighInHistoryField>[]>(
        crewApiPath(crewId, `/competition-days/${encodeURIComponent(dayId)}/weigh-in/history`),
      ),
  });
}

/** PUT /competition-days/:dayId/weigh-in: the official figures, which override the computed ones. Weights in lb; `version` of the recorded figures once there are any. */
export function useRecordWeighIn(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ dayId, ...body }: { dayId: string } & RecordWeighInRequest) =>
      api.request<unknown>('PUT', crewApiPath(crewId, `/competition-days/${encodeURIComponent(dayId)}/weigh-in`), {
        body,
      }),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}
