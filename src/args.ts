/**
 * The command line: the only reader of argv. Produces the same {@link Settings} the action's
 * `inputs.ts` does, plus the CLI's own output options.
 */
import { Command, CommanderError, Option } from 'commander';
import path from 'node:path';
import { InputError } from './errors.js';
import type { Settings } from './settings.js';
import { parseShard, type Shard } from './shard.js';
import { VERSION } from './version.js';

/** Output formats of `fitgate check`. */
export type OutputFormat = 'text' | 'json' | 'markdown';

/** A parsed `fitgate check` command. */
export interface CheckCommand {
  kind: 'check';
  settings: Settings;
  /** Output format. Default `text`. */
  format: OutputFormat;
  /** Write the report to this file instead of standard output (path as given). */
  out: string | null;
  /** Colour: true/false forced, null = only on a terminal. */
  color: boolean | null;
  /** Print stack traces of unexpected errors. */
  debug: boolean;
  /** Compare with the models as they are on this git revision (`--base`), or null. */
  base: string | null;
  /** Check only this share of the models (`--shard K/N`), or null for all. */
  shard: Shard | null;
  /** Worker threads for models (`--jobs N`); null = one per core. */
  jobs: number | null;
  /** Write the HTML report into this folder (`--html DIR`, path as given), or null. */
  html: string | null;
  /** Write a SARIF 2.1.0 log to this file (`--sarif FILE`), or null. */
  sarif: string | null;
  /** Write a JUnit XML report to this file (`--junit FILE`), or null. */
  junit: string | null;
}

/** A parsed `fitgate merge` command: join shard JSON reports into one. */
export interface MergeCommand {
  kind: 'merge';
  /** Report files, absolute paths, in the order given. */
  reports: string[];
  /** Output format. Default `text`. */
  format: OutputFormat;
  /** Write the report to this file instead of standard output (path as given). */
  out: string | null;
  /** Colour: true/false forced, null = only on a terminal. */
  color: boolean | null;
  /** `fail` (default) or `warn`: what makes the exit status 1, as for check. */
  failOn: 'fail' | 'warn';
  /** Print stack traces of unexpected errors. */
  debug: boolean;
  /** File reports of the joined result, as for check (paths as given), or null. */
  html: string | null;
  sarif: string | null;
  junit: string | null;
}

/** Reads `--jobs`: a whole number >= 1. */
function parseJobs(value: unknown): number | null {
  if (value === undefined) return null;
  const text = String(value);
  const n = Number(text);
  if (!/^\s*\d+\s*$/.test(text) || !Number.isSafeInteger(n) || n < 1) {
    throw new InputError('jobs-value', `expected a whole number of worker threads >= 1, got ${JSON.stringify(text)}`, { key: '--jobs' });
  }
  return n;
}

/** What the command line asked for: a command to run, or text to print (help, version). */
export type Parsed = CheckCommand | MergeCommand | { kind: 'print'; text: string; status: 0 | 2 };

/**
 * Parses argv (without `node` and the script).
 * @param argv arguments
 * @param cwd the working directory paths are relative to
 */
