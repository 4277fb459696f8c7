import type { EventView, LakeView, MemberView } from '@shoalbook/shared';
import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys, queryString } from '../../../lib/journal-keys';
import { filterParams, type ReportFilters } from './report-filters';
import type {
  EventFindsReport,
  EventRecap,
  FindMapReport,
  HitRateGrouping,
  HitRatesReport,
  LakeComparisonReport,
  TimingReport,
} from './report-types';

/** Every report key starts with the crew, so leaving a crew drops its reports with the rest of its data. */
export const reportKeys = {
  all: (crewId: string) => ['crew', crewId, 'reports'] as const,
  report: (crewId: string, name: string, params: Record<string, string>) =>
    ['crew', crewId, 'reports', name, params] as const,
};

const reportPath = (crewId: string, rest: string) => crewApiPath(crewId, `/reports/${rest}`);
const id = encodeURIComponent;

function reportQuery<T>(crewId: string, name: string, route: string, params: Record<string, string>) {
  return queryOptions({
    queryKey: reportKeys.report(crewId, name, params),
    queryFn: ({ signal }) => api.get<T>(reportPath(crewId, `${route}${queryString(params)}`), { signal }),
  });
}

/** GET reports/hit-rates?by=… with the common filters. */
export function useHitRates(crewId: string, by: HitRateGrouping, filters: ReportFilters) {
  return useQuery(reportQuery<HitRatesReport>(crewId, 'hit-rates', 'hit-rates', { ...filterParams(filters), by }));
}

/** GET reports/lake-comparison?lakeId=…&by=…; waits until a lake is chosen. */
export function useLakeComparison(crewId: string, by: HitRateGrouping, filters: ReportFilters) {
  const params = { ...filterParams(filters), by };
  return useQuery({
    ...reportQuery<LakeComparisonReport>(crewId, 'lake-comparison', 'lake-comparison', params),
    enabled: Boolean(filters.lakeId),
  });
}

/** GET reports/events/:eventId/recap. */
export function useEventRecap(crewId: string, eventId: string) {
  return useQuery(reportQuery<EventRecap>(crewId, 'recap', `events/${id(eventId)}/recap`, {}));
}

/** GET reports/events/:eventId/finds: every find of the event with its outcome. */
export function useEventFinds(crewId: string, eventId: string) {
  return useQuery(reportQuery<EventFindsReport>(crewId, 'event-finds', `events/${id(eventId)}/finds`, {}));
}

/** GET reports/timing with the common filters. */
export function useTiming(crewId: string, filters: ReportFilters) {
  return useQuery(reportQuery<TimingReport>(crewId, 'timing', 'timing', filterParams(filters)));
}

/** GET reports/find-map?lakeId=…&eventId=…; waits until a lake is chosen. */
export function useFindMap(crewId: string, filters: ReportFilters) {
  const params: Record<string, string> = {};
  if (filters.lakeId) params.lakeId = filters.lakeId;
  if (filters.eventId) params.eventId = filters.eventId;
  return useQuery({
    ...reportQuery<FindMapReport>(crewId, 'find-map', 'find-map', params),
    enabled: Boolean(filters.lakeId),
  });
}

/** POST reports/events/:eventId/recap-email (owners and anglers): 202 { sent }. */
export function useSendRecap(crewId: string, eventId: string) {
  return useMutation({
    mutationFn: (userIds: string[]) =>
      api.post<{ sent: number }>(reportPath(crewId, `events/${id(eventId)}/recap-email`), { userIds }),
  });
}

/** The crew's lakes for the filter bar; same cache entry as the journal's lake list. */
export function useReportLakes(crewId: string) {
  return useQuery(
    queryOptions({
      queryKey: journalKeys.lakes(crewId),
      queryFn: () => api.get<LakeView[]>(crewApiPath(crewId, '/lakes')),
    }),
  );
}

/** The crew's events (of one lake when given); same cache entry as the journal's event list. */
export function useReportEvents(crewId: string, lakeId?: string) {
  return useQuery(
    queryOptions({
      queryKey: journalKeys.events(crewId, lakeId),
      queryFn: () => api.get<EventView[]>(crewApiPath(crewId, `/events${queryString({ lakeId })}`)),
    }),
  );
}

/** Crew members, to choose who receives a recap (GET /crews/:crewId/members, any member). */
export function useRecapRecipients(crewId: string, enabled: boolean) {
  return useQuery({
    queryKey: ['crews', crewId, 'members'],
    queryFn: () => api.get<MemberView[]>(crewApiPath(crewId, '/members')),
    enabled,
  });
}
