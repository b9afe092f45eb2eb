/** Statistics layer: pure functions over jStat, no I/O. */
export { binomialCdf, normalCdf, normalQuantile, tCdf, tQuantile } from './distributions.js';
export { mean, RunningStats, sampleVariance } from './descriptive.js';
export { oneSampleT, pairedT, welchT } from './t-tests.js';
export {
  binomialVariance,
  mcnemarExact,
  normalTest,
  twoProportionZ,
  wilsonAtZ,
  wilsonInterval,
} from './proportions.js';
export { newcombeDifference, newcombeInterval } from './proportion-difference.js';
export type { ProportionDifference } from './proportion-difference.js';
export { holmAdjust } from './holm.js';
export { nonInferiorityCalls, nonInferiorityTest, welchWorsening } from './non-inferiority.js';
export type {
  NonInferiorityCall,
  NonInferiorityTest,
  WorseningEstimate,
} from './non-inferiority.js';
export { logRatio } from './ratio.js';
export type { RatioEstimate } from './ratio.js';
export {
  binomialSamplingVariance,
  compareSplitMeans,
  perExampleSamplingVariance,
  ROUNDOFF_RELATIVE,
  satterthwaite,
  splitNoise,
} from './split-noise.js';
export type {
  EvaluationRows,
  ExampleAggregate,
  NoiseBasis,
  SamplingVariance,
  SplitNoise,
  SplitNoiseInput,
} from './split-noise.js';
export type { Interval, TestName, TestResult } from './types.js';
export {
  MAX_REPEATS,
  mdeMcNemar,
  mdeMeans,
  mdePaired,
  mdeTwoProportions,
  pairsNeeded,
  powerTwoProportions,
  repeatsNeeded,
  rowsNeededMcNemar,
  rowsNeededTwoProportions,
} from './power.js';
export { noncentralityFor, tTestPower } from './noncentral-t.js';
export type { ArmNoise, NoRepeatsReason, RepeatsNeeded } from './power.js';
