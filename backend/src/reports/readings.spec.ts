import { describe, expect, it } from 'vitest';
import { differenceText } from './readings';

describe('differenceText', () => {
  it('reads a rise and a drop as a size with bounds on its own side', () => {
    expect(differenceText(0.74, 0.34, 0.88)).toBe('74 points higher, likely 34 to 88');
    expect(differenceText(-0.64, -0.83, -0.25)).toBe('64 points lower, likely 25 to 83');
  });

  it('names both directions when the likely range reaches past zero, never a negative bound', () => {
    expect(differenceText(-0.67, -0.94, 0.06)).toBe('67 points lower, likely from 6 points higher to 94 lower');
    expect(differenceText(0.2, -0.1, 0.45)).toBe('20 points higher, likely from 10 points lower to 45 higher');
    expect(differenceText(0, -0.3, 0.3)).toBe('0 points, likely from 30 points lower to 30 higher');
  });
});
