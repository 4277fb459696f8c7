import { distanceM } from '@shoalbook/analytics';
import { DEFAULT_ATTRIBUTION_RADIUS_M } from '@shoalbook/shared';

/** What attributing catches to stops reads of a stop: its span, and its find's position when it has one. */
export interface SpanOfStop {
  id: string;
  arrivedAt: Date;
  /** null while the angler is still there: the span is open-ended. */
  leftAt: Date | null;
  find: { lat: number; lon: number } | null;
}

export interface CatchToAttribute {
  id: string;
  caughtAt: Date;
  lat: number | null;
  lon: number | null;
}

export interface StopCatches {
  catchIds: string[];
  catchesToCheck: { catchId: string; distanceM: number }[];
}

/** Does the stop's span hold the instant? Arrival included, leaving excluded, so back-to-back stops share no instant. */
export function spanHolds(stop: Pick<SpanOfStop, 'arrivedAt' | 'leftAt'>, at: Date): boolean {
  return at >= stop.arrivedAt && (stop.leftAt === null || at < stop.leftAt);
}

/**
 * Catches by the stop whose span holds their time (stops of one angler never overlap, so there is at most one; the
 * earliest arrival wins should two anglers' stops both hold it). A catch with a position farther than `radiusM`
 * from the stop's find stays in the stop and is listed to check: the time says it was caught there, the position
 * disagrees, and only the angler knows which is wrong.
 */
export function attributeCatches(
  stops: readonly SpanOfStop[],
  catches: readonly CatchToAttribute[],
  radiusM: number = DEFAULT_ATTRIBUTION_RADIUS_M,
): { byStop: Map<string, StopCatches>; unattached: string[] } {
  const ordered = [...stops].sort((a, b) => a.arrivedAt.getTime() - b.arrivedAt.getTime() || (a.id < b.id ? -1 : 1));
  const byStop = new Map<string, StopCatches>(ordered.map((s) => [s.id, { catchIds: [], catchesToCheck: [] }]));
  const unattached: string[] = [];
  for (const c of catches) {
    const stop = ordered.find((s) => spanHolds(s, c.caughtAt));
    if (!stop) {
      unattached.push(c.id);
      continue;
    }
    const entry = byStop.get(stop.id)!;
    entry.catchIds.push(c.id);
    if (stop.find && c.lat !== null && c.lon !== null) {
      const d = distanceM({ lat: c.lat, lon: c.lon }, stop.find);
      if (d > radiusM) entry.catchesToCheck.push({ catchId: c.id, distanceM: Math.round(d * 10) / 10 });
    }
  }
  return { byStop, unattached };
}

/** Do two spans share an instant? An open span runs on without end; touching ends (left 09:00, arrived 09:00) do not overlap. */
export function spansOverlap(
  a: Pick<SpanOfStop, 'arrivedAt' | 'leftAt'>,
  b: Pick<SpanOfStop, 'arrivedAt' | 'leftAt'>,
): boolean {
  const aEnd = a.leftAt?.getTime() ?? Infinity;
  const bEnd = b.leftAt?.getTime() ?? Infinity;
  return a.arrivedAt.getTime() < bEnd && b.arrivedAt.getTime() < aEnd;
}
