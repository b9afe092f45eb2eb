/** File names inside the pull-request bundle (see `bundle.ts`), without the code that writes it. */
export const REVIEW_FILE = 'review.json';
export const PULL_REQUEST_FILE = 'pull-request.json';
export const RUN_FILE = 'run.json';
export const PREDICTIONS_FILE = 'predictions.csv';
