import { Line, type LineSeries } from '@nivo/line';
import type { WeightUnit } from '@shoalbook/shared';
import { ChartFrame } from '../../../components/charts/chart-frame';
import { ChartLegend } from '../../../components/charts/chart-legend';
import { chartTheme } from '../../../components/charts/chart-theme';
import { seriesColour } from '../../../components/charts/palette';
import { SymbolMark, symbolShape } from '../../../components/charts/symbols';
import { clockTime, dayLabel } from '../../../lib/lake-time';
import { formatWeight } from '../../../lib/units';
import type { EventRecap } from '../api/report-types';
import { chartWeight, chartWeightSign } from './report-units';

interface TimelinePoint {
  x: number;
  y: number;
  fishLb: number;
  clock: string;
  [key: string]: unknown;
}

/** "HH:MM" → hours after midnight (decimal). */
function hoursOf(clock: string): number {
  const [h, m] = clock.split(':').map(Number);
  return h + m / 60;
}

/**
 * The bag growing through each competition day: cumulative counted weight against the lake's clock, one
 * stepped line per day (the bag changes only when a fish is boxed or culled), each day with its own
 * colour, dash and point symbol.
 */
export function WeightTimeline({
  timeline,
  timeZone,
  unit,
}: {
  timeline: EventRecap['timeline'];
  timeZone: string;
  unit: WeightUnit;
}) {
  const days = [...new Set(timeline.map((t) => t.day))].sort();
  const series: Array<LineSeries & { id: string; data: TimelinePoint[] }> = days.map((day) => ({
    id: dayLabel(day),
    data: timeline
      .filter((t) => t.day === day)
      .sort((a, b) => a.caughtAt.localeCompare(b.caughtAt))
      .map((t) => {
        const clock = clockTime(t.caughtAt, timeZone);
        return { x: hoursOf(clock), y: chartWeight(t.cumulativeBagLb, unit), fishLb: t.weightLb, clock };
      }),
  }));
  const allX = series.flatMap((s) => s.data.map((p) => Number(p.x)));
  const minX = Math.floor(Math.min(...allX));
  const maxX = Math.ceil(Math.max(...allX));
  const ticks = Array.from({ length: maxX - minX + 1 }, (_, i) => minX + i);
  const colourOf = new Map(series.map((s, i) => [s.id, seriesColour(i)]));
  // nivo hands the symbol its series' colour; read the day back from it.
  const indexOfColour = new Map(series.map((_, i) => [seriesColour(i), i]));
  const sign = chartWeightSign(unit);
  const height = 320;

  return (
    <div>
      <ChartFrame height={height} label="Bag weight through each competition day">
        {({ width }) => (
          <Line
            width={width}
            height={height}
            data={series}
            margin={{ top: 16, right: 24, bottom: 50, left: 64 }}
            xScale={{ type: 'linear', min: minX, max: maxX }}
            yScale={{ type: 'linear', min: 0, max: 'auto' }}
            curve="stepAfter"
            colors={(s) => colourOf.get(String(s.id)) ?? '#1f2328'}
            lineWidth={3}
            pointSize={11}
            pointBorderWidth={2}
            pointBorderColor="#1f2328"
            pointColor={{ from: 'series.color' }}
            pointSymbol={({ color, size }) => (
              <SymbolMark shape={symbolShape(indexOfColour.get(color) ?? 0)} size={size} colour={color} />
            )}
            enableGridX
            gridXValues={ticks}
            axisBottom={{
              tickValues: ticks,
              format: (v) => `${String(v).padStart(2, '0')}:00`,
              legend: 'Lake time',
              legendPosition: 'middle',
              legendOffset: 38,
            }}
            axisLeft={{ legend: `Bag (${sign})`, legendPosition: 'middle', legendOffset: -50 }}
            theme={chartTheme}
            animate={false}
            useMesh
            role="img"
            ariaLabel="Bag weight through each competition day"
            tooltip={({ point }) => {
              const data = point.data as unknown as TimelinePoint;
              return (
                <div style={{ background: '#fff', padding: '6px 8px', border: '1px solid #d1d9e0', borderRadius: 6 }}>
                  {point.seriesId} {data.clock}: fish {formatWeight(data.fishLb, unit)}, bag {data.y.toFixed(2)} {sign}
                </div>
              );
            }}
          />
        )}
      </ChartFrame>
      <ChartLegend
        label="Competition days"
        items={series.map((s, i) => ({
          key: String(s.id),
          sample: <SymbolMark shape={symbolShape(i)} size={12} colour={seriesColour(i)} standalone />,
          text: String(s.id),
        }))}
      />
    </div>
  );
}
