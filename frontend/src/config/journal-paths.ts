/**
 * URLs of the crew journal, defined once (the foundation's paths.ts holds the rest). Route definitions use
 * `path` (relative to /crews/:crewId), links call `href(...)`.
 */
const crew = (crewId: string) => `/crews/${encodeURIComponent(crewId)}`;
const id = encodeURIComponent;

export const journalPaths = {
  lakes: { path: 'lakes', href: (crewId: string) => `${crew(crewId)}/lakes` },
  newLake: { path: 'lakes/new', href: (crewId: string) => `${crew(crewId)}/lakes/new` },
  lake: { path: 'lakes/:lakeId', href: (crewId: string, lakeId: string) => `${crew(crewId)}/lakes/${id(lakeId)}` },
  editLake: {
    path: 'lakes/:lakeId/edit',
    href: (crewId: string, lakeId: string) => `${crew(crewId)}/lakes/${id(lakeId)}/edit`,
  },
  events: { path: 'events', href: (crewId: string) => `${crew(crewId)}/events` },
  newEvent: {
    path: 'events/new',
    href: (crewId: string, lakeId?: string) => `${crew(crewId)}/events/new${lakeId ? `?lakeId=${id(lakeId)}` : ''}`,
  },
  event: {
    path: 'events/:eventId',
    href: (crewId: string, eventId: string, section?: EventSection) =>
      `${crew(crewId)}/events/${id(eventId)}${section && section !== 'overview' ? `?section=${section}` : ''}`,
  },
  editEvent: {
    path: 'events/:eventId/edit',
    href: (crewId: string, eventId: string) => `${crew(crewId)}/events/${id(eventId)}/edit`,
  },
  finds: { path: 'finds', href: (crewId: string) => `${crew(crewId)}/finds` },
  newFind: {
    path: 'finds/new',
    href: (crewId: string, params: { lakeId?: string; eventId?: string } = {}) => {
      const q = new URLSearchParams(Object.entries(params).filter(([, v]) => v) as [string, string][]).toString();
      return `${crew(crewId)}/finds/new${q ? `?${q}` : ''}`;
    },
  },
  find: { path: 'finds/:findId', href: (crewId: string, findId: string) => `${crew(crewId)}/finds/${id(findId)}` },
  editFind: {
    path: 'finds/:findId/edit',
    href: (crewId: string, findId: string) => `${crew(crewId)}/finds/${id(findId)}/edit`,
  },
  catches: { path: 'catches', href: (crewId: string) => `${crew(crewId)}/catches` },
  catch: {
    path: 'catches/:catchId',
    href: (crewId: string, catchId: string) => `${crew(crewId)}/catches/${id(catchId)}`,
  },
  import: {
    path: 'import',
    href: (crewId: string, params: { kind?: 'gpx' | 'csv'; lakeId?: string; eventId?: string } = {}) => {
      const q = new URLSearchParams(Object.entries(params).filter(([, v]) => v) as [string, string][]).toString();
      return `${crew(crewId)}/import${q ? `?${q}` : ''}`;
    },
  },
} as const;

export const EVENT_SECTIONS = ['overview', 'finds', 'days', 'weigh-ins'] as const;
export type EventSection = (typeof EVENT_SECTIONS)[number];
