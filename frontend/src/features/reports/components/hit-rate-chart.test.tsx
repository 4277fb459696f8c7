import { describe, expect, it } from 'vitest';
import { renderWithApp } from '../../../testing/render';
import { hitRates, withLaidOutElements } from '../testing/report-test-kit';
import { HitRateChart } from './hit-rate-chart';

withLaidOutElements(900, 600);

// 14 of 40 gives the Wilson interval 22–50 % (the worked example in the reports issue; Wilson 1927 score interval).
const report = hitRates(
  [
    ['hard-bottom', 'Hard bottom', 14, 40],
    ['vegetation', 'Vegetation', 3, 25],
    ['bait', 'Bait', 2, 3],
  ],
  [],
);

function whiskerSpan(group: Element): number {
  const line = group.querySelectorAll('line')[1];
  return Math.abs(Number(line.getAttribute('x2')) - Number(line.getAttribute('x1')));
}

describe('HitRateChart', () => {
  it('draws one whisker and one adjusted-rate marker per group, titled with its range', () => {
    const { container } = renderWithApp(<HitRateChart groups={report.groups} title="Hit rate by kind" />);
    const whiskers = [...container.querySelectorAll('.sb-whisker')];
    expect(whiskers.map((w) => w.getAttribute('data-bar')).sort()).toEqual(['Bait', 'Hard bottom', 'Vegetation']);
    expect(container.querySelectorAll('.sb-marker')).toHaveLength(3);
    const hard = whiskers.find((w) => w.getAttribute('data-bar') === 'Hard bottom')!;
    expect(hard.querySelector('title')?.textContent).toContain('14 of 40 finds fished produced (35 %, range 22–50 %)');
  });

  it('makes a thin sample visibly uncertain: a wider whisker and a "few finds" tag on its label', () => {
    const { container } = renderWithApp(<HitRateChart groups={report.groups} title="Hit rate by kind" />);
    const byGroup = new Map([...container.querySelectorAll('.sb-whisker')].map((w) => [w.getAttribute('data-bar'), w]));
    expect(whiskerSpan(byGroup.get('Bait')!)).toBeGreaterThan(2 * whiskerSpan(byGroup.get('Hard bottom')!));
    const ticks = [...container.querySelectorAll('svg text')].map((t) => t.textContent);
    expect(ticks).toContain('Bait (few finds)');
    expect(ticks).toContain('Hard bottom');
    expect(ticks).not.toContain('Hard bottom (few finds)');
  });

  it('places the whisker ends at the interval bounds on the value axis', () => {
    const { container } = renderWithApp(<HitRateChart groups={report.groups} title="Hit rate by kind" />);
    const whiskers = [...container.querySelectorAll('.sb-whisker')];
    const hard = whiskers.find((w) => w.getAttribute('data-bar') === 'Hard bottom')!;
    const line = hard.querySelectorAll('line')[1];
    const x1 = Number(line.getAttribute('x1'));
    const x2 = Number(line.getAttribute('x2'));
    const g = report.groups[0].producing;
    // The axis runs 0–100 %, linear: the ratio of the ends equals the ratio of the bounds.
    expect(x1 / x2).toBeCloseTo(g.lower / g.upper, 2);
  });
});
