/**
 * What the action does to the runner, as one small interface so the orchestration takes it as a
 * parameter. The entry builds it from `@actions/core`.
 */
import * as core from '@actions/core';

export interface ActionIO {
  setOutput(name: string, value: string): void;
  info(message: string): void;
  /** An annotation; GitHub shows at most 10 per step. */
  warning(message: string): void;
  /** Marks the step failed (exit code 1); code after it still runs. */
  setFailed(message: string): void;
  /** Appends markdown to the job summary. */
  appendSummary(markdown: string): Promise<void>;
}

export function coreIO(): ActionIO {
  return {
    setOutput: (name, value) => core.setOutput(name, value),
    info: (message) => core.info(message),
    warning: (message) => core.warning(message),
    setFailed: (message) => core.setFailed(message),
    appendSummary: async (markdown) => {
      await core.summary.addRaw(markdown, true).write();
    },
  };
}
