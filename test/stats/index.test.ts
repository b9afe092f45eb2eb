import { describe, expect, it } from 'vitest';
import * as stats from '../../src/stats/index.js';

describe('src/stats public surface', () => {
  it('exports exactly the documented functions', () => {
    expect(Object.keys(stats).sort()).toEqual(
      [
        'MAX_REPEATS',
        'ROUNDOFF_RELATIVE',
        'RunningStats',
        'binomialCdf',
        'binomialSamplingVariance',
        'binomialVariance',
        'compareSplitMeans',
        'holmAdjust',
        'logRatio',
        'mcnemarExact',
        'mdeMcNemar',
        'mdeMeans',
        'mdePaired',
        'mdeTwoProportions',
        'mean',
        'nonInferiorityCalls',
        'nonInferiorityTest',
        'newcombeDifference',
        'newcombeInterval',
        'noncentralityFor',
        'normalCdf',
        'normalQuantile',
        'normalTest',
        'oneSampleT',
        'pairedT',
        'pairsNeeded',
        'perExampleSamplingVariance',
        'powerTwoProportions',
        'repeatsNeeded',
        'rowsNeededMcNemar',
        'rowsNeededTwoProportions',
        'sampleVariance',
        'satterthwaite',
        'splitNoise',
        'tCdf',
        'tQuantile',
        'tTestPower',
        'twoProportionZ',
        'welchT',
        'welchWorsening',
        'wilsonAtZ',
        'wilsonInterval',
      ].sort(),
    );
  });
});
