import * as aq from 'arquero';
import {
  DEFAULT_DEPTH_BAND_EDGES_FT,
  DEFAULT_TEMPERATURE_BAND_EDGES_F,
  depthBand,
  depthBandLabels,
  temperatureBand,
  temperatureBandLabels,
} from '../geo/bands.js';
import { shrinkRates, type GroupKey } from './shrinkage.js';
import { assertConfidence } from './validate.js';

/** Fate of a caught fish, as recorded in the journal. */
export type CatchFate = 'weighed' | 'culled' | 'released' | 'dead';

/**
 * A find (a place marked in practice) as `hitRates` reads it. Only `id` is required; any other
 * field may be used as a grouping key.
 */
export interface FindInput {
  id: string | number;
  /** Kind of place (hard bottom, vegetation, bait, …). */
  kind?: string | null;
  /** Sub-kind (shell, rock, eelgrass, …). */
  subKind?: string | null;
  /** Depth in feet. */
  depthFt?: number | null;
  /** Bottom hardness grade 1–5. */
  hardness?: number | null;
  /** Water temperature in °F. */
  waterTempF?: number | null;
  eventId?: string | number | null;
  lakeId?: string | number | null;
  /** Solunar period the find was fished in, e.g. from {@link solunarPeriodAt} ('major' | 'minor' | 'none'). */
  solunarPeriod?: string | null;
  /** True when the find was fished on a competition day; a find with a catch counts as fished anyway. */
  fished?: boolean | null;
  [field: string]: unknown;
}

/** A caught fish as `hitRates` reads it. */
export interface CatchInput {
  id: string | number;
  /** The find the fish came from; `null` or an id not among the finds leaves it out. */
  findId: string | number | null;
  /** Weight in pounds (decimal); absent when not weighed. */
  weightLb?: number | null;
  fate?: CatchFate | null;
  /** ISO-8601 UTC instant. */
  caughtAt?: string | null;
  [field: string]: unknown;
}

/** A rate with its Wilson interval and its empirical-Bayes shrunk value (fractions). */
export interface RateSummary {
  /** Share of finds fished that qualified (NaN when none was fished). */
  rate: number;
  lower: number;
  upper: number;
  shrunk: number;
}

/** One group of finds in the result of {@link hitRates}. */
export interface HitRateGroup {
  key: GroupKey;
  /** Finds in the group. */
  finds: number;
  /** Finds fished (flagged `fished`, or with at least one catch). */
  findsFished: number;
  /** Finds that produced at least one fish of any fate. */
  findsWithFish: number;
  /** Finds that produced at least one fish with fate 'weighed'. */
  findsWithWeighedFish: number;
  /** Fish caught on the group's finds. */
  fish: number;
  /** Total weight of those fish in pounds (fish without a weight add nothing). */
  fishWeightLb: number;
  /** Fish weighed in (fate 'weighed'). */
  weighedFish: number;
  /** Weight of the weighed fish in pounds. */
  weighedWeightLb: number;
  /** findsWithFish / findsFished. */
  hitRate: RateSummary;
  /** findsWithWeighedFish / findsFished. */
  weighedHitRate: RateSummary;
}

/** How to group finds: a field name of the find, a derived band, or a function of the find. */
export type HitRateGrouping<F extends FindInput = FindInput> =
  'depthBand' | 'temperatureBand' | (keyof F & string) | ((find: F) => GroupKey | undefined);

export interface HitRateOptions<F extends FindInput = FindInput> {
  /**
   * Grouping: a field of the find (`'kind'`, `'subKind'`, `'hardness'`, `'eventId'`, `'lakeId'`,
   * `'solunarPeriod'`, …), `'depthBand'` / `'temperatureBand'` (derived from `depthFt` /
   * `waterTempF` with {@link depthBand} / {@link temperatureBand} unless the find carries that
   * field itself), or a function returning the key. Missing values group under `null`.
   */
  by: HitRateGrouping<F>;
  /** Wilson interval level, default 0.95. */
  confidence?: number;
  /** Depth band edges in feet for `'depthBand'`. */
  depthBandEdgesFt?: readonly number[];
  /** Temperature band edges in °F for `'temperatureBand'`. */
  temperatureBandEdgesF?: readonly number[];
}

function keyFunction<F extends FindInput>(options: HitRateOptions<F>): (find: F) => GroupKey {
  const { by } = options;
  if (typeof by === 'function') return (f) => by(f) ?? null;
  if (by === 'depthBand') {
    const edges = options.depthBandEdgesFt ?? DEFAULT_DEPTH_BAND_EDGES_FT;
    return (f) => ('depthBand' in f ? ((f['depthBand'] as GroupKey) ?? null) : depthBand(f.depthFt, edges));
  }
  if (by === 'temperatureBand') {
    const edges = options.temperatureBandEdgesF ?? DEFAULT_TEMPERATURE_BAND_EDGES_F;
    return (f) =>
      'temperatureBand' in f ? ((f['temperatureBand'] as GroupKey) ?? null) : temperatureBand(f.waterTempF, edges);
  }
  return (f) => (f[by] as GroupKey | undefined) ?? null;
}

