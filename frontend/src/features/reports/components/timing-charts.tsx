import { Bar } from '@nivo/bar';
import { ScatterPlot, type ScatterPlotNodeProps } from '@nivo/scatterplot';
import type { WeightUnit } from '@shoalbook/shared';
import { ChartFrame } from '../../../components/charts/chart-frame';
import { ChartLegend } from '../../../components/charts/chart-legend';
import { chartTheme } from '../../../components/charts/chart-theme';
import { SymbolMark, type SymbolShape } from '../../../components/charts/symbols';
import { formatWeight } from '../../../lib/units';
import type { TimingCatch, TimingReport } from '../api/report-types';
import { chartWeight, chartWeightSign } from './report-units';

type PeriodKey = 'major' | 'minor' | 'outside';

interface TimingPoint {
  x: number;
  y: number;
  weightLb: number;
  clock: string;
  [key: string]: string | number;
}

/** How each period is drawn: its own shape, colour and name in our words. */
export const PERIOD_MARKS: Record<PeriodKey, { label: string; shape: SymbolShape; colour: string; hollow: boolean }> = {
  major: {
    label: 'In a major period (moon overhead or underfoot)',
    shape: 'diamond',
    colour: '#6a51a3',
    hollow: false,
  },
  minor: { label: 'In a minor period (moonrise or moonset)', shape: 'triangle', colour: '#0b6e99', hollow: false },
  outside: { label: 'Outside the solunar periods', shape: 'circle', colour: '#4a4a4a', hollow: true },
};

