/**
 * Small settings kept on this device only (localStorage): figures that belong to the angler's own phone and boat,
 * not to the account. Storage can be off (private mode): reading falls back, writing is skipped, nothing breaks.
 */
export function readDeviceSetting<T>(key: string, isValid: (value: unknown) => value is T, fallback: T): T {
  try {
    const stored = localStorage.getItem(key);
    if (stored === null) return fallback;
    const value: unknown = JSON.parse(stored);
    return isValid(value) ? value : fallback;
  } catch {
    return fallback;
  }
}

export function writeDeviceSetting(key: string, value: unknown): void {
  try {
    localStorage.setItem(key, JSON.stringify(value));
  } catch {
    // Not remembering is harmless: the form still has the value.
  }
}
