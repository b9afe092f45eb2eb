/** What the CLI needs from the outside world, passed in so tests can hand in fakes. */
import type { ReadFile } from '../../io/load-run.js';

export interface CliIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  /** Colour allowed (a TTY and NO_COLOR unset). */
  color: boolean;
  cwd: string;
  /** Writes `--out`; must refuse to overwrite any of `inputs` (the entry uses `io/write-output.ts`). */
  writeFile: (
    path: string,
    text: string,
    options: { file: string; inputs: readonly ReadFile[] },
  ) => Promise<void>;
  /** Folder holding the bundled demo scenario. */
  demoDir: string;
  version: string;
  /** Standard error as a stream, for the audit's progress bar (drawn only when it is a TTY). */
  stderrStream?: NodeJS.WritableStream & { isTTY?: boolean; columns?: number };
  /** The environment variables a command may read (`GITHUB_TOKEN`, `GITHUB_API_URL`). */
  env?: Readonly<Record<string, string | undefined>>;
  /** The clock, for the audit record's `recordedAt`. @default () => new Date() */
  now?: () => Date;
  /** Folder for temporary files. @default os.tmpdir() */
  tempDir?: string;
}
