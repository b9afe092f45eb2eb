/** Names of the significance tests fitgap reports (DESIGN.md §4). */
export type TestName =
  'welch-t' | 'z-binomial' | 'mcnemar-exact' | 'paired-t' | 'newcombe-score' | 'none';

/** A two-sided interval [low, high]. */
export type Interval = [number, number];

/** Result of one significance test on a difference (candidate − baseline). */
export interface TestResult {
  estimate: number;
  /** 1 − alpha interval of the estimate; null when the noise is unknown. */
  ci: Interval | null;
  /** Two-sided p-value; null when the noise is unknown. */
  p: number | null;
  test: TestName;
  /** Degrees of freedom, for t tests. */
  df?: number;
  /** Test statistic (t or z), where one exists. */
  statistic?: number;
}
