/** Help texts of the CLI; pinned by tests. */
export const MAIN_HELP = `fitgap - bias/variance review of a model-training change

Usage:
  fitgap review --baseline FILE --candidate FILE [options]
  fitgap validate FILE...
  fitgap audit --range A..B --artifact PATH [options]
  fitgap audit --repo OWNER/NAME --pull-request N [options]
  fitgap demo [NAME]
  fitgap curves import --from FORMAT PATH... --out FILE
  fitgap --version

Commands:
  review     compare two run artifacts and print the review
  validate   check run artifacts (.json) or config files (.yml) and exit
  audit      re-run reviews over a git range, or a past pull request's review
  demo       review the bundled demo scenario
  curves     import a training log (CSV, TensorBoard, MLflow, evals_result) as a curve

Run 'fitgap COMMAND --help' for the options of a command.

Exit codes: 0 review done and gate passed; 1 gate failed; 2 bad input or usage.
A verdict is advice for a human reviewer, not a proof.
`;

export const REVIEW_HELP = `Usage: fitgap review --baseline FILE --candidate FILE [options]

Compare a candidate training run with its baseline: error decomposition, significance of
each change, movement in the bias/variance plane, and the next levers to try.

Options:
  --baseline FILE       baseline run artifact (fitgap-run/1 JSON)
  --candidate FILE      candidate run artifact (fitgap-run/1 JSON)
  --config FILE         config file (default: .github/fitgap.yml when it exists)
  --format FORMAT       text (default), markdown or json
  --out FILE            write the review to FILE instead of standard output
  --alpha N             significance level, 0.000001 to 0.5 (default 0.05)
  --min-effect N        smallest change that counts, in metric units (default 0)
  --gap-tolerance N     component present at N x validation error, 0 to 1 (default 0.10)
  --reference N         reference level (human-level or Bayes error) for both runs
  --fail-on LIST        outcomes that fail the gate, separated by commas or new lines
                        (default worse-validation; 'none' never fails; never empty)
  --comment-key KEY     key of the hidden marker in markdown output (default 'default')
  --max-artifact-mb N   largest run artifact or epoch log read (default 16)
  --max-config-mb N     largest config file read (default 1)
  --max-csv-mb N        largest predictions CSV read (default 512)
  -h, --help            show this help

Outcomes for --fail-on: worse-validation, toward-overfitting, toward-underfitting,
worse-on-both, any-movement, slice-regression, high-bias, high-variance, data-mismatch,
validation-overfit, guardrail-regression, guardrail-undetermined, none, and FIELD-ratio>X
for a cost (train-seconds, inference-ms, parameters, memory-mb), e.g. train-seconds-ratio>2.

Flags override the config file. Exit codes: 0 gate passed; 1 gate failed; 2 bad input.
`;

export const VALIDATE_HELP = `Usage: fitgap validate [--config FILE] FILE...

Check run artifacts (.json, with their predictions CSV and, when the config maps one, their
epoch log) and config files (.yml, .yaml): everything 'fitgap review' would check.
Prints one line per file; exit code 0 when all are valid, 2 otherwise.

Options:
  --config FILE         config whose epoch-log mapping and limits apply
                        (default: .github/fitgap.yml when it exists)
  --max-artifact-mb N, --max-config-mb N, --max-csv-mb N   file limits, as for review
`;

export const DEMO_HELP = `Usage: fitgap demo [NAME] [--format text|markdown|json]

Review a bundled demo scenario: a fictional bakery chain's model that predicts whether an
order will be late. Without NAME, the first candidate is reviewed and the others are listed.
`;

export const AUDIT_HELP = `Usage: fitgap audit --range A..B --artifact PATH [options]
       fitgap audit --repo OWNER/NAME --pull-request N [options]
       fitgap audit --repo OWNER/NAME --base COMMIT --head COMMIT [options]

Re-run reviews on history. With --range, walk the commits of A..B oldest first (as
'git log --reverse A..B' lists them), read the run artifact at each commit from git and review
each against the previous commit that had a valid artifact (the first against A). A commit
whose artifact is missing, invalid or unchanged is listed with the reason and skipped.
With --repo, re-run a past pull request's review from the GitHub API (token in GITHUB_TOKEN,
API base in GITHUB_API_URL, default https://api.github.com).

Range options:
  --range A..B          commits to audit (A is the starting baseline, not reviewed itself)
  --artifact PATH       the run artifact's path, relative to the current folder
  --against WHICH       previous (default): each against the previous valid artifact;
                        first: each against the first valid artifact
  --max-file-mb N       largest file read from history or the API (default 64)
  -q, --quiet           no progress bar (it is drawn on standard error only on a terminal)

GitHub options:
  --repo OWNER/NAME     repository of the pull request
  --pull-request N      the pull request: its base commit's run against its head's
  --base, --head COMMIT two commits instead of a pull request
  --artifact PATH       the run artifact as a committed file at each commit, or
  --run-artifact NAME   the artifact of a successful run of --workflow for each commit
  --workflow FILE       workflow file (train.yml) or id whose runs upload --run-artifact

Common options:
  --format FORMAT       text (default), markdown (trend table and chart) or json
                        (JSON Lines: one record per reviewed commit)
  --out FILE            write to FILE instead of standard output
  --config FILE         config file (default: .github/fitgap.yml when it exists)
  --alpha N, --min-effect N, --gap-tolerance N, --reference N   as for 'fitgap review'
  --fail-on LIST        exit 1 when any reviewed commit meets one of these outcomes
  -h, --help            show this help

Exit codes: 0 audit ran; 1 --fail-on outcomes occurred; 2 bad usage or input (not a git
repository, a bad range, an unreadable path, a missing artifact on GitHub).
`;
