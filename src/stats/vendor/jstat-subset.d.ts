/**
 * Types of jstat-subset.js, the part of jStat 1.9.x that fitgap uses (jStat ships no types): the
 * calls made in `distributions.ts` and `noncentral-t.ts`. Signatures read in
 * node_modules/jstat/dist/jstat.js. The tests give the jstat package itself the same type
 * (test/stats/jstat.d.ts) to compare the two.
 */
export interface JStatSubset {
  /** Regularized incomplete beta I_x(a, b); `false` when x is outside [0, 1]. */
  ibeta(x: number, a: number, b: number): number | false;
  /** Natural log of the gamma function. */
  gammaln(x: number): number;
  studentt: {
    /** Quantile of Student's t with `dof` degrees of freedom. */
    inv(p: number, dof: number): number;
  };
  normal: {
    cdf(x: number, mean: number, std: number): number;
    inv(p: number, mean: number, std: number): number;
  };
  binomial: {
    /** P(X <= k), X ~ Binomial(n, p); rounded to 1e-10 absolute by jStat. */
    cdf(k: number, n: number, p: number): number;
  };
}
declare const jStat: JStatSubset;
export default jStat;
