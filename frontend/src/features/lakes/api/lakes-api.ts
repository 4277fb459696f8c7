import type { LakeView } from '@shoalbook/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys } from '../../../lib/journal-keys';
import { refreshCrewJournal } from '../../../lib/crew-cache';

/** Body of POST /lakes and PATCH /lakes/:lakeId (contract: positions WGS84 decimal degrees, area in acres). */
export interface LakeInput {
  name: string;
  region: string;
  timeZone: string;
  lat: number;
  lon: number;
  areaAcres: number | null;
  notes: string;
}

export const lakesQuery = (crewId: string) =>
  queryOptions({
    queryKey: journalKeys.lakes(crewId),
    queryFn: () => api.get<LakeView[]>(crewApiPath(crewId, '/lakes')),
  });

export const lakeQuery = (crewId: string, lakeId: string) =>
  queryOptions({
    queryKey: journalKeys.lake(crewId, lakeId),
    queryFn: () => api.get<LakeView>(crewApiPath(crewId, `/lakes/${encodeURIComponent(lakeId)}`)),
  });

export function useLakes(crewId: string) {
  return useQuery(lakesQuery(crewId));
}

export function useLake(crewId: string, lakeId: string | undefined) {
  return useQuery({ ...lakeQuery(crewId, lakeId ?? ''), enabled: Boolean(lakeId) });
}

export function useSaveLake(crewId: string, lakeId?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    // A PATCH carries the version it was based on: a change made meanwhile elsewhere answers 409 instead of being overwritten.
    mutationFn: ({ version, ...input }: LakeInput & { version?: number }) =>
      lakeId
        ? api.patch<LakeView>(crewApiPath(crewId, `/lakes/${encodeURIComponent(lakeId)}`), { ...input, version })
        : api.post<LakeView>(crewApiPath(crewId, '/lakes'), input),
    onSuccess: (lake) => {
      queryClient.setQueryData(journalKeys.lake(crewId, lake.id), lake);
      return refreshCrewJournal(queryClient, crewId);
    },
  });
}

export function useDeleteLake(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (lakeId: string) => api.delete(crewApiPath(crewId, `/lakes/${encodeURIComponent(lakeId)}`)),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}
