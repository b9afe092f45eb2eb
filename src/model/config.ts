import type { HyperparameterRolesConfig } from './hyperparameter-roles.js';

/** The config file (`.github/fitgap.yml`), as written by the user (kebab-case keys). */
export interface ConfigFile {
  alpha?: number;
  'min-effect'?: number;
  'gap-tolerance'?: number;
  reference?: number;
  /** Outcomes that fail the gate (a list, or one text separated by commas or new lines). */
  'fail-on'?: string[];
  'epoch-log'?: EpochLogMapping;
  /** Byte limits of the input files, in MB (the config file's own limit is set by flag or input). */
  limits?: { 'artifact-mb'?: number; 'csv-mb'?: number };
  /** Non-inferiority margins by guardrail name. */
  guardrails?: Record<string, { margin: number }>;
  /** Roles of hyperparameter names, laid over the built-in vocabulary. */
  hyperparameters?: HyperparameterRolesConfig;
}

/** Maps the columns of a CSV epoch log (e.g. `epoch,train_loss,val_loss`) onto `curves.epochs`. */
export interface EpochLogMapping {
  /** CSV file name, relative to each artifact's folder. */
  file: string;
  x: string;
  train?: string;
  validation: string;
}
