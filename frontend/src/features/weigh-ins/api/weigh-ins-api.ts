import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys, LIVE_DAY_REFETCH_MS } from '../../../lib/journal-keys';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import { sendFromForm, versionOnceSent, type FormSendResult } from '../../../lib/send-queue';
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

/**
 * PUT /competition-days/:dayId/weigh-in through the send queue (figures are often typed at the scales, where
 * signal is poor): the official figures, which override the computed ones. Weights in lb; `version` of the
 * recorded figures once there are any. 'waiting' while the phone keeps them; the queue refreshes the lists when
 * it sends them.
 */
export function useRecordWeighIn(userId: string, crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({
      dayId,
      label,
      version,
      ...figures
    }: { dayId: string; label: string } & RecordWeighInRequest): Promise<FormSendResult<unknown>> => {
      // The figures this correction is based on, those still waiting on this phone included.
      const basedOn = await versionOnceSent({ userId, kind: 'weigh-in', recordId: dayId }, version);
      return sendFromForm({
        userId,
        crewId,
        kind: 'weigh-in',
        method: 'PUT',
        path: crewApiPath(crewId, `/competition-days/${encodeURIComponent(dayId)}/weigh-in`),
        body: { ...figures, ...(basedOn !== undefined ? { version: basedOn } : {}) },
        recordId: dayId,
        label,
        scope: dayId,
      });
    },
    onSuccess: (result) => (result.kind === 'sent' ? refreshCrewJournal(queryClient, crewId) : undefined),
  });
}
