import type { EventRules, EventTally, FieldContext, EventView, RampPosition } from '@shoalbook/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { crewApiPath, journalKeys, queryString } from '../../../lib/journal-keys';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import type { CompetitionDayView, PracticeDayView } from '../../../lib/journal-types';
import type { TemperatureEntry } from '../../../lib/units';

/** Body of POST /events and PATCH /events/:eventId. Rules in storage units (lb, in). */
export interface EventInput {
  lakeId: string;
  name: string;
  organiser: string;
  practiceDates: string[];
  competitionDates: string[];
  rules: EventRules;
  entryFee: number | null;
  payout: number | null;
  finalPlace: number | null;
  field: FieldContext;
  /** The launch and check-in ramp; null clears it. */
  ramp: RampPosition | null;
  notes: string;
}

const eventPath = (crewId: string, eventId: string, rest = '') =>
  crewApiPath(crewId, `/events/${encodeURIComponent(eventId)}${rest}`);

export const eventsQuery = (crewId: string, lakeId?: string) =>
  queryOptions({
    queryKey: journalKeys.events(crewId, lakeId),
    queryFn: () => api.get<EventView[]>(crewApiPath(crewId, `/events${queryString({ lakeId })}`)),
  });

export const eventQuery = (crewId: string, eventId: string) =>
  queryOptions({
    queryKey: journalKeys.event(crewId, eventId),
    queryFn: () => api.get<EventView>(eventPath(crewId, eventId)),
  });

/** Fish caught and counted and the total weight of each event (GET /event-tallies), by event id. */
export function useEventTallies(crewId: string, lakeId?: string) {
  return useQuery({
    queryKey: journalKeys.eventTallies(crewId, lakeId),
    queryFn: () => api.get<EventTally[]>(crewApiPath(crewId, `/event-tallies${queryString({ lakeId })}`)),
    select: (tallies) => new Map(tallies.map((t) => [t.eventId, t])),
  });
}

export function useEvents(crewId: string, lakeId?: string) {
  return useQuery(eventsQuery(crewId, lakeId));
}

export function useEvent(crewId: string, eventId: string | undefined) {
  return useQuery({ ...eventQuery(crewId, eventId ?? ''), enabled: Boolean(eventId) });
}

/** Practice and competition days of an event (created by the server from the event's dates). */
export function useEventDays(crewId: string, eventId: string) {
  return useQuery({
    queryKey: journalKeys.days(crewId, eventId),
    queryFn: async () => {
      const [practice, competition] = await Promise.all([
        api.get<PracticeDayView[]>(eventPath(crewId, eventId, '/practice-days')),
        api.get<CompetitionDayView[]>(eventPath(crewId, eventId, '/competition-days')),
      ]);
      return { practice, competition };
    },
  });
}

export function useSaveEvent(crewId: string, eventId?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    // The lake of an event is fixed once created; a PATCH carries the version it was based on (409 when stale).
    mutationFn: ({ version, ...input }: EventInput & { version?: number }) => {
      if (!eventId) return api.post<EventView>(crewApiPath(crewId, '/events'), input);
      const { lakeId: _fixed, ...changes } = input;
      return api.patch<EventView>(eventPath(crewId, eventId), { ...changes, version });
    },
    onSuccess: async (event) => {
      queryClient.setQueryData(journalKeys.event(crewId, event.id), event);
      await refreshCrewJournal(queryClient, crewId);
    },
  });
}

export function useDeleteEvent(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (eventId: string) => api.delete(eventPath(crewId, eventId)),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}

/** PATCH /competition-days/:dayId: start and check-in clock times, weather, water temperature (°F). */
export function useUpdateCompetitionDay(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      dayId,
      ...body
    }: {
      dayId: string;
      version: number;
      startTime?: string | null;
      checkInTime?: string | null;
      weatherNotes?: string;
      waterTemp?: TemperatureEntry | null;
    }) => api.patch<CompetitionDayView>(crewApiPath(crewId, `/competition-days/${encodeURIComponent(dayId)}`), body),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}

/** PATCH /practice-days/:dayId: the day's notes and water temperature (as typed, with its unit); 409 when the version is stale. */
export function useUpdatePracticeDay(crewId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      dayId,
      ...body
    }: {
      dayId: string;
      version: number;
      notes?: string;
      waterTemp?: TemperatureEntry | null;
    }) => api.patch<PracticeDayView>(crewApiPath(crewId, `/practice-days/${encodeURIComponent(dayId)}`), body),
    onSuccess: () => refreshCrewJournal(queryClient, crewId),
  });
}
