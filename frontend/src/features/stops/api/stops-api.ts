import type { LogStopRequest, StopDeletedView, StopView, UpdateStopRequest } from '@shoalbook/shared';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import { crewApiPath, journalKeys, queryString } from '../../../lib/journal-keys';

/**
 * Every stop write of the front end goes through this module (one function per route), so the send queue on
 * the device can take them over in one place.
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

function useStopWrite<TInput, TAnswer>(crewId: string, send: (input: TInput) => Promise<TAnswer>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    // A stop changes which finds count as fished: the reports follow, as after every journal write.
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}

/** POST /stops: "arrived here" (leftAt usually follows with {@link useUpdateStop}). */
export function useLogStop(crewId: string) {
  return useStopWrite(crewId, (input: LogStopRequest) => api.post<StopView>(stopsPath(crewId), input));
}

/** PATCH /stops/:stopId: "left" (leftAt) or the edit form; carries the version the stop was loaded with. */
export function useUpdateStop(crewId: string) {
  return useStopWrite(crewId, ({ stopId, ...changes }: UpdateStopRequest & { stopId: string }) =>
    api.patch<StopView>(stopPath(crewId, stopId), changes),
  );
}

/** DELETE /stops/:stopId: the stop goes, its catches stay (the answer lists them and says so). */
export function useDeleteStop(crewId: string) {
  return useStopWrite(crewId, (stopId: string) => api.delete<StopDeletedView>(stopPath(crewId, stopId)));
}
