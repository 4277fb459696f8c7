import { useState } from 'react';
import { readNumber } from './units';

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

/** For readDeviceSetting: a finite number above 0 (a speed, a distance limit). */
export const isPositiveNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v) && v > 0;

/**
 * A text field over a positive number kept on this device, typed in the user's unit and stored in another
 * (metres, metres per second). `value` is what the field means in the stored unit: the saved value exactly while
 * the field shows it untouched (30 m shown as 98 ft stays 30 m), null when the text is no number above 0. Each
 * such number typed is saved at once.
 */
export function useSavedNumberField({
  saved,
  show,
  toStored,
  save,
}: {
  /** Read once, when the field opens. */
  saved: () => number | null;
  show: (stored: number) => string;
  toStored: (typed: number) => number;
  save: (stored: number) => void;
}) {
  const [savedValue] = useState(saved);
  const savedText = savedValue === null ? '' : show(savedValue);
  const [text, setText] = useState(savedText);
  const typed = readNumber(text);
  const value = text === savedText ? savedValue : isPositiveNumber(typed) ? toStored(typed) : null;
  const change = (next: string) => {
    setText(next);
    const n = readNumber(next);
    if (isPositiveNumber(n)) save(toStored(n));
  };
  return { text, change, value };
}
