import { logFactorial } from './special.js';
import { assertCount } from './validate.js';

/**
 * Two-sided p-value of Fisher's exact test for the 2×2 table [[a, b], [c, d]].
 *
 * The two-sided value sums the hypergeometric probabilities of every table with the observed
 * margins that is no more probable than the observed one (the usual definition, as in R's
 * `fisher.test`), with a relative tolerance of 1e-7 so that ties lost to rounding still count.
 *
 * Source: R. A. Fisher (1935), The Design of Experiments, ch. II (the lady tasting tea).
 *
 * @param table `[[a, b], [c, d]]` of non-negative integer counts
 * @returns p in [0, 1]
 */
export function fisherExactTwoSided(table: readonly [readonly [number, number], readonly [number, number]]): number {
  const [[a, b], [c, d]] = table;
  for (const [name, v] of [
    ['a', a],
    ['b', b],
    ['c', c],
    ['d', d],
  ] as const)
    assertCount(`table cell ${name}`, v);
  const row1 = a + b;
  const row2 = c + d;
  const col1 = a + c;
  const n = row1 + row2;
  if (n === 0) return 1;
  const logDenominator =
    logFactorial(n) - logFactorial(row1) - logFactorial(row2) - logFactorial(col1) - logFactorial(n - col1);
  // log P(X = x) for the top-left cell x, margins fixed.
  const logP = (x: number) =>
    -logDenominator - logFactorial(x) - logFactorial(row1 - x) - logFactorial(col1 - x) - logFactorial(row2 - col1 + x);
  const lo = Math.max(0, col1 - row2);
  const hi = Math.min(row1, col1);
  const observed = logP(a);
  const threshold = observed + Math.log1p(1e-7);
  let p = 0;
  for (let x = lo; x <= hi; x++) {
    const lp = logP(x);
    if (lp <= threshold) p += Math.exp(lp);
  }
  return Math.min(1, p);
}
