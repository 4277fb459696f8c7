// Minimal typings for the parts of jstat the tests use as a reference (it ships none).
declare module 'jstat' {
  export const jStat: {
    gammaln(x: number): number;
    betaln(a: number, b: number): number;
    normal: { cdf(x: number, mean: number, sd: number): number; inv(p: number, mean: number, sd: number): number };
    beta: { mean(a: number, b: number): number };
  };
}
