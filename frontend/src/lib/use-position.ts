import { useCallback, useState, useSyncExternalStore } from 'react';
import { isPositiveNumber, readDeviceSetting, writeDeviceSetting } from './device-setting';

/** A fix worse than this (the radius of the phone's 95 %-ish circle, in metres) is refused unless the angler widens it. */
export const DEFAULT_FIX_LIMIT_M = 30;
/** The angler's own limit stays on this device (metres). */
const FIX_LIMIT_KEY = 'shoalbook.fixLimitM';
/** How long the phone may look for a fix; a cold GPS in the open usually needs well under this (from memory). */
export const POSITION_TIMEOUT_MS = 20_000;

export interface PositionFix {
  lat: number;
  lon: number;
  /** The phone's own accuracy figure in metres (Geolocation API `coords.accuracy`). */
  accuracyM: number;
  /** When the phone took the fix (ms since the epoch). */
  at: number;
}

export type PositionStatus =
  | { kind: 'idle' }
  | { kind: 'locating' }
  | { kind: 'fix'; fix: PositionFix }
  | { kind: 'too-coarse'; accuracyM: number; limitM: number }
  | { kind: 'failed'; message: string };

export const NO_GEOLOCATION_MESSAGE = 'This browser gives no position: type it, or pick the find.';

/** What went wrong, in words an angler can act on (codes of the W3C Geolocation API's GeolocationPositionError). */
function failureMessage(error: GeolocationPositionError): string {
  if (error.code === 1)
    return 'Shoalbook may not use this phone’s position: allow location for this site in the browser’s settings, or type the position.';
  if (error.code === 3)
    return 'The phone found no fix in time: try again with a clear view of the sky, or type the position.';
  return 'The phone has no position right now: try again in a moment, or type the position.';
}

/** The coarsest fix the angler accepts on this device, in metres (30 m until changed). */
export function savedFixLimitM(): number {
  return readDeviceSetting(FIX_LIMIT_KEY, isPositiveNumber, DEFAULT_FIX_LIMIT_M);
}

export function saveFixLimitM(m: number): void {
  if (isPositiveNumber(m)) writeDeviceSetting(FIX_LIMIT_KEY, m);
}

export function geolocationSupported(): boolean {
  return typeof navigator !== 'undefined' && Boolean(navigator.geolocation);
}

// The last accepted fix, shared by every screen of the page (the check-in clock uses the one a form just took).
// It lives in memory only: a position is not kept on the device.
let lastFix: PositionFix | null = null;
const listeners = new Set<() => void>();
function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
function setLastFix(fix: PositionFix | null) {
  lastFix = fix;
  listeners.forEach((l) => l());
}

/** Forget the last fix (sign-out: the next person on this phone does not inherit it). */
export function forgetLastFix(): void {
  setLastFix(null);
}

/**
 * The phone's position on request, by the browser's Geolocation API with high accuracy and a time limit.
 * `locate(limitM)` resolves to the fix, or to null when there is none or it is coarser than `limitM` metres;
 * `status` says which, for the screen.
 */
export function usePosition() {
  const [status, setStatus] = useState<PositionStatus>({ kind: 'idle' });
  const last = useSyncExternalStore(subscribe, () => lastFix);
  const locate = useCallback(
    (limitM: number) =>
      new Promise<PositionFix | null>((resolve) => {
        if (!geolocationSupported()) {
          setStatus({ kind: 'failed', message: NO_GEOLOCATION_MESSAGE });
          resolve(null);
          return;
        }
        setStatus({ kind: 'locating' });
        navigator.geolocation.getCurrentPosition(
          (p) => {
            const fix = {
              lat: p.coords.latitude,
              lon: p.coords.longitude,
              accuracyM: p.coords.accuracy,
              at: p.timestamp,
            };
            // A missing or NaN accuracy cannot be trusted either.
            if (!(fix.accuracyM <= limitM)) {
              setStatus({ kind: 'too-coarse', accuracyM: fix.accuracyM, limitM });
              resolve(null);
              return;
            }
            setLastFix(fix);
            setStatus({ kind: 'fix', fix });
            resolve(fix);
          },
          (error) => {
            setStatus({ kind: 'failed', message: failureMessage(error) });
            resolve(null);
          },
          { enableHighAccuracy: true, timeout: POSITION_TIMEOUT_MS, maximumAge: 0 },
        );
      }),
    [],
  );
  return { supported: geolocationSupported(), status, lastFix: last, locate };
}
