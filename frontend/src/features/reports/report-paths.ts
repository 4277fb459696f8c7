/**
 * URLs of the reports, defined once. `path` is relative to /crews/:crewId (route definitions), `href`
 * builds a link; `query` carries the report filters over ("?lakeId=…").
 */
const crew = (crewId: string) => `/crews/${encodeURIComponent(crewId)}/reports`;
const id = encodeURIComponent;

export const reportPaths = {
  home: { path: 'reports', href: (crewId: string, query = '') => `${crew(crewId)}${query}` },
  hitRates: { path: 'hit-rates', href: (crewId: string, query = '') => `${crew(crewId)}/hit-rates${query}` },
  lakeComparison: {
    path: 'lake-comparison',
    href: (crewId: string, query = '') => `${crew(crewId)}/lake-comparison${query}`,
  },
  events: { path: 'events', href: (crewId: string, query = '') => `${crew(crewId)}/events${query}` },
  recap: {
    path: 'events/:eventId',
    href: (crewId: string, eventId: string, query = '') => `${crew(crewId)}/events/${id(eventId)}${query}`,
  },
  eventFinds: {
    path: 'events/:eventId/finds',
    href: (crewId: string, eventId: string, query = '') => `${crew(crewId)}/events/${id(eventId)}/finds${query}`,
  },
  timing: { path: 'timing', href: (crewId: string, query = '') => `${crew(crewId)}/timing${query}` },
  map: { path: 'map', href: (crewId: string, query = '') => `${crew(crewId)}/map${query}` },
} as const;

/** A find of the journal (the journal's own screen). */
export const findHref = (crewId: string, findId: string) => `/crews/${id(crewId)}/finds/${id(findId)}`;
/** Where finds and catches are entered, for empty states. */
export const journalHref = {
  lakes: (crewId: string) => `/crews/${id(crewId)}/lakes`,
  events: (crewId: string) => `/crews/${id(crewId)}/events`,
  finds: (crewId: string) => `/crews/${id(crewId)}/finds`,
  catches: (crewId: string) => `/crews/${id(crewId)}/catches`,
  event: (crewId: string, eventId: string) => `/crews/${id(crewId)}/events/${id(eventId)}`,
};
