import type { LogStopRequest, StopDeletedView, StopView, UpdateStopRequest } from '@shoalbook/shared';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { v7 as uuidv7 } from 'uuid';
import { api } from '../../../lib/api-client';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import { crewApiPath, journalKeys, queryString } from '../../../lib/journal-keys';
import { sendFromForm, sendQueue, type FormSendResult } from '../../../lib/send-queue';

/**
 * Every stop write of the front end goes through this module (one function per route). "Arrived here",
 * "Left" and the edit form go through the send queue on the device, as catches do: a stop logged without
 * signal is kept on the phone and sent later with its Idempotency-Key.
 */
const stopsPath = (crewId: string) => crewApiPath(crewId, '/stops');
const stopPath = (crewId: string, stopId: string) => crewApiPath(crewId, `/stops/${encodeURIComponent(stopId)}`);

/** GET /stops?competitionDayId=…: the day's stops by arrival, each with the catches its span holds. */
export function useDayStops(crewId: string, competitionDayId: string) {
  return useQuery({
    queryKey: journalKeys.stops(crewId, competitionDayId),
    queryFn: () => api.get<StopView[]>(`${stopsPath(crewId)}${queryString({ competitionDayId, limit: 500 })}`),
    enabled: Boolean(competitionDayId),
  });
}

/** A stop write through the send queue: the server's answer, or 'waiting' while the phone keeps it. */
function useQueuedStopWrite<TInput>(crewId: string, send: (input: TInput) => Promise<FormSendResult<StopView>>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (result) => {
      // Still on the phone: the queue refreshes the lists when it sends it.
      if (result.kind !== 'sent') return;
      // A stop changes which finds count as fished: the reports follow, as after every journal write.
      return refreshCrewJournal(queryClient, crewId);
    },
  });
}

/**
 * Puts the server's answer to every stop write the queue sends (from a form or later, in the background) into
 * the day's list at once: the entry leaves the queue before the list is read again, and the stop must not
 * vanish in between (an edit form open on it would lose what was typed). The read that follows the send
 * replaces an older read still on its way, so the list never goes back to before the answer.
 */
export function useSentStopsInDayLists() {
  const queryClient = useQueryClient();
  useEffect(
    () =>
      sendQueue.onSent((entry, answer) => {
        if (entry.kind !== 'stop' || entry.method === 'DELETE') return;
        const stop = answer as StopView;
        queryClient.setQueryData<StopView[]>(journalKeys.stops(entry.crewId, stop.competitionDayId), (old) =>
          old && !old.some((s) => s.id === stop.id && s.version > stop.version)
            ? [...old.filter((s) => s.id !== stop.id), stop]
            : old,
        );
      }),
    [queryClient],
  );
}

/** What the stop forms give beside the request: how the send queue names the entry. */
interface Queued {
  label: string;
}

/**
 * POST /stops through the send queue: "arrived here" (leftAt usually follows with {@link useUpdateStop}). The
 * stop gets its id here (UUID v7), so a "left" queued after an arrival still on the phone names the right stop.
 */
export function useLogStop(userId: string, crewId: string) {
  return useQueuedStopWrite(crewId, ({ label, ...input }: LogStopRequest & Queued) => {
    const id = input.id ?? uuidv7();
    return sendFromForm<StopView>({
      userId,
      crewId,
      kind: 'stop',
      method: 'POST',
      path: stopsPath(crewId),
      body: { ...input, id },
      recordId: id,
      label,
      scope: input.competitionDayId,
    });
  });
}

/**
 * PATCH /stops/:stopId through the send queue: "left" (leftAt) or the edit form; carries the version the stop
 * will have when the server gets this change (see waiting-stops.ts).
 */
export function useUpdateStop(userId: string, crewId: string) {
  return useQueuedStopWrite(
    crewId,
    ({
      stopId,
      competitionDayId,
      label,
      ...changes
    }: UpdateStopRequest & Queued & { stopId: string; competitionDayId: string }) =>
      sendFromForm<StopView>({
        userId,
        crewId,
        kind: 'stop',
        method: 'PATCH',
        path: stopPath(crewId, stopId),
        body: changes,
        recordId: stopId,
        label,
        scope: competitionDayId,
      }),
  );
}

/** DELETE /stops/:stopId: the stop goes, its catches stay (the answer lists them and says so). */
export function useDeleteStop(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stopId: string) => api.delete<StopDeletedView>(stopPath(crewId, stopId)),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}
