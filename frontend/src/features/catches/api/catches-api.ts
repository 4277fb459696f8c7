import type { Fate, Species } from '@shoalbook/shared';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys, queryString } from '../../../lib/journal-keys';
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
}

export function useCatches(crewId: string, filter: { eventId?: string; competitionDayId?: string }) {
  return useQuery({
    queryKey: journalKeys.catches(crewId, filter),
    queryFn: () => api.get<CatchWithSky[]>(crewApiPath(crewId, `/catches${queryString(filter)}`)),
    enabled: Boolean(filter.eventId || filter.competitionDayId),
  });
}

/** Log one catch; the day's catches and its weigh-in change with it. */
export function useLogCatch(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CatchInput) => api.post<CatchWithSky>(crewApiPath(crewId, '/catches'), input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: journalKeys.allCatches(crewId) }),
        queryClient.invalidateQueries({ queryKey: journalKeys.allWeighIns(crewId) }),
      ]),
  });
}

export function useDeleteCatch(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (catchId: string) => api.delete(crewApiPath(crewId, `/catches/${encodeURIComponent(catchId)}`)),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: journalKeys.allCatches(crewId) }),
        queryClient.invalidateQueries({ queryKey: journalKeys.allWeighIns(crewId) }),
      ]),
  });
}
