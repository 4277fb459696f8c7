import { ScatterPlot, type ScatterPlotNodeProps } from '@nivo/scatterplot';
import { FIND_KINDS, FIND_KIND_LABELS, type FindKind, type WeightUnit } from '@shoalbook/shared';
import { ChartFrame } from '../../../components/charts/chart-frame';
import { ChartLegend } from '../../../components/charts/chart-legend';
import { chartTheme } from '../../../components/charts/chart-theme';
import { SERIES_COLOURS } from '../../../components/charts/palette';
import { SymbolMark, SYMBOL_SHAPES, type SymbolShape } from '../../../components/charts/symbols';
import { formatWeight } from '../../../lib/units';
import type { FindMapReport, FindOutcome } from '../api/report-types';
import { OUTCOME_LABELS } from './report-labels';

/** Each kind of find gets its own shape and colour, so the map reads in grey print too. */
export const KIND_MARKS: Record<FindKind, { shape: SymbolShape; colour: string }> = Object.fromEntries(
  FIND_KINDS.map((kind, i) => [
    kind,
    { shape: SYMBOL_SHAPES[i % SYMBOL_SHAPES.length], colour: SERIES_COLOURS[i % SERIES_COLOURS.length] },
  ]),
) as Record<FindKind, { shape: SymbolShape; colour: string }>;

interface MapPoint {
  x: number;
  y: number;
  name: string;
  outcome: FindOutcome | 'catch';
  fishCount: number;
  weightLb: number;
  [key: string]: string | number;
}

const paidOff = (outcome: string) => outcome === 'weighed' || outcome === 'caught';

/** Size of a find's mark: bigger for more fish, small for finds never fished. */
function markSize(point: MapPoint): number {
  if (point.outcome === 'catch') return 7;
  if (point.outcome === 'not-fished') return 9;
  return 12 + Math.min(10, Math.sqrt(point.fishCount) * 3);
}

function MapNode({ node }: ScatterPlotNodeProps<MapPoint>) {
  const point = node.data;
  if (point.outcome === 'catch') {
    const s = 3;
    return (
      <g transform={`translate(${node.x}, ${node.y})`} className="sb-map-catch" pointerEvents="none">
        <path d={`M ${-s} ${-s} L ${s} ${s} M ${-s} ${s} L ${s} ${-s}`} stroke="#1f2328" strokeWidth={1.5} />
      </g>
    );
  }
  const mark = KIND_MARKS[node.serieId as FindKind] ?? KIND_MARKS.other;
  return (
    <g
      transform={`translate(${node.x}, ${node.y})`}
      className="sb-map-find"
      data-kind={String(node.serieId)}
      data-outcome={point.outcome}
    >
      <SymbolMark shape={mark.shape} size={markSize(point)} colour={mark.colour} hollow={!paidOff(point.outcome)} />
    </g>
  );
}

/**
 * Domains that give a metre the same length across and up the chart (a map, not a stretched plot),
 * with a margin around the outermost marks.
 */
export function equalScaleDomains(xs: number[], ys: number[], innerWidth: number, innerHeight: number) {
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const pad = 0.08;
  const spanX = Math.max(maxX - minX, 50) * (1 + pad * 2);
  const spanY = Math.max(maxY - minY, 50) * (1 + pad * 2);
  const metresPerPixel = Math.max(spanX / innerWidth, spanY / innerHeight);
  const halfX = (metresPerPixel * innerWidth) / 2;
  const halfY = (metresPerPixel * innerHeight) / 2;
  const cx = (minX + maxX) / 2;
  const cy = (minY + maxY) / 2;
  return { x: [cx - halfX, cx + halfX] as const, y: [cy - halfY, cy + halfY] as const };
}

function distanceLabel(metres: number): string {
  return Math.abs(metres) >= 1000 ? `${(metres / 1000).toFixed(1)} km` : `${Math.round(metres)} m`;
}

/**
 * The finds of a lake plotted in metres east and north of its reference point: shape and colour by kind,
 * filled when the find gave fish (hollow when fished without a bite, small and hollow when never fished),
 * larger for more fish; small crosses mark where each attributed catch was logged.
 */
