import { solunarPeriodAt, sunMoonDay } from '@shoalbook/analytics';
import { describe, expect, it } from 'vitest';
import { SkyService } from './sky.service';

const lake = { lat: 32.9, lon: -96.1, timeZone: 'America/Chicago' };

describe('SkyService', () => {
  it('picks the same solunar period as analytics solunarPeriodAt, every 20 minutes over three days', () => {
    const sky = new SkyService();
    const start = Date.parse('2024-05-10T00:00:00Z');
    let inPeriod = 0;
    for (let t = start; t < start + 3 * 86_400_000; t += 20 * 60_000) {
      const instant = new Date(t);
      const ours = sky.at(lake, instant).period;
      const reference = solunarPeriodAt(instant.toISOString(), lake.lat, lake.lon, lake.timeZone);
      expect(ours).toEqual(reference && { kind: reference.kind, start: reference.start, end: reference.end });
      if (ours) inPeriod += 1;
    }
    // Periods cover several hours a day, so some instants must fall in one (else the check proves nothing).
    expect(inPeriod).toBeGreaterThan(10);
  });

  it('uses the lake-local day: 02:00 UTC on the 11th is still the 10th in Chicago', () => {
    const sky = new SkyService();
    const ctx = sky.at(lake, new Date('2024-05-11T02:00:00Z'));
    expect(ctx.date).toBe('2024-05-10');
    expect(ctx.sunrise).toBe(sunMoonDay('2024-05-10', lake.lat, lake.lon, lake.timeZone).sunrise);
  });
});