function keyOrder<F extends FindInput>(options: HitRateOptions<F>): (a: GroupKey, b: GroupKey) => number {
  let bandOrder: string[] | null = null;
  if (options.by === 'depthBand') bandOrder = depthBandLabels(options.depthBandEdgesFt);
  if (options.by === 'temperatureBand') bandOrder = temperatureBandLabels(options.temperatureBandEdgesF);
  return (a, b) => {
    if (a === b) return 0;
    if (a === null) return 1;
    if (b === null) return -1;
    if (bandOrder) {
      const ia = bandOrder.indexOf(String(a));
      const ib = bandOrder.indexOf(String(b));
      if (ia !== ib) return (ia < 0 ? Infinity : ia) - (ib < 0 ? Infinity : ib);
    }
    if (typeof a === 'number' && typeof b === 'number') return a - b;
    return String(a).localeCompare(String(b), 'en', { numeric: true });
  };
}

/**
 * Hit rates of groups of finds: how many finds of each group were fished, produced a fish, and
 * produced a weighed fish, with the fish count and weight, the Wilson score interval of each
 * rate and its empirical-Bayes shrunk value (shrinkage toward the rate over all the finds given).
 *
 * Catches are first summed per find in one pass (typed arrays), then the finds are grouped and
 * rolled up with arquero, so a million catches cost one loop. Catches without a find, or whose
 * find is not in `finds`, are left out.
 *
 * @example hitRates(finds, catches, { by: 'kind' })
 * @example hitRates(finds, catches, { by: (f) => `${f.kind} / ${f.subKind}` })
 * @returns groups sorted by key (bands shallow→deep / cold→warm, numbers ascending, `null` last)
 * @throws RangeError on duplicate find ids or a negative or non-finite catch weight
 */
export function hitRates<F extends FindInput>(
  finds: readonly F[],
  catches: readonly CatchInput[],
  options: HitRateOptions<F>,
): HitRateGroup[] {
  const confidence = options.confidence ?? 0.95;
  assertConfidence(confidence);
  const keyOf = keyFunction(options);

  const count = finds.length;
  const indexById = new Map<string | number, number>();
  for (let i = 0; i < count; i++) {
    const id = finds[i].id;
    if (indexById.has(id)) throw new RangeError(`duplicate find id ${String(id)}`);
    indexById.set(id, i);
  }

  const fish = new Float64Array(count);
  const weight = new Float64Array(count);
  const weighedFish = new Float64Array(count);
  const weighedWeight = new Float64Array(count);
  for (let c = 0; c < catches.length; c++) {
    const caught = catches[c];
    if (caught.findId === null || caught.findId === undefined) continue;
    const i = indexById.get(caught.findId);
    if (i === undefined) continue;
    const w = caught.weightLb;
    const hasWeight = w !== null && w !== undefined;
    if (hasWeight && !(Number.isFinite(w) && w >= 0)) {
      throw new RangeError(`catch ${String(caught.id)}: weightLb must be a non-negative number, got ${w}`);
    }
    fish[i]++;
    if (hasWeight) weight[i] += w;
    if (caught.fate === 'weighed') {
      weighedFish[i]++;
      if (hasWeight) weighedWeight[i] += w;
    }
  }

  const keys: GroupKey[] = new Array(count);
  const fished = new Float64Array(count);
  const withFish = new Float64Array(count);
  const withWeighed = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    keys[i] = keyOf(finds[i]);
    withFish[i] = fish[i] > 0 ? 1 : 0;
    withWeighed[i] = weighedFish[i] > 0 ? 1 : 0;
    fished[i] = finds[i].fished === true || fish[i] > 0 ? 1 : 0;
  }

  const rolled = aq
    .table({ key: keys, fished, withFish, withWeighed, fish, weight, weighedFish, weighedWeight })
    .groupby('key')
    .rollup({
      finds: aq.op.count(),
      findsFished: aq.op.sum('fished'),
      findsWithFish: aq.op.sum('withFish'),
      findsWithWeighedFish: aq.op.sum('withWeighed'),
      fish: aq.op.sum('fish'),
      fishWeightLb: aq.op.sum('weight'),
      weighedFish: aq.op.sum('weighedFish'),
      weighedWeightLb: aq.op.sum('weighedWeight'),
    })
    .objects() as Omit<HitRateGroup, 'hitRate' | 'weighedHitRate'>[];

  const order = keyOrder(options);
  rolled.sort((a, b) => order(a.key, b.key));

  const hit = shrinkRates(
    rolled.map((g) => ({ key: g.key, successes: g.findsWithFish, trials: g.findsFished })),
    confidence,
  );
  const weighed = shrinkRates(
    rolled.map((g) => ({ key: g.key, successes: g.findsWithWeighedFish, trials: g.findsFished })),
    confidence,
  );
  const summary = (r: (typeof hit)[number]): RateSummary => ({
    rate: r.rate,
    lower: r.lower,
    upper: r.upper,
    shrunk: r.shrunk,
  });
  return rolled.map((g, i) => ({
    key: g.key,
    finds: g.finds,
    findsFished: g.findsFished,
    findsWithFish: g.findsWithFish,
    findsWithWeighedFish: g.findsWithWeighedFish,
    fish: g.fish,
    fishWeightLb: roundNoise(g.fishWeightLb),
    weighedFish: g.weighedFish,
    weighedWeightLb: roundNoise(g.weighedWeightLb),
    hitRate: summary(hit[i]),
    weighedHitRate: summary(weighed[i]),
  }));
}

/** Removes binary floating-point noise from sums of decimal pounds (keeps 1e-6 lb). */
function roundNoise(lb: number): number {
  return Math.round(lb * 1e6) / 1e6;
}
