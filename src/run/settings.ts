/**
 * The settings of one run, the same whether it comes from the command line or the action.
 * `args.ts` (CLI) and `inputs.ts` (action) are the only producers.
 */

/** What a run checks and how it decides. */
export interface Settings {
  /** Repository root: its real path (absolute, every symbolic link resolved; `args.ts` and `inputs.ts` resolve it). Nothing outside it is read. */
  root: string;
  /** Settings file, repository-relative. Default `fitgate.yml`. */
  config: string;
  /** True when the settings file was named explicitly (then it must exist). Default false. */
  configExplicit: boolean;
  /** Descriptor paths given explicitly, repository-relative; empty = every model the settings match. */
  descriptors: string[];
  /** `fail` (default): only fail limits fail the run; `warn`: warnings fail it too. */
  failOn: 'fail' | 'warn';
}

/** Default settings for a repository root. */
export function defaultSettings(root: string): Settings {
  return { root, config: 'fitgate.yml', configExplicit: false, descriptors: [], failOn: 'fail' };
}
