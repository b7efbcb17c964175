/**
 * The command line: the only reader of argv. Produces the same {@link Settings} the action's
 * `inputs.ts` does, plus the CLI's own output options.
 */
import { Command, CommanderError, Option } from 'commander';
import path from 'node:path';
import { InputError } from './errors.js';
import type { Settings } from './settings.js';
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
}

/** What the command line asked for: a command to run, or text to print (help, version). */
export type Parsed = CheckCommand | { kind: 'print'; text: string; status: 0 | 2 };

/**
 * Parses argv (without `node` and the script).
 * @param argv arguments
 * @param cwd the working directory paths are relative to
 */
export function parseArgs(argv: string[], cwd: string): Parsed {
  let printed = '';
  let parsed: CheckCommand | null = null;
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
          config: toRepoPath(root, path.resolve(root, String(o.config)), '--config'),
          configExplicit: explicit,
          descriptors: descriptors.map((d) => toRepoPath(root, path.resolve(cwd, d), d)),
          failOn: o.failOn === 'warn' ? 'warn' : 'fail',
        },
        format: o.format as OutputFormat,
        out: typeof o.out === 'string' ? o.out : null,
        color: cmd.getOptionValueSource('color') === 'cli' ? Boolean(o.color) : null,
        debug: Boolean(o.debug),
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

/** A path as repository-relative with `/`; outside the root is an InputError. */
function toRepoPath(root: string, absolute: string, given: string): string {
  const rel = path.relative(root, absolute);
  if (rel === '' || rel.startsWith('..') || path.isAbsolute(rel)) {
    throw new InputError('path-outside', `\`${given}\` is outside the repository root ${root}; expected a path inside it`, { key: given });
  }
  return rel.split(path.sep).join('/');
}
