import type { FindView, LogStopRequest, StopView, UpdateStopRequest } from '@shoalbook/shared';
import { isHhMm, localTimeOn, parseInstant } from '@shoalbook/shared';
import type { SendEntry } from '../../../lib/device-db';

/** A stop as the day shows it: the server's, changed by what is still on this phone. */
export interface ShownStop extends StopView {
  /** Set while a write of this stop waits in the send queue, or was refused there ("needs you"). */
  onDevice: { state: SendEntry['state']; message: string | null } | null;
}

export interface WaitingStopsContext {
  crewId: string;
  day: { id: string; date: string; eventId: string };
  timeZone: string;
  finds: Pick<FindView, 'id' | 'name'>[];
  userId: string;
}

/** "HH:MM" on the day or an instant, as the server reads a stop's time; null when it cannot be read. */
function instantOf(value: string, ctx: WaitingStopsContext): string | null {
  const at = isHhMm(value) ? localTimeOn(ctx.day.date, value, ctx.timeZone) : parseInstant(value);
  return at ? at.toISOString() : null;
}

function withTimesAndPlace(stop: ShownStop, sent: Partial<LogStopRequest>, ctx: WaitingStopsContext): ShownStop {
  const next = { ...stop };
  if (sent.findId !== undefined) {
    next.findId = sent.findId;
    next.findName = sent.findId ? (ctx.finds.find((f) => f.id === sent.findId)?.name ?? null) : null;
  }
  if (sent.lat !== undefined) next.lat = sent.lat;
  if (sent.lon !== undefined) next.lon = sent.lon;
  if (sent.arrivedAt !== undefined) next.arrivedAt = instantOf(sent.arrivedAt, ctx) ?? next.arrivedAt;
  if (sent.leftAt !== undefined)
    next.leftAt = sent.leftAt === null ? null : (instantOf(sent.leftAt, ctx) ?? next.leftAt);
  if (sent.waterTempF !== undefined) next.waterTempF = sent.waterTempF;
  if (sent.lure !== undefined) next.lure = sent.lure;
  if (sent.technique !== undefined) next.technique = sent.technique;
  if (sent.notes !== undefined) next.notes = sent.notes;
  // Whole minutes, rounded, as the server counts them (StopsService.views).
  next.minutes = next.leftAt ? Math.round((Date.parse(next.leftAt) - Date.parse(next.arrivedAt)) / 60_000) : null;
  return next;
}

function marked(stop: ShownStop, entry: SendEntry): ShownStop['onDevice'] {
  // A refusal outweighs a wait: the angler has to act on it.
  if (stop.onDevice?.state === 'needs-you') return stop.onDevice;
  return { state: entry.state, message: entry.state === 'needs-you' ? (entry.lastError?.message ?? null) : null };
}

/**
 * The day's stops with the stop writes still in the send queue applied in their order: an arrival not yet sent
 * is a stop already (its id made on the phone), a "left" or an edit not yet sent shows its times. Each sent
 * change raises a stop's version by one (optimistic locking), so the version shown is the one the server will
 * have once the waiting changes are in: a further edit made offline carries that one and is not refused as
 * stale.
 */
export function withWaitingStops(stops: StopView[], entries: SendEntry[], ctx: WaitingStopsContext): ShownStop[] {
  const shown = new Map<string, ShownStop>(stops.map((s) => [s.id, { ...s, onDevice: null }]));
  const mine = entries
    .filter((e) => e.kind === 'stop' && e.crewId === ctx.crewId && e.scope === ctx.day.id && e.recordId)
    .sort((a, b) => (a.seq ?? 0) - (b.seq ?? 0));
  for (const entry of mine) {
    const id = entry.recordId!;
    if (entry.method === 'POST') {
      const sent = entry.body as LogStopRequest;
      const known = shown.get(id);
      if (known) {
        // The server has it (its answer was lost on the way): show the server's, still marked as on the phone.
        shown.set(id, { ...known, onDevice: marked(known, entry) });
        continue;
      }
      const arrivedAt = instantOf(sent.arrivedAt, ctx);
      if (!arrivedAt) continue;
      const fresh: ShownStop = {
        id,
        eventId: ctx.day.eventId,
        competitionDayId: ctx.day.id,
        competitionDate: ctx.day.date,
        findId: null,
        findName: null,
        lat: null,
        lon: null,
        arrivedAt,
        leftAt: null,
        minutes: null,
        waterTempF: null,
        lure: '',
        technique: '',
        notes: '',
        loggedBy: { userId: ctx.userId, displayName: 'you' },
        catchIds: [],
        catchesToCheck: [],
        version: 1,
        onDevice: null,
      };
      const stop = withTimesAndPlace(fresh, sent, ctx);
      shown.set(id, { ...stop, onDevice: marked(stop, entry) });
    } else if (entry.method === 'PATCH') {
      const stop = shown.get(id);
      if (!stop) continue;
      const { version: _version, ...changes } = entry.body as UpdateStopRequest;
      const changed = withTimesAndPlace(stop, changes, ctx);
      shown.set(id, { ...changed, version: stop.version + 1, onDevice: marked(stop, entry) });
    }
  }
  return [...shown.values()].sort((a, b) => Date.parse(a.arrivedAt) - Date.parse(b.arrivedAt));
}
