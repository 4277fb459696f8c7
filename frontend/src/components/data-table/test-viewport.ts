import { afterAll, beforeAll } from 'vitest';

/**
 * jsdom lays nothing out, so every element is 0 px high and a virtualised table would show no rows.
 * Give scroll containers a height for the tests of one file (the virtualiser reads clientHeight).
 */
export function withTestViewport(height = 600, width = 1000) {
  const original = {
    height: Object.getOwnPropertyDescriptor(HTMLElement.prototype, 'clientHeight'),
    width: Object.getOwnPropertyDescriptor(HTMLElement.prototype, 'clientWidth'),
  };
  beforeAll(() => {
    Object.defineProperty(HTMLElement.prototype, 'clientHeight', { configurable: true, get: () => height });
    Object.defineProperty(HTMLElement.prototype, 'clientWidth', { configurable: true, get: () => width });
  });
  afterAll(() => {
    if (original.height) Object.defineProperty(HTMLElement.prototype, 'clientHeight', original.height);
    if (original.width) Object.defineProperty(HTMLElement.prototype, 'clientWidth', original.width);
  });
}
