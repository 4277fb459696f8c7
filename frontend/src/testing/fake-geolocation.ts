import { vi } from 'vitest';

export type FakeOutcome =
  { fix: { lat: number; lon: number; accuracy: number }; at?: Date } | { error: { code: number; message: string } };

/**
 * A stand-in for the phone's Geolocation API (navigator.geolocation, a browser API jsdom lacks), answering each
 * request with the next outcome. Remove it with forgetFakeGeolocation.
 */
export function fakeGeolocation(...outcomes: FakeOutcome[]) {
  const getCurrentPosition = vi.fn(
    (ok: PositionCallback, fail?: PositionErrorCallback | null, _options?: PositionOptions) => {
      const next = outcomes.shift();
      if (!next) throw new Error('no more fake positions');
      if ('fix' in next) {
        ok({
          coords: { latitude: next.fix.lat, longitude: next.fix.lon, accuracy: next.fix.accuracy },
          timestamp: (next.at ?? new Date()).getTime(),
        } as GeolocationPosition);
      } else fail?.(next.error as GeolocationPositionError);
    },
  );
  Object.defineProperty(navigator, 'geolocation', { configurable: true, value: { getCurrentPosition } });
  return getCurrentPosition;
}

export function forgetFakeGeolocation(): void {
  delete (navigator as { geolocation?: unknown }).geolocation;
}