export function parseArgs(argv: string[], cwd: string): Parsed {
  let printed = '';
  let parsed: CheckCommand | MergeCommand | null = null;
  const program = new Command('fitgate')
    .description('Refit committed regression models, re-score them on their hold-out rows, and fail when they overfit.')
    .version(VERSION, '-V, --version')
    .exitOverride()
    .configureOutput({ writeOut: (s) => (printed += s), writeErr: (s) => (printed += s) })
    .showHelpAfterError('(run `fitgate check --help` for the options)');
  program
    .command('check')
    .description('Check models against their limits. Exit status: 0 within limits, 1 a model over a limit, 2 the run could not be done.')
    .argument('[descriptor...]', 'model descriptors to check (default: every model the settings file matches)')
    .option('--root <dir>', 'repository root; nothing outside it is read', '.')
    .option('--config <file>', 'settings file, relative to the root', 'fitgate.yml')
    .addOption(new Option('--format <format>', 'report format').choices(['text', 'json', 'markdown']).default('text'))
    .option('--out <file>', 'write the report to a file instead of standard output')
    .addOption(new Option('--fail-on <level>', 'what fails the run').choices(['fail', 'warn']).default('fail'))
    .option('--color', 'force colours in the text report')
    .option('--no-color', 'never use colours')
    .option('--base <ref>', 'also check the models as they are on this git commit and compare (hold-out RMSE, gap ratio, the base_change limit)')
    .option('--shard <K/N>', 'check only share K of N of the models (descriptors sorted by path, dealt round-robin); join the JSON reports with `fitgate merge`')
    .option('--jobs <n>', 'worker threads to run models on (default: one per core; 1 = serial)')
    .option('--html <dir>', 'also write the HTML report (index.html, self-contained) into this folder')
    .option('--sarif <file>', 'also write a SARIF 2.1.0 log for code scanning to this file')
    .option('--junit <file>', 'also write a JUnit XML report to this file')
    .option('--debug', 'print stack traces of unexpected errors', false)
    .exitOverride()
    .configureOutput({ writeOut: (s) => (printed += s), writeErr: (s) => (printed += s) })
    .action((descriptors: string[], o: Record<string, unknown>, cmd: Command) => {
      const root = path.resolve(cwd, String(o.root));
      const explicit = cmd.getOptionValueSource('config') === 'cli';
      parsed = {
        kind: 'check',
        settings: {
          root,
          config: toRepoPath(root, path.resolve(root, String(o.config)), String(o.config), '--config'),
          configExplicit: explicit,
          descriptors: descriptors.map((d) => toRepoPath(root, path.resolve(cwd, d), d, d)),
          failOn: o.failOn === 'warn' ? 'warn' : 'fail',
        },
        format: o.format as OutputFormat,
        out: typeof o.out === 'string' ? o.out : null,
        color: cmd.getOptionValueSource('color') === 'cli' ? Boolean(o.color) : null,
        debug: Boolean(o.debug),
        base: typeof o.base === 'string' && o.base !== '' ? o.base : null,
        shard: typeof o.shard === 'string' ? parseShard(o.shard, '--shard') : null,
        jobs: parseJobs(o.jobs),
        html: typeof o.html === 'string' ? o.html : null,
        sarif: typeof o.sarif === 'string' ? o.sarif : null,
        junit: typeof o.junit === 'string' ? o.junit : null,
      };
    });
  program
    .command('merge')
    .description('Join the JSON reports of `fitgate check --shard K/N --format json` jobs into one report. Exit status as for check.')
    .argument('<report...>', 'JSON report files')
    .addOption(new Option('--format <format>', 'report format').choices(['text', 'json', 'markdown']).default('text'))
    .option('--out <file>', 'write the report to a file instead of standard output')
    .addOption(new Option('--fail-on <level>', 'what fails the run').choices(['fail', 'warn']).default('fail'))
    .option('--html <dir>', 'also write the HTML report of the joined result into this folder')
    .option('--sarif <file>', 'also write a SARIF 2.1.0 log of the joined result to this file')
    .option('--junit <file>', 'also write a JUnit XML report of the joined result to this file')
    .option('--color', 'force colours in the text report')
    .option('--no-color', 'never use colours')
    .option('--debug', 'print stack traces of unexpected errors', false)
    .exitOverride()
    .configureOutput({ writeOut: (s) => (printed += s), writeErr: (s) => (printed += s) })
    .action((reports: string[], o: Record<string, unknown>, cmd: Command) => {
      parsed = {
        kind: 'merge',
        reports: reports.map((r) => path.resolve(cwd, r)),
        format: o.format as OutputFormat,
        out: typeof o.out === 'string' ? o.out : null,
        color: cmd.getOptionValueSource('color') === 'cli' ? Boolean(o.color) : null,
        failOn: o.failOn === 'warn' ? 'warn' : 'fail',
        debug: Boolean(o.debug),
        html: typeof o.html === 'string' ? o.html : null,
        sarif: typeof o.sarif === 'string' ? o.sarif : null,
        junit: typeof o.junit === 'string' ? o.junit : null,
      };
    });
  try {
    program.parse(argv, { from: 'user' });
  } catch (error) {
    if (error instanceof CommanderError) {
      const ok = error.exitCode === 0;
      return { kind: 'print', text: printed || `${error.message}\n`, status: ok ? 0 : 2 };
    }
    throw error;
  }
  if (parsed) return parsed;
  return { kind: 'print', text: printed || program.helpInformation(), status: argv.length === 0 ? 0 : 2 };
}

/**
 * A path as repository-relative with `/`; outside the root is an InputError.
 * @param given the path as the user wrote it (quoted in the message)
 * @param key what names it: the option (`--config`) or, for an argument, the path itself
 */
function toRepoPath(root: string, absolute: string, given: string, key: string): string {
  const rel = path.relative(root, absolute);
  if (rel === '' || rel.startsWith('..') || path.isAbsolute(rel)) {
    const what = key === given ? 'is' : `${JSON.stringify(given)} is`;
    throw new InputError('path-outside', `${what} outside the repository root ${root}; expected a path inside it`, { key });
  }
  return rel.split(path.sep).join('/');
}
