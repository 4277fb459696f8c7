import { describe, expect, it } from 'vitest';
import { officialBesideLog, signedWeight } from './official-figures';

describe('officialBesideLog', () => {
  it('shows the scale figure, the log figure and their difference (the issue’s own example: 17.62 against 17.75)', () => {
    expect(officialBesideLog(17.62, 17.75, 'lb')).toBe('scale 17.62 lb, log 17.75 lb, −0.13 lb');
    expect(officialBesideLog(9.72, 9.7, 'lb')).toBe('scale 9.72 lb, log 9.70 lb, +0.02 lb');
  });

  it('shows the log figure alone, unlabelled, until the official one is entered', () => {
    expect(officialBesideLog(null, 9.57, 'lb')).toBe('9.57 lb');
    expect(officialBesideLog(undefined, 0.25, 'lb')).toBe('0.25 lb');
  });

  it('calls a difference under half a hundredth none', () => {
    expect(signedWeight(0.004, 'lb')).toBe('no difference');
  });
});
