/** What the CLI needs from the outside world, passed in so tests can hand in fakes. */
export interface CliIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  /** Colour allowed (a TTY and NO_COLOR unset). */
  color: boolean;
  cwd: string;
  writeFile: (path: string, text: string) => Promise<void>;
  /** Folder holding the bundled demo scenario. */
  demoDir: string;
  version: string;
}
