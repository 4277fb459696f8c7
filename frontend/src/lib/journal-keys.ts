/**
 * Query keys of the crew journal, in one place so that one feature's write can refresh another's lists
 * (a logged catch changes the weigh-in) without the features importing each other.
 * Every key starts with the crew, so leaving or switching a crew drops its data as one prefix.
 */
export const journalKeys = {
  crew: (crewId: string) => ['crew', crewId] as const,
  lakes: (crewId: string) => ['crew', crewId, 'lakes'] as const,
  lake: (crewId: string, lakeId: string) => ['crew', crewId, 'lakes', lakeId] as const,
  events: (crewId: string, lakeId?: string) => ['crew', crewId, 'events', { lakeId: lakeId ?? null }] as const,
  allEvents: (crewId: string) => ['crew', crewId, 'events'] as const,
  event: (crewId: string, eventId: string) => ['crew', crewId, 'event', eventId] as const,
  days: (crewId: string, eventId: string) => ['crew', crewId, 'event', eventId, 'days'] as const,
  finds: (crewId: string, filter: { lakeId?: string; eventId?: string } = {}) =>
    ['crew', crewId, 'finds', { lakeId: filter.lakeId ?? null, eventId: filter.eventId ?? null }] as const,
  allFinds: (crewId: string) => ['crew', crewId, 'finds'] as const,
  find: (crewId: string, findId: string) => ['crew', crewId, 'find', findId] as const,
  catches: (crewId: string, filter: { eventId?: string; competitionDayId?: string } = {}) =>
    [
      'crew',
      crewId,
      'catches',
      { eventId: filter.eventId ?? null, competitionDayId: filter.competitionDayId ?? null },
    ] as const,
  allCatches: (crewId: string) => ['crew', crewId, 'catches'] as const,
  weighIns: (crewId: string, eventId: string) => ['crew', crewId, 'weigh-ins', eventId] as const,
  allWeighIns: (crewId: string) => ['crew', crewId, 'weigh-ins'] as const,
  /** Under weigh-ins, so whatever refreshes the weigh-ins after a catch refreshes the events list's figures too. */
  eventTallies: (crewId: string, lakeId?: string) =>
    ['crew', crewId, 'weigh-ins', 'tallies', { lakeId: lakeId ?? null }] as const,
  stops: (crewId: string, competitionDayId: string) => ['crew', crewId, 'stops', { competitionDayId }] as const,
  allStops: (crewId: string) => ['crew', crewId, 'stops'] as const,
  sky: (crewId: string, lakeId: string, date: string) => ['crew', crewId, 'sky', lakeId, date] as const,
};

/** Path of a crew-scoped API route, with ids encoded. */
export function crewApiPath(crewId: string, rest: string): string {
  return `/crews/${encodeURIComponent(crewId)}${rest}`;
}

/** A query string from the defined values only ("?lakeId=…&eventId=…" or ""). */
export function queryString(params: Record<string, string | number | boolean | undefined | null>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params))
    if (value !== undefined && value !== null && value !== '') search.set(key, String(value));
  const text = search.toString();
  return text ? `?${text}` : '';
}

/**
 * How often a competition day's screen asks again while it is visible, so two members logging the same day see
 * each other's entries within seconds. TanStack Query pauses the interval while the page is hidden
 * (`refetchIntervalInBackground` stays false).
 */
export const LIVE_DAY_REFETCH_MS = 5_000;
