/** The CLI's commands. Each returns an exit code; user errors are thrown as InputError/UsageError. */
import { readdir } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { loadRun } from '../../io/load-run.js';
import { loadConfig } from '../../io/load-config.js';
import { EXIT, InputError, UsageError, formatIssue } from '../../model/errors.js';
import { DEFAULT_CONFIG_PATH, resolveLimits, reviewFiles } from '../../io/review-from-files.js';
import { checkPredictions } from '../../artifact/predictions.js';
import {
  LIMIT_FLAGS,
  SETTING_FLAGS,
  parseFlags,
  parseFormat,
  parseLimits,
  parseOverrides,
} from './args.js';
import { DEMO_HELP, REVIEW_HELP, VALIDATE_HELP } from './help.js';
import type { CliIo } from './io.js';
import { renderReview } from './render.js';
import { isValidCommentKey } from '../../report/marker.js';

const REVIEW_FLAGS = {
  baseline: { type: 'string' },
  candidate: { type: 'string' },
  config: { type: 'string' },
  format: { type: 'string' },
  out: { type: 'string' },
  ...SETTING_FLAGS,
  ...LIMIT_FLAGS,
  'comment-key': { type: 'string' },
  help: { type: 'boolean', short: 'h' },
} as const;

export async function reviewCommand(argv: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseFlags(argv, REVIEW_FLAGS, 'review');
  if (values['help'] === true) {
    io.stdout(REVIEW_HELP);
    return EXIT.ok;
  }
  if (positionals.length > 0)
    throw new UsageError(
      `fitgap review: unexpected argument ${JSON.stringify(positionals[0])}. Name files with --baseline and --candidate.`,
    );
  const baseline = values['baseline'];
  const candidate = values['candidate'];
  if (typeof baseline !== 'string' || typeof candidate !== 'string') {
    throw new UsageError(
      "fitgap review: both --baseline FILE and --candidate FILE are required. Run 'fitgap review --help'.",
    );
  }
  const format = parseFormat(values['format'], 'review');
  const overrides = parseOverrides(values);
  const limits = parseLimits(values);
  const commentKey = values['comment-key'];
  if (typeof commentKey === 'string' && !isValidCommentKey(commentKey)) {
    throw new UsageError(
      `fitgap review: --comment-key must be 1-64 letters, digits, '.', '_' or '-' (got ${JSON.stringify(commentKey)}).`,
    );
  }
  const config = values['config'];
  const result = await reviewFiles({
    baseline,
    candidate,
    cwd: io.cwd,
    overrides,
    overrideLabel: (name) => `--${name}`,
    limits,
    ...(typeof config === 'string' ? { config } : {}),
  });
  const text = renderReview(result, format, {
    color: io.color && typeof values['out'] !== 'string',
    ...(typeof commentKey === 'string' ? { commentKey } : {}),
  });
  const out = values['out'];
  if (typeof out === 'string') {
    await io.writeFile(resolve(io.cwd, out), text, { file: out, inputs: result.read });
    io.stderr(
      `fitgap: review written to ${out} (gate ${result.review.gate.pass ? 'passed' : 'failed'}).\n`,
    );
  } else io.stdout(text);
  return result.review.gate.pass ? EXIT.ok : EXIT.gateFailed;
}

export async function validateCommand(argv: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseFlags(
    argv,
    { help: { type: 'boolean', short: 'h' }, config: { type: 'string' }, ...LIMIT_FLAGS },
    'validate',
  );
  if (values['help'] === true) {
    io.stdout(VALIDATE_HELP);
    return EXIT.ok;
  }
  if (positionals.length === 0)
    throw new UsageError("fitgap validate: name at least one file. Run 'fitgap validate --help'.");
  const given = parseLimits(values);
  // The same config as `review` would use: its epoch-log mapping and limits apply to the artifacts.
  const configName = typeof values['config'] === 'string' ? values['config'] : undefined;
  const loaded = await loadConfig(
    resolve(io.cwd, configName ?? DEFAULT_CONFIG_PATH),
    configName ?? DEFAULT_CONFIG_PATH,
    configName !== undefined,
    resolveLimits({}, given),
  );
  const config = loaded?.config ?? {};
  const limits = resolveLimits(config, given);
  const epochLog = config['epoch-log'];
  let failed = false;
  for (const file of positionals) {
    try {
      if (/\.ya?ml$/i.test(file)) {
        await loadConfig(resolve(io.cwd, file), file, true, limits);
        io.stdout(`${file}: valid config\n`);
      } else {
        const run = await loadRun(resolve(io.cwd, file), {
          displayName: file,
          limits,
          ...(epochLog === undefined ? {} : { epochLog }),
        });
        if (run.predictions !== null)
          await checkPredictions(run.predictions, run.artifact.metric.kind);
        io.stdout(
          `${file}: valid run artifact "${run.artifact.run.name}" (${run.artifact.splits.train.values.length} repeat(s))\n`,
        );
      }
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      failed = true;
      // Issues name the resolved path; show the file as the user typed it.
      for (const issue of error.issues.slice(0, 10))
        io.stderr(
          `${formatIssue({ ...issue, file: issue.file === resolve(io.cwd, file) ? file : issue.file })}\n`,
        );
      if (error.issues.length > 10)
        io.stderr(`…and ${error.issues.length - 10} more problems in ${file}.\n`);
    }
  }
  return failed ? EXIT.badInput : EXIT.ok;
}

export async function listDemos(demoDir: string): Promise<string[]> {
  const files = await readdir(demoDir);
  return files
    .filter((f) => f.endsWith('.json') && f !== 'baseline.json')
    .map((f) => f.replace(/\.json$/, ''))
    .sort();
}

export async function demoCommand(argv: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseFlags(
    argv,
    { help: { type: 'boolean', short: 'h' }, format: { type: 'string' } },
    'demo',
  );
  if (values['help'] === true) {
    io.stdout(DEMO_HELP);
    return EXIT.ok;
  }
  const names = await listDemos(io.demoDir);
  const first = names[0];
  if (first === undefined) throw new Error(`no demo candidates in ${io.demoDir}`);
  const name = positionals[0] ?? first;
  if (!names.includes(name))
    throw new UsageError(
      `fitgap demo: no demo named ${JSON.stringify(name)}; choose one of ${names.join(', ')}.`,
    );
  const format = parseFormat(values['format'], 'demo');
  const result = await reviewFiles({
    baseline: join(io.demoDir, 'baseline.json'),
    candidate: join(io.demoDir, `${name}.json`),
    config: join(io.demoDir, 'fitgap.yml'),
    cwd: io.cwd,
  });
  io.stdout(renderReview(result, format, { color: io.color }));
  if (format === 'text') {
    const others = names.filter((n) => n !== name);
    io.stdout(`\nDemo: Crumb & Co. baseline vs candidate "${name}". See the others with:\n`);
    for (const other of others) io.stdout(`  npm run -s demo -- ${other}\n`);
    io.stdout('Add --format markdown for the PR comment, or --format json for the report.\n');
  }
  // The demo shows the gate's verdict but succeeds: it is a showcase, not a check.
  return EXIT.ok;
}
