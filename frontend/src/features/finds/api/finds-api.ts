import type {
  BulkDeleteFindsResult,
  BulkUpdateFindsResult,
  FindKind,
  FoundHow,
  HardnessGrade,
  VegetationDensity,
} from '@shoalbook/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { v7 as uuidv7 } from 'uuid';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys, queryString } from '../../../lib/journal-keys';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import { sendFromForm, versionOnceSent, type FormSendResult } from '../../../lib/send-queue';
import type { FindWithSky } from '../../../lib/journal-types';
import type { DepthEntry, TemperatureEntry } from '../../../lib/units';

/** Body of POST /finds and PATCH /finds/:findId; depth and temperature go as typed, with their unit. */
export interface FindInput {
  lakeId: string;
  eventId: string | null;
  practiceDate: string | null;
  name: string;
  markedAt: string | null;
  lat: number;
  lon: number;
  depth: DepthEntry | null;
  kind: FindKind;
  subKind: string;
  hardness: HardnessGrade | null;
  vegetationDensity: VegetationDensity | null;
  baitSeen: boolean;
  fishMarked: number | null;
  frequencyKhz: number | null;
  foundHow: FoundHow | null;
  waterTemp: TemperatureEntry | null;
  notes: string;
  photoId: string | null;
}

const findPath = (crewId: string, findId: string) => crewApiPath(crewId, `/finds/${encodeURIComponent(findId)}`);

export const findsQuery = (crewId: string, filter: { lakeId?: string; eventId?: string } = {}) =>
  queryOptions({
    queryKey: journalKeys.finds(crewId, filter),
    queryFn: () => api.get<FindWithSky[]>(crewApiPath(crewId, `/finds${queryString(filter)}`)),
  });

export function useFinds(crewId: string, filter: { lakeId?: string; eventId?: string } = {}) {
  return useQuery(findsQuery(crewId, filter));
}

export function useFind(crewId: string, findId: string | undefined) {
  return useQuery({
    queryKey: journalKeys.find(crewId, findId ?? ''),
    queryFn: () => api.get<FindWithSky>(findPath(crewId, findId!)),
    enabled: Boolean(findId),
  });
}

/**
 * Mark a find or save changes to one through the send queue (marking happens on the water, often without
 * signal): the server's answer when it has it at once, else 'waiting' while the phone keeps the write. A new
 * find gets its id here (UUID v7). The queue refreshes the lists again when a waiting write is sent.
 */
export function useSaveFind(userId: string, crewId: string, findId?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    // The lake of a find is fixed once recorded; a PATCH carries the version it is based on (409 when stale),
    // counting the changes to it still waiting on this phone.
    mutationFn: async ({
      version,
      ...input
    }: FindInput & { version?: number }): Promise<FormSendResult<FindWithSky>> => {
      const id = findId ?? uuidv7();
      const { lakeId: _fixed, ...changes } = input;
      const basedOn = findId ? await versionOnceSent({ userId, kind: 'find', recordId: findId }, version) : undefined;
      return sendFromForm<FindWithSky>({
        userId,
        crewId,
        kind: 'find',
        method: findId ? 'PATCH' : 'POST',
        path: findId ? findPath(crewId, findId) : crewApiPath(crewId, '/finds'),
        body: findId ? { ...changes, version: basedOn } : { ...input, id },
        recordId: id,
        label: findId ? `Changes to the find ${input.name}` : `New find ${input.name}`,
        scope: input.lakeId,
      });
    },
    onSuccess: (result) => {
      if (result.kind !== 'sent') return;
      queryClient.setQueryData(journalKeys.find(crewId, result.answer.id), result.answer);
      return refreshCrewJournal(queryClient, crewId);
    },
  });
}

export function useDeleteFind(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (findId: string) => api.delete(findPath(crewId, findId)),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}

// Photos are shared with the catch forms, so they live in lib; re-exported for the find screens.
export { photoUrl, uploadPhoto } from '../../../lib/photos';

/** Changes for POST /finds/bulk-update: a kind (with its sub-kind), an event (null: none), or both. */
export interface BulkFindChanges {
  kind?: FindKind;
  subKind?: string;
  eventId?: string | null;
}

/** A bulk change touches finds, their catches and stops, and every report: the crew's cached data is refetched. */
export function useBulkUpdateFinds(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ findIds, ...changes }: BulkFindChanges & { findIds: string[] }) =>
      api.post<BulkUpdateFindsResult>(crewApiPath(crewId, '/finds/bulk-update'), { findIds, ...changes }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: journalKeys.crew(crewId) }),
  });
}

export function useBulkDeleteFinds(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (findIds: string[]) =>
      api.post<BulkDeleteFindsResult>(crewApiPath(crewId, '/finds/bulk-delete'), { findIds }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: journalKeys.crew(crewId) }),
  });
}
