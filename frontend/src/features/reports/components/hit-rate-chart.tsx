import { Bar, type ComputedBarDatum } from '@nivo/bar';
import { ChartFrame } from '../../../components/charts/chart-frame';
import { ChartLegend, MarkerSample, WhiskerSample } from '../../../components/charts/chart-legend';
import { PatternSwatch, uncertainDef } from '../../../components/charts/chart-patterns';
import { chartTheme } from '../../../components/charts/chart-theme';
import { PRIMARY_BAR } from '../../../components/charts/palette';
import { whiskerLayer } from '../../../components/charts/whisker-layer';
import type { HitRateGroup } from '../api/report-types';
import { FEW_FINDS, percent, percentRange } from './report-labels';

interface HitRateRow {
  [key: string]: string | number;
  group: string;
  rate: number;
  lower: number;
  upper: number;
  shrunk: number;
  /** 1 when fewer than FEW_FINDS finds were fished (nivo data hold strings and numbers only). */
  few: number;
  trials: number;
  successes: number;
}

const UNCERTAIN_ID = 'sb-hit-rate-uncertain';
const uncertain = uncertainDef(UNCERTAIN_ID, PRIMARY_BAR);

/** The label on the axis: a group with few finds (or fish) behind it says so. */
function axisLabel(row: HitRateRow, unit: 'find' | 'catch'): string {
  return row.few ? `${row.group} (few ${unit === 'catch' ? 'fish' : 'finds'})` : row.group;
}

/**
 * Hit rates as horizontal bars (share of finds fished that produced a fish), each with its 95 % interval
 * as a whisker and the sample-size-adjusted rate as a diamond. Groups with fewer than {@link FEW_FINDS}
 * finds fished are hatched and tagged, so a wide whisker on a thin sample reads as uncertain at a glance.
 */
export function HitRateChart({
  groups,
  title,
  unit = 'find',
}: {
  groups: HitRateGroup[];
  title: string;
  unit?: 'find' | 'catch';
}) {
  // Find groupings chart the share of finds fished that produced; catch groupings the share of all fish.
  const measureOf = (g: HitRateGroup) => (unit === 'catch' ? g.shareOfFish : g.producing);
  const trialsWord = unit === 'catch' ? 'fish' : 'finds fished';
  // Best rank on top, as in the table. nivo draws the first row at the bottom of a horizontal chart, hence the reverse.
  const rows: HitRateRow[] = [...groups]
    .sort((a, b) => a.rank - b.rank)
    .map((g) => {
      const m = measureOf(g);
      return {
        group: g.label,
        rate: (m.rate ?? 0) * 100,
        lower: m.lower * 100,
        upper: m.upper * 100,
        shrunk: m.shrunk === null ? -1 : m.shrunk * 100,
        few: (unit === 'catch' ? g.fishCount : g.findsFished) < FEW_FINDS ? 1 : 0,
        trials: m.trials,
        successes: m.successes,
      };
    })
    .reverse();
  const byLabel = new Map(rows.map((r) => [r.group, r]));
  const height = Math.max(180, 60 + rows.length * 42);
  const longest = Math.max(...rows.map((r) => axisLabel(r, unit).length), 8);

  const whiskers = whiskerLayer<HitRateRow>((bar: ComputedBarDatum<HitRateRow>) => {
    const row = bar.data.data;
    return {
      lower: row.lower,
      upper: row.upper,
      marker: row.shrunk < 0 ? null : row.shrunk,
      description:
        unit === 'catch'
          ? `${row.group}: ${row.successes} of ${row.trials} fish (${percent(row.rate / 100)}, range ${percentRange(row.lower / 100, row.upper / 100)})`
          : `${row.group}: ${row.successes} of ${row.trials} finds fished produced (${percent(row.rate / 100)}, range ${percentRange(row.lower / 100, row.upper / 100)}); adjusted ${row.shrunk < 0 ? '—' : percent(row.shrunk / 100)}`,
    };
  }, 'horizontal');

  return (
    <div>
      <ChartFrame height={height} label={title}>
        {({ width }) => (
          <Bar<HitRateRow>
            width={width}
            height={height}
            data={rows}
            keys={['rate']}
            indexBy="group"
            layout="horizontal"
            margin={{ top: 10, right: 24, bottom: 46, left: Math.min(260, 16 + longest * 7) }}
            padding={0.3}
            valueScale={{ type: 'linear', min: 0, max: 100 }}
            colors={PRIMARY_BAR}
            defs={[uncertain]}
            fill={[
              {
                match: (bar: unknown) => Boolean((bar as { data?: { data?: HitRateRow } }).data?.data?.few),
                id: UNCERTAIN_ID,
              },
            ]}
            borderColor="#1f2328"
            borderWidth={1}
            enableGridY={false}
            enableGridX
            gridXValues={[0, 25, 50, 75, 100]}
            axisBottom={{
              tickValues: [0, 25, 50, 75, 100],
              format: (v) => `${v} %`,
              legend: unit === 'catch' ? 'Share of all fish caught' : 'Share of finds fished that produced a fish',
              legendPosition: 'middle',
              legendOffset: 36,
            }}
            axisLeft={{
              format: (v) => axisLabel(byLabel.get(String(v)) ?? ({ group: String(v), few: 0 } as HitRateRow), unit),
            }}
            label={(d) => percent(Number(d.value) / 100)}
            labelPosition="start"
            labelOffset={6}
            labelSkipWidth={36}
            labelTextColor="#ffffff"
            theme={chartTheme}
            animate={false}
            role="img"
            ariaLabel={title}
            tooltip={({ data }) => (
              <div style={{ background: '#fff', padding: '6px 8px', border: '1px solid #d1d9e0', borderRadius: 6 }}>
                <strong>{data.group}</strong>: {data.successes} of {data.trials} {trialsWord} (
                {percent(data.rate / 100)}), range {percentRange(data.lower / 100, data.upper / 100)}
              </div>
            )}
            layers={['grid', 'axes', 'bars', whiskers, 'markers']}
          />
        )}
      </ChartFrame>
      <ChartLegend
        label="How to read the hit-rate chart"
        items={[
          {
            key: 'bar',
            sample: <PatternSwatch def={null} colour={PRIMARY_BAR} />,
            text: unit === 'catch' ? 'Share of all fish' : 'Share of finds fished that produced',
          },
          { key: 'whisker', sample: <WhiskerSample />, text: 'Likely range (95 %)' },
          { key: 'marker', sample: <MarkerSample />, text: 'Rate adjusted for how many finds there were' },
          {
            key: 'few',
            sample: <PatternSwatch def={uncertainDef(`${UNCERTAIN_ID}-swatch`, PRIMARY_BAR)} colour={PRIMARY_BAR} />,
            text: `Hatched: fewer than ${FEW_FINDS} ${trialsWord}, read with care`,
          },
        ]}
      />
    </div>
  );
}
