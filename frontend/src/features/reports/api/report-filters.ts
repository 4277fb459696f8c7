import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { Season } from './report-types';

/**
 * The filters every report shares, kept in the URL query string so a report can be bookmarked, shared
 * with the crew and reloaded as it was. Unknown or malformed values are dropped, never sent on.
 */
export interface ReportFilters {
  lakeId?: string;
  eventId?: string;
  season?: Season;
  year?: number;
  /** Competition dates, YYYY-MM-DD. */
  from?: string;
  to?: string;
}

export const FILTER_KEYS = ['lakeId', 'eventId', 'season', 'year', 'from', 'to'] as const;
export const SEASONS: readonly Season[] = ['spring', 'summer', 'fall', 'winter'];
export const SEASON_LABELS: Record<Season, string> = {
  spring: 'Spring (Mar–May)',
  summer: 'Summer (Jun–Aug)',
  fall: 'Fall (Sep–Nov)',
  winter: 'Winter (Dec–Feb)',
};

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Read the filters from a query string, keeping only well-formed values. */
export function readFilters(params: URLSearchParams): ReportFilters {
  const filters: ReportFilters = {};
  const lakeId = params.get('lakeId');
  const eventId = params.get('eventId');
  const season = params.get('season');
  const year = params.get('year');
  const from = params.get('from');
  const to = params.get('to');
  if (lakeId) filters.lakeId = lakeId;
  if (eventId) filters.eventId = eventId;
  if (season && (SEASONS as readonly string[]).includes(season)) filters.season = season as Season;
  if (year && /^\d{4}$/.test(year)) filters.year = Number(year);
  if (from && ISO_DATE.test(from)) filters.from = from;
  if (to && ISO_DATE.test(to)) filters.to = to;
  return filters;
}

/** The filters as query parameters for the API (only the ones set). */
export function filterParams(filters: ReportFilters): Record<string, string> {
  const out: Record<string, string> = {};
  for (const key of FILTER_KEYS) {
    const value = filters[key];
    if (value !== undefined && value !== '') out[key] = String(value);
  }
  return out;
}

/** "?lakeId=…&season=…" (or "") to carry the filters onto another report's link. */
export function filterQuery(filters: ReportFilters, extra: Record<string, string | undefined> = {}): string {
  const params = new URLSearchParams(filterParams(filters));
  for (const [key, value] of Object.entries(extra)) if (value) params.set(key, value);
  const text = params.toString();
  return text ? `?${text}` : '';
}

/**
 * The filters of the current URL and a setter that merges a change into the query string (other
 * parameters such as the grouping stay). Choosing another lake drops the event, which belongs to a lake.
 */
export function useReportFilters() {
  const [params, setParams] = useSearchParams();
  const filters = useMemo(() => readFilters(params), [params]);
  const setFilters = useCallback(
    (change: Partial<Record<keyof ReportFilters, string | number | undefined>>) => {
      setParams(
        (current) => {
          const next = new URLSearchParams(current);
          if ('lakeId' in change && change.lakeId !== current.get('lakeId')) next.delete('eventId');
          for (const [key, value] of Object.entries(change)) {
            if (value === undefined || value === '') next.delete(key);
            else next.set(key, String(value));
          }
          return next;
        },
        { replace: true },
      );
    },
    [setParams],
  );
  const clearFilters = useCallback(() => {
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        for (const key of FILTER_KEYS) next.delete(key);
        return next;
      },
      { replace: true },
    );
  }, [setParams]);
  return { filters, setFilters, clearFilters, params };
}
