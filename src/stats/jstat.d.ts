/**
 * The part of jStat 1.9.x that fitgap uses. jStat ships no types; this declares only the calls made in
 * `distributions.ts`. Signatures read in node_modules/jstat/dist/jstat.js.
 */
declare module 'jstat' {
  interface JStatStatic {
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
  const jStat: JStatStatic;
  export default jStat;
}
