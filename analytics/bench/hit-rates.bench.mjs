// Benchmark: hitRates over 1,000,000 generated catches on 10,000 finds, against a plain-loop
// implementation of the same result measured side by side in the same run. Invented data.
// Run: npm run bench -w @shoalbook/analytics (builds first, then runs this on dist/).
import { performance } from 'node:perf_hooks';
import { depthBand, hitRates, shrinkRates, wilsonInterval } from '../dist/index.js';

const FINDS = 10_000;
const CATCHES = 1_000_000;
const RUNS = 7;

// Deterministic generator (mulberry32) so every run measures the same data.
function random(seed) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function generate() {
  const rnd = random(20250510);
  const kinds = ['hard bottom', 'vegetation', 'bait', 'wood/brush', 'contour', 'man-made', 'other'];
  const finds = Array.from({ length: FINDS }, (_, i) => ({
    id: `find-${i}`,
    kind: kinds[Math.floor(rnd() * kinds.length)],
    depthFt: Math.round(rnd() * 400) / 10,
    hardness: 1 + Math.floor(rnd() * 5),
    waterTempF: 55 + Math.round(rnd() * 300) / 10,
    eventId: `event-${Math.floor(rnd() * 20)}`,
    lakeId: `lake-${Math.floor(rnd() * 5)}`,
    fished: rnd() < 0.8,
  }));
  const fates = ['weighed', 'culled', 'released', 'dead'];
  // Skewed toward a minority of finds, as real catches are; 2 % have no find.
  const catches = Array.from({ length: CATCHES }, (_, i) => ({
    id: i,
    findId: rnd() < 0.02 ? null : `find-${Math.floor(rnd() ** 2 * FINDS)}`,
    weightLb: Math.round((0.8 + rnd() * 6) * 100) / 100,
    fate: fates[Math.floor(rnd() * fates.length)],
    caughtAt: '2025-05-10T14:00:00.000Z',
  }));
  return { finds, catches };
}

/** The same result with plain loops and a Map for the grouping (no arquero). */
function plainLoopHitRates(finds, catches, keyOf) {
  const stats = new Map(finds.map((f) => [f.id, { fish: 0, weight: 0, weighed: 0, weighedWeight: 0 }]));
  for (const c of catches) {
    if (c.findId == null) continue;
    const s = stats.get(c.findId);
    if (!s) continue;
    s.fish++;
    if (c.weightLb != null) s.weight += c.weightLb;
    if (c.fate === 'weighed') {
      s.weighed++;
      if (c.weightLb != null) s.weighedWeight += c.weightLb;
    }
  }
  const groups = new Map();
  for (const f of finds) {
    const key = keyOf(f);
    const s = stats.get(f.id);
    let g = groups.get(key);
    if (!g)
      groups.set(
        key,
        (g = {
          key,
          finds: 0,
          findsFished: 0,
          findsWithFish: 0,
          findsWithWeighedFish: 0,
          fish: 0,
          fishWeightLb: 0,
          weighedFish: 0,
          weighedWeightLb: 0,
        }),
      );
    g.finds++;
    if (f.fished || s.fish > 0) g.findsFished++;
    if (s.fish > 0) g.findsWithFish++;
    if (s.weighed > 0) g.findsWithWeighedFish++;
    g.fish += s.fish;
    g.fishWeightLb += s.weight;
    g.weighedFish += s.weighed;
    g.weighedWeightLb += s.weighedWeight;
  }
  const rows = [...groups.values()];
  const hit = shrinkRates(rows.map((g) => ({ key: g.key, successes: g.findsWithFish, trials: g.findsFished })));
  const weighed = shrinkRates(
    rows.map((g) => ({ key: g.key, successes: g.findsWithWeighedFish, trials: g.findsFished })),
  );
  return rows.map((g, i) => ({
    ...g,
    hitRate: hit[i],
    weighedHitRate: weighed[i],
    interval: wilsonInterval(g.findsWithFish, g.findsFished),
  }));
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

function measure(label, run) {
  const t0 = performance.now();
  const out = run();
  return { label, ms: performance.now() - t0, out };
}

const { finds, catches } = generate();
const cases = [
  ['kind', { by: 'kind' }, (f) => f.kind],
  ['depthBand', { by: 'depthBand' }, (f) => depthBand(f.depthFt)],
];

console.log(
  `hitRates bench: ${CATCHES.toLocaleString('en-US')} catches on ${FINDS.toLocaleString('en-US')} finds, median of ${RUNS} runs (after 2 warm-up runs each)`,
);
for (const [name, options, keyOf] of cases) {
  for (let i = 0; i < 2; i++) {
    hitRates(finds, catches, options);
    plainLoopHitRates(finds, catches, keyOf);
  }
  const library = [];
  const plain = [];
  let check;
  for (let i = 0; i < RUNS; i++) {
    // Alternate so drift in the machine's load hits both alike.
    const a = measure('hitRates', () => hitRates(finds, catches, options));
    const b = measure('plain loop', () => plainLoopHitRates(finds, catches, keyOf));
    library.push(a.ms);
    plain.push(b.ms);
    check = [a.out, b.out];
  }
  // Same answer, or the comparison means nothing.
  const [ours, reference] = check;
  for (const g of ours) {
    const r = reference.find((x) => x.key === g.key);
    if (
      !r ||
      r.findsWithFish !== g.findsWithFish ||
      r.fish !== g.fish ||
      Math.abs(r.hitRate.shrunk - g.hitRate.shrunk) > 1e-12
    ) {
      throw new Error(`bench: results differ for group ${g.key}`);
    }
  }
  const libMs = median(library);
  const plainMs = median(plain);
  const rate = (ms) => Math.round(CATCHES / (ms / 1000)).toLocaleString('en-US');
  console.log(
    `by ${name.padEnd(10)} hitRates ${libMs.toFixed(1).padStart(7)} ms (${rate(libMs)} rows/s) | plain loop ${plainMs.toFixed(1).padStart(7)} ms (${rate(plainMs)} rows/s) | ratio ${(libMs / plainMs).toFixed(2)}× | ${ours.length} groups`,
  );
}
