/** Statistics layer: pure functions over jStat, no I/O. */
export { binomialCdf, normalCdf, normalQuantile, tCdf, tQuantile } from './distributions.js';
export { mean, RunningStats, sampleVariance } from './descriptive.js';
export { oneSampleT, pairedT, pooledT, welchT } from './t-tests.js';
export type { PooledTestResult } from './t-tests.js';
export {
  binomialVariance,
  mcnemarExact,
  normalTest,
  twoProportionZ,
  wilsonInterval,
} from './proportions.js';
export { holmAdjust } from './holm.js';
export { nonInferiorityCalls, nonInferiorityTest, welchWorsening } from './non-inferiority.js';
export type {
  NonInferiorityCall,
  NonInferiorityTest,
  WorseningEstimate,
} from './non-inferiority.js';
export { logRatio } from './ratio.js';
export type { RatioEstimate } from './ratio.js';
export type { Interval, TestName, TestResult } from './types.js';
