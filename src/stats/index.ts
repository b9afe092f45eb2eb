/** Statistics layer: pure functions over jStat, no I/O. */
export { binomialCdf, normalCdf, normalQuantile, tCdf, tQuantile } from './distributions.js';
export { mean, RunningStats, sampleVariance } from './descriptive.js';
export { oneSampleT, pairedT, welchT } from './t-tests.js';
export {
  binomialVariance,
  mcnemarExact,
  normalTest,
  twoProportionZ,
  wilsonInterval,
} from './proportions.js';
export { holmAdjust } from './holm.js';
export type { Interval, TestName, TestResult } from './types.js';
