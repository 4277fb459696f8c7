import { distanceM, type LatLon } from '@shoalbook/analytics';
import { localBoundOn, type CompetitionDayView } from '@shoalbook/shared';

/** When the day's check-in falls, on the lake's clock; null when no check-in time was given. */
export function checkInAt(day: Pick<CompetitionDayView, 'date' | 'checkInTime'>, timeZone: string): Date | null {
  return day.checkInTime ? localBoundOn(day.date, day.checkInTime, timeZone) : null;
}

export interface RunBack {
  /** Straight-line (great-circle) distance from the boat to the ramp. */
  distanceM: number;
  /** That distance at cruising speed. */
  runSeconds: number;
  /** The last whole minute to start back and still reach the ramp by check-in. */
  leaveBy: Date;
}

/**
 * The run back to the ramp in a straight line at cruising speed. The way by water is never shorter, so this is the
 * latest possible start, not a safe one: the screen says to leave earlier.
 */
export function runBack(from: LatLon, ramp: LatLon, speedMps: number, checkIn: Date): RunBack {
  if (!(speedMps > 0) || !Number.isFinite(speedMps)) throw new RangeError(`speed must be above 0 m/s, got ${speedMps}`);
  const d = distanceM(from, ramp);
  const runSeconds = d / speedMps;
  // Down to the minute: a few seconds early is the safe side.
  const leaveBy = new Date(Math.floor((checkIn.getTime() - runSeconds * 1000) / 60_000) * 60_000);
  return { distanceM: d, runSeconds, leaveBy };
}

/** "2 h 05 min", "14 min", "under a minute": whole minutes, rounded down, so it never promises time there is not. */
export function durationText(ms: number): string {
  const minutes = Math.floor(ms / 60_000);
  if (minutes < 1) return 'under a minute';
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return h ? `${h} h ${String(m).padStart(2, '0')} min` : `${m} min`;
}

/** A run's length in whole minutes, rounded up (a run never takes less than it says). */
export function runMinutes(runSeconds: number): number {
  return Math.max(1, Math.ceil(runSeconds / 60));
}