function clockOf(minutes: number): string {
  const m = ((Math.round(minutes) % 1440) + 1440) % 1440;
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

/** The middle sunrise (minutes after local midnight) across the catches' days, or null when unknown. */
export function typicalSunrise(catches: TimingCatch[]): number | null {
  const sunrises = catches
    .filter((c) => c.minutesFromSunrise !== null)
    .map((c) => c.localMinutes - (c.minutesFromSunrise as number));
  if (sunrises.length === 0) return null;
  sunrises.sort((a, b) => a - b);
  return sunrises[Math.floor(sunrises.length / 2)];
}

function PeriodNode({ node }: ScatterPlotNodeProps<TimingPoint>) {
  const mark = PERIOD_MARKS[node.serieId as PeriodKey] ?? PERIOD_MARKS.outside;
  return (
    <g transform={`translate(${node.x}, ${node.y})`} className="sb-timing-node" data-period={String(node.serieId)}>
      <SymbolMark shape={mark.shape} size={node.size} colour={mark.colour} hollow={mark.hollow} />
    </g>
  );
}

/**
 * Catches against the lake's clock (x: local time, y: weight), with sunrise as a vertical line and each
 * fish's solunar period told by symbol shape (and colour, and the legend's words).
 */
export function CatchTimingScatter({ catches, unit }: { catches: TimingCatch[]; unit: WeightUnit }) {
  const groups: Record<PeriodKey, TimingPoint[]> = { major: [], minor: [], outside: [] };
  for (const c of catches) {
    groups[c.solunarPeriod ?? 'outside'].push({
      x: c.localMinutes / 60,
      y: chartWeight(c.weightLb, unit),
      weightLb: c.weightLb,
      clock: clockOf(c.localMinutes),
    });
  }
  const data = (Object.keys(groups) as PeriodKey[])
    .filter((k) => groups[k].length)
    .map((k) => ({ id: k, data: groups[k] }));
  const sunrise = typicalSunrise(catches);
  const hours = catches.map((c) => c.localMinutes / 60).concat(sunrise !== null ? [sunrise / 60] : []);
  const minX = Math.max(0, Math.floor(Math.min(...hours)) - 1);
  const maxX = Math.min(24, Math.ceil(Math.max(...hours)) + 1);
  const ticks = Array.from({ length: maxX - minX + 1 }, (_, i) => minX + i);
  const sign = chartWeightSign(unit);
  const height = 360;

  return (
    <div>
      <ChartFrame height={height} label="Catches by time of day and weight">
        {({ width }) => (
          <ScatterPlot<TimingPoint>
            width={width}
            height={height}
            data={data}
            margin={{ top: 24, right: 24, bottom: 50, left: 64 }}
            xScale={{ type: 'linear', min: minX, max: maxX }}
            yScale={{ type: 'linear', min: 0, max: 'auto' }}
            nodeSize={13}
            nodeComponent={PeriodNode}
            colors={(s: { serieId: string | number }) => PERIOD_MARKS[s.serieId as PeriodKey]?.colour ?? '#4a4a4a'}
            gridXValues={ticks}
            axisBottom={{
              tickValues: ticks,
              format: (v) => `${String(v).padStart(2, '0')}:00`,
              legend: 'Lake time',
              legendPosition: 'middle',
              legendOffset: 38,
            }}
            axisLeft={{ legend: `Fish weight (${sign})`, legendPosition: 'middle', legendOffset: -50 }}
            markers={
              sunrise !== null
                ? [
                    {
                      axis: 'x',
                      value: sunrise / 60,
                      legend: `sunrise ≈ ${clockOf(sunrise)}`,
                      legendPosition: 'top-right',
                      lineStyle: { stroke: '#8a5a00', strokeWidth: 2, strokeDasharray: '6 4' },
                      textStyle: { fill: '#1f2328', fontSize: 12, fontWeight: 600 },
                    },
                  ]
                : []
            }
            theme={chartTheme}
            animate={false}
            role="img"
            ariaLabel="Catches by time of day and weight, marked by solunar period"
            tooltip={({ node }) => (
              <div style={{ background: '#fff', padding: '6px 8px', border: '1px solid #d1d9e0', borderRadius: 6 }}>
                {node.data.clock}: {formatWeight(node.data.weightLb, unit)} ·{' '}
                {PERIOD_MARKS[node.serieId as PeriodKey]?.label}
              </div>
            )}
          />
        )}
      </ChartFrame>
      <ChartLegend
        label="Solunar periods"
        items={[
          ...(Object.keys(PERIOD_MARKS) as PeriodKey[]).map((k) => ({
            key: k,
            sample: (
              <SymbolMark
                shape={PERIOD_MARKS[k].shape}
                size={12}
                colour={PERIOD_MARKS[k].colour}
                hollow={PERIOD_MARKS[k].hollow}
                standalone
              />
            ),
            text: PERIOD_MARKS[k].label,
          })),
          {
            key: 'sunrise',
            sample: (
              <svg width={20} height={14} aria-hidden="true" focusable="false">
                <line x1={10} y1={0} x2={10} y2={14} stroke="#8a5a00" strokeWidth={2} strokeDasharray="4 3" />
              </svg>
            ),
            text: 'Sunrise (middle of the days shown)',
          },
        ]}
      />
    </div>
  );
}

/** Weight brought in per hour of the lake's clock, labelled with the number of fish. */
export function WeightByHourChart({ byHour, unit }: { byHour: TimingReport['byHour']; unit: WeightUnit }) {
  const rows = byHour
    .filter((h) => h.fishCount > 0)
    .sort((a, b) => a.hour - b.hour)
    .map((h) => ({
      hour: `${String(h.hour).padStart(2, '0')}:00`,
      weight: Number(chartWeight(h.weightLb, unit).toFixed(2)),
      fish: h.fishCount,
      weightLb: h.weightLb,
    }));
  const fishByHour = new Map(rows.map((r) => [r.hour, r.fish]));
  const sign = chartWeightSign(unit);
  const height = 300;
  return (
    <ChartFrame height={height} label="Weight caught per hour of the day">
      {({ width }) => (
        <Bar
          width={width}
          height={height}
          data={rows}
          keys={['weight']}
          indexBy="hour"
          margin={{ top: 24, right: 16, bottom: 50, left: 64 }}
          padding={0.25}
          colors="#0d5c63"
          borderColor="#1f2328"
          borderWidth={1}
          label={(d) => `${fishByHour.get(String(d.indexValue)) ?? 0} fish`}
          labelPosition="end"
          labelOffset={-12}
          labelSkipHeight={18}
          labelTextColor="#ffffff"
          axisBottom={{ legend: 'Hour of the day (lake time)', legendPosition: 'middle', legendOffset: 38 }}
          axisLeft={{ legend: `Weight (${sign})`, legendPosition: 'middle', legendOffset: -50 }}
          theme={chartTheme}
          animate={false}
          role="img"
          ariaLabel="Weight caught per hour of the day"
          tooltip={({ indexValue, data }) => (
            <div style={{ background: '#fff', padding: '6px 8px', border: '1px solid #d1d9e0', borderRadius: 6 }}>
              {indexValue}: {data.fish} fish, {formatWeight(Number(data.weightLb), unit)}
            </div>
          )}
        />
      )}
    </ChartFrame>
  );
}
