import type { CreateCrewRequest, CrewView, UpdateCrewRequest } from '@shoalbook/shared';
import { queryOptions } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

const crewPath = (crewId: string) => `/crews/${encodeURIComponent(crewId)}`;

/** GET /api/crews: the crews the signed-in person belongs to, with their own role in each. */
export const crewsQuery = queryOptions({
  queryKey: ['crews'],
  queryFn: () => api.get<CrewView[]>('/crews'),
});

/** GET /api/crews/:crewId (404 for anyone outside the crew). */
export const crewQuery = (crewId: string) =>
  queryOptions({
    queryKey: ['crews', crewId],
    queryFn: () => api.get<CrewView>(crewPath(crewId)),
  });

/** POST /api/crews: the caller becomes its owner. */
export function createCrew(body: CreateCrewRequest): Promise<CrewView> {
  return api.post<CrewView>('/crews', body);
}

/** PATCH /api/crews/:crewId (owners only). */
export function updateCrew(crewId: string, body: UpdateCrewRequest): Promise<CrewView> {
  return api.patch<CrewView>(crewPath(crewId), body);
}

/** DELETE /api/crews/:crewId/members/:userId for oneself: leave the crew (refused for the last owner). */
export function leaveCrew(crewId: string, ownUserId: string): Promise<void> {
  return api.delete(`${crewPath(crewId)}/members/${encodeURIComponent(ownUserId)}`);
}
