import type { HyperparameterRolesConfig } from './hyperparameter-roles.js';

/** The config file (`.github/fitgap.yml`), as written by the user (kebab-case keys). */
export interface ConfigFile {
  alpha?: number;
  'min-effect'?: number;
  'gap-tolerance'?: number;
  reference?: number;
  'fail-on'?: string[];
  'epoch-log'?: EpochLogMapping;
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
