import { clockTime, localBoundOn } from '@shoalbook/shared';

/** What the timeline needs of a stop and of a catch (times are ISO instants). */
export interface TimelineStop {
  id: string;
  label: string;
  arrivedAt: string;
  /** null: still there; the span runs to `now` (or to the window's end). */
  leftAt: string | null;
  anglerId: string | null;
  anglerName: string | null;
  toCheck: number;
}
export interface TimelineCatch {
  id: string;
  caughtAt: string;
  label: string;
  /** The stop whose span holds the catch, or null (in no stop). */
  stopId: string | null;
  toCheck: boolean;
}

export interface TimelineModel {
  startMs: number;
  endMs: number;
  /** Whole lake-clock hours inside the window, as fractions 0–1 of its width. */
  ticks: { at: number; label: string }[];
  /** One lane per angler who logged stops (one lane when nobody did). */
  lanes: {
    anglerId: string | null;
    name: string | null;
    stops: (TimelineStop & { x0: number; x1: number; open: boolean })[];
  }[];
  catches: (TimelineCatch & { x: number })[];
}

const HOUR = 3_600_000;
const QUARTER = 15 * 60_000;

/**
 * Where an open stop's span ends on the drawing: now, while the day is on; for a day already over (logged
 * afterwards, or "left" never pressed) the last thing logged after arriving, and at least a quarter hour, so
 * it does not claim the rest of the day.
 */
function openEndOf(stop: TimelineStop, times: number[], nowMs: number, endMs: number): number {
  const arrived = Date.parse(stop.arrivedAt);
  if (nowMs >= arrived && nowMs <= endMs) return nowMs;
  const later = times.filter((t) => t > arrived);
  return Math.min(endMs, Math.max(arrived + QUARTER, ...later));
}

/**
 * Lays out one competition day: the window runs from the day's start (or the first stop or catch, on the
 * hour before it) to check-in (or the last one, on the hour after it), so nothing logged falls off the
 * edge. Positions are fractions of the window, so the drawing scales to any width.
 */
export function layoutDay(
  day: { date: string; startTime: string | null; checkInTime: string | null },
  timeZone: string,
  stops: TimelineStop[],
  catches: TimelineCatch[],
  now: Date,
): TimelineModel {
  const nowMs = now.getTime();
  const times = [
    ...stops.flatMap((s) => [Date.parse(s.arrivedAt), s.leftAt ? Date.parse(s.leftAt) : null]),
    ...catches.map((c) => Date.parse(c.caughtAt)),
  ].filter((t): t is number => t !== null && Number.isFinite(t));
  // An open stop runs to now while the day is on (now within half a day of the last thing logged).
  const latest = times.length ? Math.max(...times) : -Infinity;
  const openEnd = stops
    .filter((s) => !s.leftAt)
    .flatMap((s) => [
      Date.parse(s.arrivedAt) + QUARTER,
      ...(nowMs >= latest && nowMs - latest < 12 * HOUR ? [nowMs] : []),
    ]);
  const dayStart = day.startTime ? localBoundOn(day.date, day.startTime, timeZone).getTime() : null;
  const dayEnd = day.checkInTime ? localBoundOn(day.date, day.checkInTime, timeZone).getTime() : null;
  const fallbackStart = localBoundOn(day.date, '06:00', timeZone).getTime();
  const fallbackEnd = localBoundOn(day.date, '15:00', timeZone).getTime();
  let startMs = Math.min(dayStart ?? Infinity, ...times.map((t) => Math.floor(t / HOUR) * HOUR));
  if (!Number.isFinite(startMs)) startMs = fallbackStart;
  // Never past the day's check-in when there is one.
  const lastTimes = [...times, ...openEnd.filter((t) => dayEnd === null || t < dayEnd)];
  let endMs = Math.max(dayEnd ?? -Infinity, ...lastTimes.map((t) => Math.ceil(t / HOUR) * HOUR));
  if (!Number.isFinite(endMs) || endMs <= startMs) endMs = Math.max(fallbackEnd, startMs + HOUR);

  const span = endMs - startMs;
  const at = (ms: number) => Math.min(1, Math.max(0, (ms - startMs) / span));
  // The first full hour of the lake's clock (zones a half or quarter hour off UTC included), then hourly.
  let first = Math.ceil(startMs / (15 * 60_000)) * 15 * 60_000;
  while (first <= endMs && !clockTime(new Date(first), timeZone).endsWith(':00')) first += 15 * 60_000;
  const ticks: TimelineModel['ticks'] = [];
  for (let t = first; t <= endMs; t += HOUR) ticks.push({ at: at(t), label: clockTime(new Date(t), timeZone) });

  const laneOf = new Map<string, TimelineModel['lanes'][number]>();
  for (const s of stops) {
    const key = s.anglerId ?? '';
    if (!laneOf.has(key)) laneOf.set(key, { anglerId: s.anglerId, name: s.anglerName, stops: [] });
    const end = s.leftAt ? Date.parse(s.leftAt) : openEndOf(s, times, nowMs, endMs);
    laneOf.get(key)!.stops.push({ ...s, x0: at(Date.parse(s.arrivedAt)), x1: at(end), open: !s.leftAt });
  }
  const lanes = laneOf.size ? [...laneOf.values()] : [{ anglerId: null, name: null, stops: [] }];
  return {
    startMs,
    endMs,
    ticks,
    lanes,
    catches: catches.map((c) => ({ ...c, x: at(Date.parse(c.caughtAt)) })),
  };
}
