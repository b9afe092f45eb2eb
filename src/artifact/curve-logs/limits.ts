/** Bounds on what the training-log readers accept, so a huge or hostile file fails early and clearly. */

/** Points over all series of one import. */
export const MAX_POINTS = 1_000_000;
/** Series (columns, tags, metric files, eval-set metrics) over one import. */
export const MAX_SERIES = 10_000;
/** Bytes of one text log (CSV, MLflow metric file, evals_result JSON). */
export const MAX_TEXT_BYTES = 64 * 1024 * 1024;
/** Bytes of one TensorBoard event file (they also hold histograms and images, so allow more). */
export const MAX_EVENT_FILE_BYTES = 512 * 1024 * 1024;
