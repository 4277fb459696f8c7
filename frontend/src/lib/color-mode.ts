import { useSyncExternalStore } from 'react';

/** How the screens are drawn: as the device is set (auto), or always light or dark. */
export type ColorModeChoice = 'auto' | 'light' | 'dark';
export const COLOR_MODE_CHOICES: readonly ColorModeChoice[] = ['auto', 'light', 'dark'];

// A display choice of this device (a phone in the sun, a desk at night), not of the account.
const KEY = 'shoalbook.colorMode';
const listeners = new Set<() => void>();

function read(): ColorModeChoice {
  try {
    const v = window.localStorage.getItem(KEY);
    return v === 'light' || v === 'dark' || v === 'auto' ? v : 'auto';
  } catch {
    return 'auto'; // storage refused (private mode): follow the device
  }
}

export function setColorMode(choice: ColorModeChoice): void {
  try {
    window.localStorage.setItem(KEY, choice);
  } catch {
    // Not kept across reloads, but applied now.
  }
  current = choice;
  for (const l of listeners) l();
}

let current: ColorModeChoice | null = null;

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  const onStorage = (e: StorageEvent) => {
    if (e.key !== KEY) return;
    current = read();
    listener();
  };
  window.addEventListener('storage', onStorage); // another tab changed it
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

export function useColorMode(): ColorModeChoice {
  return useSyncExternalStore(
    subscribe,
    () => (current ??= read()),
    () => 'auto',
  );
}
