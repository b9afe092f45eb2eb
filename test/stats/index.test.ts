import { describe, expect, it } from 'vitest';
import * as stats from '../../src/stats/index.js';

describe('src/stats public surface', () => {
  it('exports exactly the documented functions', () => {
    expect(Object.keys(stats).sort()).toEqual([
      'RunningStats',
      'binomialCdf',
      'binomialVariance',
      'holmAdjust',
      'mcnemarExact',
      'mean',
      'normalCdf',
      'normalQuantile',
      'normalTest',
      'oneSampleT',
      'pairedT',
      'sampleVariance',
      'tCdf',
      'tQuantile',
      'twoProportionZ',
      'welchT',
      'wilsonInterval',
    ]);
  });
});
