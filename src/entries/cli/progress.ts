/**
 * The audit's progress bar (cli-progress) on standard error: drawn only when that stream is a
 * TTY and the user did not ask for quiet, removed when the audit ends.
 */
import cliProgress from 'cli-progress';

export interface Progress {
  update(done: number, total: number, label: string): void;
  stop(): void;
}

const SILENT: Progress = { update: () => undefined, stop: () => undefined };

export function auditProgress(
  stream: (NodeJS.WritableStream & { isTTY?: boolean }) | undefined,
  quiet: boolean,
): Progress {
  if (quiet || stream === undefined || stream.isTTY !== true) return SILENT;
  const bar = new cliProgress.SingleBar(
    {
      stream,
      format: 'fitgap audit [{bar}] {value}/{total} commits  {label}',
      clearOnComplete: true,
      hideCursor: false,
      barsize: 30,
      fps: 10,
    },
    cliProgress.Presets.shades_classic,
  );
  let started = false;
  return {
    update(done, total, label) {
      if (!started) {
        bar.start(total, done, { label });
        started = true;
      } else {
        bar.setTotal(total);
        bar.update(done, { label });
      }
    },
    stop() {
      if (started) {
        bar.update(bar.getTotal());
        bar.stop();
      }
    },
  };
}
