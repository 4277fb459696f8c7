// Stops (visits) on a competition day: where the angler fished, from when to when.

/** A stop on a competition day: at a find, or at a position with no find ("no find"). */
export interface StopView {
  id: string;
  eventId: string;
  competitionDayId: string;
  competitionDate: string;
  /** null = no find: the stop is at `lat`/`lon`. */
  findId: string | null;
  findName: string | null;
  /** Hidden (null) from viewers when the crew hides positions. */
  lat: number | null;
  lon: number | null;
  /** ISO-8601 instants. `leftAt` is null while the angler is still there. */
  arrivedAt: string;
  leftAt: string | null;
  /** Whole minutes from arrival to leaving; null while still there. */
  minutes: number | null;
  waterTempF: number | null;
  /** Defaults for the stop's catches (each catch keeps its own). */
  lure: string;
  technique: string;
  notes: string;
  /** The crew member who logged the stop (its angler). */
  loggedBy: { userId: string; displayName: string } | null;
  /** Catches whose time lies in the stop's span. */
  catchIds: string[];
  /** Those of `catchIds` with a position farther than the attribution radius from the stop's find: to check. */
  catchesToCheck: { catchId: string; distanceM: number }[];
  version: number;
}

export interface LogStopRequest {
  /** A client-made id (UUID v7, RFC 9562), so a stop started offline keeps its id; the server makes one when omitted. */
  id?: string;
  competitionDayId: string;
  findId?: string | null;
  lat?: number | null;
  lon?: number | null;
  /** "HH:MM" lake-local on the day, or an ISO-8601 instant with a zone. */
  arrivedAt: string;
  leftAt?: string | null;
  waterTempF?: number | null;
  lure?: string;
  technique?: string;
  notes?: string;
}

export type UpdateStopRequest = Partial<Omit<LogStopRequest, 'id' | 'competitionDayId'>> & { version: number };

/** What deleting a stop did: its catches stay, no longer in any stop. */
export interface StopDeletedView {
  id: string;
  unattachedCatchIds: string[];
  message: string;
}
