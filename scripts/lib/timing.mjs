// The bench's clock and order statistics, shared by its rows.

/** A start mark for `msSince` (the monotonic high-resolution clock, not the wall clock). */
export const mark = () => process.hrtime.bigint();

/** Milliseconds since `start` (a `mark()`). */
export const msSince = (start) => Number(process.hrtime.bigint() - start) / 1e6;

/** The q-quantile of an ascending list (nearest rank below: p50 of 100 values is the 51st). */
export function percentile(sorted, q) {
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
}

/** The median of a list in any order (its p50, as `percentile` reads it). */
export const median = (values) =>
  percentile(
    [...values].sort((a, b) => a - b),
    0.5,
  );
