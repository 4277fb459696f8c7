import '@testing-library/jest-dom/vitest';
// jsdom has no IndexedDB; the send queue and the kept lists use the W3C API, here in memory.
import 'fake-indexeddb/auto';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { api } from '../lib/api-client';

// A screen's first render loads its lazy route module and Primer; on a busy shared machine that takes more
// than Testing Library's default 1 s for findBy* queries, so wait up to 5 s (a real failure still fails).
configure({ asyncUtilTimeout: 5000 });

// jsdom lacks these browser APIs; Primer's overlays and responsive hooks call them.
if (!window.matchMedia) {
  Object.defineProperty(window, 'matchMedia', {
    writable: true,
    value: (query: string) => ({
      matches: false,
      media: query,
      onchange: null,
      addListener: () => undefined,
      removeListener: () => undefined,
      addEventListener: () => undefined,
      removeEventListener: () => undefined,
      dispatchEvent: () => false,
    }),
  });
}

class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}
if (!('ResizeObserver' in window)) {
  Object.defineProperty(window, 'ResizeObserver', { writable: true, value: ResizeObserverStub });
  Object.defineProperty(globalThis, 'ResizeObserver', { writable: true, value: ResizeObserverStub });
}

// Primer's tooltips (IconButton) add the popover polyfill's styles through adoptedStyleSheets, which jsdom lacks.
if (!('adoptedStyleSheets' in document)) {
  Object.defineProperty(document, 'adoptedStyleSheets', { writable: true, value: [] });
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  // Each test brings its own fake server, so no token may carry over from the previous one.
  api.forgetCsrfToken();
});
