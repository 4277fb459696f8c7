import { Bar, type ComputedBarDatum } from '@nivo/bar';
import { ChartFrame } from '../../../components/charts/chart-frame';
import { ChartLegend, WhiskerSample } from '../../../components/charts/chart-legend';
import { SeriesSwatch, seriesDefs, seriesPatternId } from '../../../components/charts/chart-patterns';
import { chartTheme } from '../../../components/charts/chart-theme';
import { seriesColour, seriesPattern } from '../../../components/charts/palette';
import { whiskerLayer } from '../../../components/charts/whisker-layer';
import type { ComparedEvent, LakeComparisonGroup } from '../api/report-types';
import { percent, percentRange } from './report-labels';

type Row = Record<string, string | number>;
const PREFIX = 'sb-lake-comparison';

/** "Corvane Dog Days Classic 2024" — the year tells repeated events apart. */
export function eventLabel(event: ComparedEvent): string {
  if (event.year === null || event.name.includes(String(event.year))) return event.name;
  return `${event.name} ${event.year}`;
}

/**
 * The groupings side by side for each event on one lake: grouped horizontal bars (one per event, each
 * with its own colour AND fill pattern) with interval whiskers, so a change between events shows as bars
 * whose whiskers do not overlap.
 */
export function LakeComparisonChart({
  events,
  groups,
  title,
}: {
  events: ComparedEvent[];
  groups: LakeComparisonGroup[];
  title: string;
}) {
  // nivo rows hold strings and numbers only, so an unrecorded group key (null) is dropped here.
  const rows: Row[] = groups
    .map((g) => {
      const row: Row = { group: g.label };
      for (const event of events) {
        const rate = g.perEvent[event.id];
        if (!rate) continue;
        row[event.id] = (rate.rate ?? 0) * 100;
        row[`${event.id}:lower`] = rate.lower * 100;
        row[`${event.id}:upper`] = rate.upper * 100;
        row[`${event.id}:n`] = rate.findsFished;
        row[`${event.id}:k`] = rate.successes;
      }
      return row;
    })
    .reverse();
  const indexOf = new Map(events.map((e, i) => [e.id, i]));
  const nameOf = new Map(events.map((e) => [e.id, eventLabel(e)]));
  const height = Math.max(220, 60 + rows.length * (events.length * 16 + 22));
  const longest = Math.max(...groups.map((g) => g.label.length), 8);

  const whiskers = whiskerLayer<Row>((bar: ComputedBarDatum<Row>) => {
    const key = String(bar.data.id);
    const row = bar.data.data;
    const lower = row[`${key}:lower`];
    const upper = row[`${key}:upper`];
    if (typeof lower !== 'number' || typeof upper !== 'number') return null;
    return {
      lower,
      upper,
      description: `${row.group}, ${nameOf.get(key)}: ${row[`${key}:k`]} of ${row[`${key}:n`]} finds fished (${percent(Number(row[key]) / 100)}, range ${percentRange(lower / 100, upper / 100)})`,
    };
  }, 'horizontal');

  return (
    <div>
      <ChartFrame height={height} label={title}>
        {({ width }) => (
          <Bar<Row>
            width={width}
            height={height}
            data={rows}
            keys={events.map((e) => e.id)}
            indexBy="group"
            layout="horizontal"
            groupMode="grouped"
            margin={{ top: 10, right: 24, bottom: 46, left: Math.min(220, 16 + longest * 7) }}
            padding={0.25}
            innerPadding={2}
            valueScale={{ type: 'linear', min: 0, max: 100 }}
            colors={(bar) => seriesColour(indexOf.get(String(bar.id)) ?? 0)}
            defs={seriesDefs(PREFIX, events.length)}
            fill={events
              .map((e, i) => ({
                match: { id: e.id },
                id: seriesPatternId(PREFIX, i),
                solid: seriesPattern(i) === 'solid',
              }))
              .filter((rule) => !rule.solid)
              .map(({ match, id }) => ({ match, id }))}
            borderColor="#1f2328"
            borderWidth={1}
            enableLabel={false}
            enableGridY={false}
            enableGridX
            gridXValues={[0, 25, 50, 75, 100]}
            axisBottom={{
              tickValues: [0, 25, 50, 75, 100],
              format: (v) => `${v} %`,
              legend: 'Share of finds fished that produced a fish',
              legendPosition: 'middle',
              legendOffset: 36,
            }}
            theme={chartTheme}
            animate={false}
            role="img"
            ariaLabel={title}
            tooltip={({ id, value, indexValue }) => (
              <div style={{ background: '#fff', padding: '6px 8px', border: '1px solid #d1d9e0', borderRadius: 6 }}>
                <strong>{indexValue}</strong>, {nameOf.get(String(id))}: {percent(Number(value) / 100)}
              </div>
            )}
            layers={['grid', 'axes', 'bars', whiskers]}
          />
        )}
      </ChartFrame>
      <ChartLegend
        label="Events in the chart"
        items={[
          ...events.map((event, i) => ({
            key: event.id,
            sample: <SeriesSwatch index={i} prefix={PREFIX} />,
            text: eventLabel(event),
          })),
          { key: 'whisker', sample: <WhiskerSample />, text: 'Likely range (95 %)' },
        ]}
      />
    </div>
  );
}