export function FindMapChart({ report, unit }: { report: FindMapReport; unit: WeightUnit }) {
  const placed = report.finds.filter((f) => f.xM !== null && f.yM !== null);
  const kinds = FIND_KINDS.filter((k) => placed.some((f) => f.kind === k));
  const series = kinds.map((kind) => ({
    id: kind,
    data: placed
      .filter((f) => f.kind === kind)
      .map((f) => ({
        x: f.xM as number,
        y: f.yM as number,
        name: f.name,
        outcome: f.outcome,
        fishCount: f.fishCount,
        weightLb: f.weightLb,
      })),
  }));
  const catches = report.catches.filter((c) => c.xM !== null && c.yM !== null);
  const all = [
    ...series,
    ...(catches.length
      ? [
          {
            id: 'catches',
            data: catches.map((c) => ({
              x: c.xM as number,
              y: c.yM as number,
              name: 'Catch',
              outcome: 'catch' as const,
              fishCount: 1,
              weightLb: c.weightLb,
            })),
          },
        ]
      : []),
  ];
  const height = 560;
  const margin = { top: 16, right: 24, bottom: 54, left: 76 };

  return (
    <div>
      <ChartFrame height={height} label="Map of the finds around the lake's reference point">
        {({ width }) => {
          const domains = equalScaleDomains(
            all.flatMap((s) => s.data.map((p) => p.x)),
            all.flatMap((s) => s.data.map((p) => p.y)),
            width - margin.left - margin.right,
            height - margin.top - margin.bottom,
          );
          return (
            <ScatterPlot<MapPoint>
              width={width}
              height={height}
              data={all}
              margin={margin}
              xScale={{ type: 'linear', min: domains.x[0], max: domains.x[1] }}
              yScale={{ type: 'linear', min: domains.y[0], max: domains.y[1] }}
              nodeSize={12}
              nodeComponent={MapNode}
              colors={(s: { serieId: string | number }) => KIND_MARKS[s.serieId as FindKind]?.colour ?? '#1f2328'}
              axisBottom={{
                format: (v) => distanceLabel(Number(v)),
                legend: 'East of the reference point',
                legendPosition: 'middle',
                legendOffset: 40,
                tickValues: 6,
              }}
              axisLeft={{
                format: (v) => distanceLabel(Number(v)),
                legend: 'North of the reference point',
                legendPosition: 'middle',
                legendOffset: -62,
                tickValues: 6,
              }}
              markers={[
                { axis: 'x', value: 0, lineStyle: { stroke: '#8c959f', strokeWidth: 1, strokeDasharray: '2 3' } },
                { axis: 'y', value: 0, lineStyle: { stroke: '#8c959f', strokeWidth: 1, strokeDasharray: '2 3' } },
              ]}
              theme={chartTheme}
              animate={false}
              role="img"
              ariaLabel="Map of the finds by kind and outcome"
              tooltip={({ node }) => (
                <div style={{ background: '#fff', padding: '6px 8px', border: '1px solid #d1d9e0', borderRadius: 6 }}>
                  {node.data.outcome === 'catch' ? (
                    <>Catch: {formatWeight(node.data.weightLb, unit)}</>
                  ) : (
                    <>
                      <strong>{node.data.name}</strong> ({FIND_KIND_LABELS[node.serieId as FindKind]}):{' '}
                      {OUTCOME_LABELS[node.data.outcome as FindOutcome]}
                      {node.data.fishCount
                        ? `, ${node.data.fishCount} fish, ${formatWeight(node.data.weightLb, unit)}`
                        : ''}
                    </>
                  )}
                </div>
              )}
            />
          );
        }}
      </ChartFrame>
      <ChartLegend
        label="Kinds of find"
        items={kinds.map((kind) => ({
          key: kind,
          sample: <SymbolMark shape={KIND_MARKS[kind].shape} size={12} colour={KIND_MARKS[kind].colour} standalone />,
          text: FIND_KIND_LABELS[kind],
        }))}
      />
      <ChartLegend
        label="What the marks mean"
        items={[
          {
            key: 'filled',
            sample: <SymbolMark shape="circle" size={14} colour="#4a4a4a" standalone />,
            text: 'Filled: the find gave fish (bigger = more fish)',
          },
          {
            key: 'hollow',
            sample: <SymbolMark shape="circle" size={14} colour="#4a4a4a" hollow standalone />,
            text: 'Hollow: fished, no bite',
          },
          {
            key: 'small',
            sample: <SymbolMark shape="circle" size={9} colour="#4a4a4a" hollow standalone />,
            text: 'Small and hollow: never fished',
          },
          {
            key: 'catch',
            sample: (
              <svg width={12} height={12} aria-hidden="true" focusable="false">
                <path d="M 3 3 L 9 9 M 3 9 L 9 3" stroke="#1f2328" strokeWidth={1.5} />
              </svg>
            ),
            text: 'Cross: where a catch tied to a find was logged',
          },
        ]}
      />
    </div>
  );
}
