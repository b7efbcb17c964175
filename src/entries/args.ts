/**
 * The command line: the only reader of argv. Produces the same {@link Settings} the action's
 * `inputs.ts` does, plus the CLI's own output options.
 *
 * Tokens come from Node's own `util.parseArgs` (long options, `--name=value`, `--` ending the
 * options, options and arguments in any order); the commands, their options, the checks of
 * values and the help text are declared once in {@link COMMANDS}. A repeated option keeps its
 * last value, as is usual for command lines.
 */
import path from 'node:path';
import { parseArgs as tokenize } from 'node:util';
import { clip, InputError, quoteValue } from '../core/errors.js';
import { realFolder } from '../repo/real-folder.js';
import { maxOf } from '../core/extremes.js';
import type { Settings } from '../run/settings.js';
import { parseShard, type Shard, MAX_SHARDS } from '../run/shard.js';
import { VERSION } from '../core/version.js';

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
  /** Text report: list every check of every model, passing ones included (`--verbose`). */
  verbose: boolean;
  /** Compare with the models as they are on this git revision (`--base`), or null. */
  base: string | null;
  /** Check only this share of the models (`--shard K/N`), or null for all. */
  shard: Shard | null;
  /** Threads evaluating models, the main thread included (`--jobs N`: N - 1 workers); null = up to one per core. */
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
  /** Text report: list every check of every model (`--verbose`). */
  verbose: boolean;
  /** File reports of the joined result, as for check (paths as given), or null. */
  html: string | null;
  sarif: string | null;
  junit: string | null;
  /** `--expect N`: the number of shard reports there must be (a missing one is an error), or null. */
  expect: number | null;
}

/** Reads `--expect`: a whole number of reports from 1 to {@link MAX_SHARDS}. */
function parseExpect(value: string | null): number | null {
  if (value === null) return null;
  const n = Number(value);
  if (!/^\s*\d+\s*$/.test(value) || !Number.isSafeInteger(n) || n < 1 || n > MAX_SHARDS) {
    throw new InputError(
      'expect-value',
      `expected the number of shard reports, a whole number from 1 to ${MAX_SHARDS}, got ${quoteValue(value)}`,
      { key: '--expect' },
    );
  }
  return n;
}

/** A parsed `fitgate explain [check-id...]`: explain checks (none: list them). */
export interface ExplainCommand {
  kind: 'explain';
  /** Check ids or limit keys, as given. */
  ids: string[];
}

/** A parsed `fitgate init TRAIN.csv`: write a settings file and a first descriptor. */
export interface InitCommand {
  kind: 'init';
  /** Absolute repository root; every file read and written is inside it. */
  root: string;
  /** The training CSV, repository-relative with `/`. */
  train: string;
  /** The hold-out CSV, repository-relative; null: split one off the training file. */
  holdout: string | null;
  /** Target column; null: the last column of the file. */
  target: string | null;
  /** `regression` (default) or `classification`. */
  task: 'regression' | 'classification';
  /** Model name; null: from the file name. */
  name: string | null;
  /** How a hold-out is split off one file: `random` (seeded, default) or `last` (the last rows, for data in time order). */
  split: 'random' | 'last';
  /** Share of the rows held out when splitting, in (0, 1). Default 0.25. */
  holdoutShare: number;
  /** Seed of the random split. Default 1. */
  seed: number;
  /** Degree of the first model's polynomial terms: 1 (linear terms, default) or 2 (standardised inputs). */
  degree: 1 | 2;
  /** Decimal mark of the numbers: `auto` (default: a comma when more columns read as numbers with it), `.` or `,`. */
  decimal: 'auto' | '.' | ',';
  /** Rows with a missing cell in a used column: `error` (default) or `drop` (written into the descriptor). */
  missing: 'error' | 'drop';
  /** Overwrite files that exist (`--force`). */
  force: boolean;
  debug: boolean;
}

/** A parsed `fitgate refit [descriptor...]`: write refitted coefficients into descriptors. */
export interface RefitCommand {
  kind: 'refit';
  settings: Settings;
  /** Only report stale coefficients (exit 1 when any are), write nothing (`--check`). */
  check: boolean;
  debug: boolean;
}

/** Reads a number option within bounds (`min < x < max` when `open`, else `min <= x <= max`). */
function parseNumberOption(
  value: string | null,
  name: string,
  fallback: number,
  min: number,
  max: number,
  open: boolean,
  whole = false,
): number {
  if (value === null) return fallback;
  const n = Number(value);
  const inRange = open ? n > min && n < max : n >= min && n <= max;
  if (value.trim() === '' || !Number.isFinite(n) || !inRange || (whole && !Number.isSafeInteger(n))) {
    const range = open ? `between ${min} and ${max} (exclusive)` : `from ${min} to ${max}`;
    throw new InputError(
      'option-value',
      `expected ${whole ? 'a whole number' : 'a number'} ${range}, got ${JSON.stringify(value.slice(0, 40))}`,
      { key: `--${name}` },
    );
  }
  return n;
}

/** Reads `--jobs`: a whole number >= 1. */
function parseJobs(value: string | undefined): number | null {
  if (value === undefined) return null;
  const n = Number(value);
  if (!/^\s*\d+\s*$/.test(value) || !Number.isSafeInteger(n) || n < 1) {
    throw new InputError('jobs-value', `expected a whole number of threads >= 1, got ${quoteValue(value)}`, { key: '--jobs' });
  }
  return n;
}

/** What the command line asked for: a command to run, or text to print (help, version). */
export type Parsed =
  | CheckCommand
  | MergeCommand
  | ExplainCommand
  | InitCommand
  | RefitCommand
  | { kind: 'print'; text: string; status: 0 | 2 };

/** One option of a command: a switch, or an option taking a value (`value` names it in the help). */
interface OptionSpec {
  name: string;
  description: string;
  /** Placeholder of the option's value (`--out <file>`); absent for a switch. */
  value?: string;
  /** The only values accepted, when the option has a fixed set. */
  choices?: readonly string[];
  /** The value when the option is not given (shown in the help). */
  default?: string;
}

/** A command: its positional argument and its options. */
interface CommandSpec {
  name: 'check' | 'merge' | 'init' | 'refit' | 'explain';
  summary: string;
  argument: { name: string; description: string; required: boolean };
  options: readonly OptionSpec[];
}

const FORMAT: OptionSpec = {
  name: 'format',
  value: 'format',
  description: 'report format',
  choices: ['text', 'json', 'markdown'],
  default: 'text',
};
const OUT: OptionSpec = { name: 'out', value: 'file', description: 'write the report to a file instead of standard output' };
const FAIL_ON: OptionSpec = {
  name: 'fail-on',
  value: 'level',
  description: 'what fails the run',
  choices: ['fail', 'warn'],
  default: 'fail',
};
const COLOR: OptionSpec = { name: 'color', description: 'force colours in the text report' };
const NO_COLOR: OptionSpec = { name: 'no-color', description: 'never use colours' };
const VERBOSE: OptionSpec = {
  name: 'verbose',
  description: 'text report: list every check of every model with its figure, passing ones included',
};
const DEBUG: OptionSpec = { name: 'debug', description: 'print stack traces of unexpected errors' };
const HELP: OptionSpec = { name: 'help', description: 'print this help' };

/** Every command, in the order the main help lists them. */
const COMMANDS: readonly CommandSpec[] = [
  {
    name: 'check',
    summary: 'Check models against their limits. Exit status: 0 within limits, 1 a model over a limit, 2 the run could not be done.',
    argument: {
      name: 'descriptor',
      description: 'model descriptors to check (default: every model the settings file matches)',
      required: false,
    },
    options: [
      { name: 'root', value: 'dir', description: 'repository root; nothing outside it is read', default: '.' },
      { name: 'config', value: 'file', description: 'settings file, relative to the root', default: 'fitgate.yml' },
      FORMAT,
      OUT,
      FAIL_ON,
      COLOR,
      NO_COLOR,
      {
        name: 'base',
        value: 'ref',
        description: 'also check the models as they are on this git commit and compare (hold-out RMSE, gap ratio, the base_change limit)',
      },
      {
        name: 'shard',
        value: 'K/N',
        description:
          'check only share K of N of the models (descriptors sorted by path, dealt round-robin); join the JSON reports with `fitgate merge`',
      },
      {
        name: 'jobs',
        value: 'n',
        description:
          "threads to run models on, the main thread and n - 1 workers (default: up to one per core, as many as the models' work pays for; 1 = serial)",
      },
      { name: 'html', value: 'dir', description: 'also write the HTML report (index.html, self-contained) into this folder' },
      { name: 'sarif', value: 'file', description: 'also write a SARIF 2.1.0 log for code scanning to this file' },
      { name: 'junit', value: 'file', description: 'also write a JUnit XML report to this file' },
      VERBOSE,
      DEBUG,
      HELP,
    ],
  },
  {
    name: 'merge',
    summary: 'Join the JSON reports of `fitgate check --shard K/N --format json` jobs into one report. Exit status as for check.',
    argument: { name: 'report', description: 'JSON report files', required: true },
    options: [
      {
        name: 'expect',
        value: 'n',
        description:
          'the number of shard reports there must be: a missing one is an error (reports also name their shard K/N, and a gap among them is an error)',
      },
      FORMAT,
      OUT,
      FAIL_ON,
      { name: 'html', value: 'dir', description: 'also write the HTML report of the joined result into this folder' },
      { name: 'sarif', value: 'file', description: 'also write a SARIF 2.1.0 log of the joined result to this file' },
      { name: 'junit', value: 'file', description: 'also write a JUnit XML report of the joined result to this file' },
      COLOR,
      NO_COLOR,
      VERBOSE,
      DEBUG,
      HELP,
    ],
  },
  {
    name: 'init',
    summary:
      'Start checking a model: write a settings file (when there is none) and a first descriptor for a training CSV, with every limit and its default as comments. Splits a reproducible hold-out off the file when no hold-out is given. Never overwrites a file without --force.',
    argument: { name: 'train', description: 'the training CSV (inside the repository root)', required: true },
    options: [
      { name: 'root', value: 'dir', description: 'repository root; nothing outside it is read or written', default: '.' },
      { name: 'holdout', value: 'file', description: 'the hold-out CSV (default: split one off the training file)' },
      { name: 'target', value: 'column', description: 'the column to predict (default: the last column)' },
      {
        name: 'task',
        value: 'task',
        description: 'what the model predicts',
        choices: ['regression', 'classification'],
        default: 'regression',
      },
      { name: 'name', value: 'name', description: "the model's name (default: from the file name)" },
      {
        name: 'split',
        value: 'how',
        description: 'how to split a hold-out off one file: random rows (seeded) or the last rows (data in time order)',
        choices: ['random', 'last'],
        default: 'random',
      },
      { name: 'holdout-share', value: 'share', description: 'share of the rows to hold out when splitting', default: '0.25' },
      { name: 'seed', value: 'n', description: 'seed of the random split', default: '1' },
      {
        name: 'degree',
        value: 'd',
        description: 'terms of the first model: 1 linear terms, 2 polynomials of degree 2 on standardised inputs',
        choices: ['1', '2'],
        default: '1',
      },
      {
        name: 'decimal',
        value: 'mark',
        description:
          'decimal mark of the numbers: auto takes a comma when more columns read as numbers with it than with a point (written into the descriptor as data.decimal)',
        choices: ['auto', '.', ','],
        default: 'auto',
      },
      {
        name: 'missing',
        value: 'how',
        description:
          'rows with an empty or NA-like cell in a used column: error, or drop them and count them in the report (written into the descriptor as data.missing)',
        choices: ['error', 'drop'],
        default: 'error',
      },
      { name: 'force', description: 'overwrite files that exist' },
      DEBUG,
      HELP,
    ],
  },
  {
    name: 'refit',
    summary:
      "Refit models and write the coefficients into each descriptor's `coefficients`, leaving the rest of the file as it is. With --check, write nothing and exit 1 when any shipped coefficients are stale.",
    argument: { name: 'descriptor', description: 'model descriptors (default: every model the settings file matches)', required: false },
    options: [
      { name: 'root', value: 'dir', description: 'repository root; nothing outside it is read or written', default: '.' },
      { name: 'config', value: 'file', description: 'settings file, relative to the root', default: 'fitgate.yml' },
      { name: 'check', description: 'write nothing; exit 1 when a descriptor ships coefficients that differ from the refit (or none)' },
      DEBUG,
      HELP,
    ],
  },
  {
    name: 'explain',
    summary: 'Explain a check: its figure, formula and source, and what to change. With no id, list the checks.',
    argument: { name: 'check', description: 'check ids or limit keys (default: list every check)', required: false },
    options: [HELP],
  },
];

const DESCRIPTION = 'Refit committed regression models and classifiers, re-score them on their hold-out rows, and fail when they overfit.';

/** Help lines are wrapped to this many columns. */
const HELP_WIDTH = 80;

/** What a command's options came to: values of options that take one, and the switches given. */
interface OptionValues {
  values: Map<string, string>;
  switches: Set<string>;
  /** `true` for `--color`, `false` for `--no-color`, whichever came last; null when neither. */
  color: boolean | null;
  positionals: string[];
}

/** A mistake on the command line: printed with a pointer to the help, exit status 2. */
function usageError(message: string, command: CommandSpec | null): Parsed {
  const hint = command === null ? '(run `fitgate --help` for the commands)' : `(run \`fitgate ${command.name} --help\` for the options)`;
  return { kind: 'print', text: `error: ${message}\n${hint}\n`, status: 2 };
}

/**
 * Parses argv (without `node` and the script). `--root` is resolved to its real path
 * (`realpath(3)`); named inside `cwd`, its real path must lie inside the real path of `cwd`.
 * @param argv arguments
 * @param cwd the working directory paths are relative to (an existing folder)
 * @throws InputError for a bad value, or a `--root` that is not an existing folder or leads out
 *   of `cwd` through a symbolic link
 */
export function parseArgs(argv: string[], cwd: string): Parsed {
  const [first, ...rest] = argv;
  // No command at all is a usage mistake (a script calling `fitgate` alone did nothing): the help, status 2.
  if (first === undefined) return { kind: 'print', text: mainHelp(), status: 2 };
  if (first === '-h' || first === '--help') return { kind: 'print', text: mainHelp(), status: 0 };
  if (first === '-V' || first === '--version') return { kind: 'print', text: `${VERSION}\n`, status: 0 };
  if (first === 'help') {
    const topic = rest[0];
    if (topic === undefined) return { kind: 'print', text: mainHelp(), status: 0 };
    const command = COMMANDS.find((c) => c.name === topic);
    return command ? { kind: 'print', text: commandHelp(command), status: 0 } : usageError(`unknown command '${topic}'`, null);
  }
  const command = COMMANDS.find((c) => c.name === first);
  if (!command) return usageError(first.startsWith('-') ? `unknown option '${first}'` : `unknown command '${first}'`, null);
  const read = readOptions(command, rest);
  if ('kind' in read) return read;
  if (read.switches.has('help')) return { kind: 'print', text: commandHelp(command), status: 0 };
  if (command.argument.required && read.positionals.length === 0)
    return usageError(`missing required argument '${command.argument.name}'`, command);
  const value = (name: string): string | null => read.values.get(name) ?? null;
  const common = {
    format: (value('format') ?? 'text') as OutputFormat,
    out: value('out'),
    color: read.color,
    debug: read.switches.has('debug'),
    verbose: read.switches.has('verbose'),
    html: value('html'),
    sarif: value('sarif'),
    junit: value('junit'),
  };
  const failOn: 'fail' | 'warn' = value('fail-on') === 'warn' ? 'warn' : 'fail';
  if (command.name === 'explain') return { kind: 'explain', ids: read.positionals };
  if (command.name === 'init') {
    if (read.positionals.length > 1) return usageError(`expected one training CSV, got ${read.positionals.length} arguments`, command);
    const initRoot = realFolder(path.resolve(cwd, value('root') ?? '.'), { key: '--root', within: cwd, withinName: 'working directory' });
    const [train] = read.positionals;
    const holdout = value('holdout');
    return {
      kind: 'init',
      root: initRoot,
      train: toRepoPath([initRoot], path.resolve(cwd, train), train, train),
      holdout: holdout === null ? null : toRepoPath([initRoot], path.resolve(cwd, holdout), holdout, '--holdout'),
      target: value('target'),
      task: value('task') === 'classification' ? 'classification' : 'regression',
      name: value('name'),
      split: value('split') === 'last' ? 'last' : 'random',
      holdoutShare: parseNumberOption(value('holdout-share'), 'holdout-share', 0.25, 0, 1, true),
      seed: parseNumberOption(value('seed'), 'seed', 1, 0, 2 ** 31 - 1, false, true),
      degree: value('degree') === '2' ? 2 : 1,
      decimal: value('decimal') === ',' ? ',' : value('decimal') === '.' ? '.' : 'auto',
      missing: value('missing') === 'drop' ? 'drop' : 'error',
      force: read.switches.has('force'),
      debug: common.debug,
    };
  }
  if (command.name === 'merge') {
    return {
      kind: 'merge',
      reports: read.positionals.map((r) => path.resolve(cwd, r)),
      failOn,
      ...common,
      expect: parseExpect(value('expect')),
    };
  }
  // The root as named, and its real path: named inside the working directory, it must really
  // stay inside it (a folder replaced by a link to a parent is refused).
  const named = path.resolve(cwd, value('root') ?? '.');
  const root = realFolder(named, { key: '--root', within: cwd, withinName: 'working directory' });
  const config = value('config');
  const base = value('base');
  const shard = value('shard');

  const settings = {
    root,
    config: toRepoPath([named], path.resolve(named, config ?? 'fitgate.yml'), config ?? 'fitgate.yml', '--config'),
    configExplicit: config !== null,
    // Descriptor arguments may be written through the root as named or as it really is.
    descriptors: read.positionals.map((d) => toRepoPath([named, root], path.resolve(cwd, d), d, d)),
    failOn,
  };
  if (command.name === 'refit') return { kind: 'refit', settings, check: read.switches.has('check'), debug: common.debug };
  return {
    kind: 'check',
    settings,
    ...common,
    base: base !== null && base !== '' ? base : null,
    shard: shard !== null ? parseShard(shard, '--shard') : null,
    jobs: parseJobs(value('jobs') ?? undefined),
  };
}

/**
 * Reads a command's options and arguments, in any order; `--` ends the options. A value that is
 * not among an option's choices, an unknown option, a value missing or given to a switch is a
 * usage error.
 */
function readOptions(command: CommandSpec, args: string[]): OptionValues | Parsed {
  const declared = Object.fromEntries(
    command.options.map((o) => [
      o.name,
      { type: o.value === undefined ? ('boolean' as const) : ('string' as const), ...(o.name === 'help' ? { short: 'h' } : {}) },
    ]),
  );
  const { tokens } = tokenize({ args, options: declared, strict: false, allowPositionals: true, tokens: true });
  const out: OptionValues = { values: new Map(), switches: new Set(), color: null, positionals: [] };
  // Asking for help wins over any mistake beside it.
  if (tokens.some((t) => t.kind === 'option' && t.name === 'help')) {
    out.switches.add('help');
    return out;
  }
  for (const token of tokens) {
    if (token.kind === 'positional') out.positionals.push(token.value);
    if (token.kind !== 'option') continue;
    const spec = command.options.find((o) => o.name === token.name);
    if (!spec || (token.rawName.length === 2 && token.name !== 'help')) return usageError(`unknown option '${token.rawName}'`, command);
    if (spec.value === undefined) {
      if (token.inlineValue) return usageError(`option '--${spec.name}' takes no value`, command);
      if (spec.name === 'color' || spec.name === 'no-color') out.color = spec.name === 'color';
      else out.switches.add(spec.name);
      continue;
    }
    if (token.value === undefined) return usageError(`option '--${spec.name} <${spec.value}>' argument missing`, command);
    if (spec.choices && !spec.choices.includes(token.value)) {
      return usageError(
        `option '--${spec.name} <${spec.value}>' argument '${token.value}' is invalid; expected one of ${spec.choices.join(', ')}`,
        command,
      );
    }
    out.values.set(spec.name, token.value);
  }
  return out;
}

/** The help of `fitgate` alone: the commands. */
function mainHelp(): string {
  const rows: Array<readonly [string, string]> = COMMANDS.map((c) => [`${c.name} [options] ${argumentUsage(c)}`, c.summary] as const);
  rows.push(['help [command]', 'print the help of a command']);
  return helpPage('fitgate [options] [command]', DESCRIPTION, [
    [
      'Options',
      [
        ['-V, --version', 'print the version'],
        ['-h, --help', 'print this help'],
      ],
    ],
    ['Commands', rows],
  ]);
}

/** The help of one command: its argument and every option with its choices and default. */
function commandHelp(command: CommandSpec): string {
  const options = command.options.map((o) => {
    const name = o.name === 'help' ? '-h, --help' : `--${o.name}${o.value === undefined ? '' : ` <${o.value}>`}`;
    const notes = [o.choices ? `one of ${o.choices.join(', ')}` : '', o.default !== undefined ? `default: ${o.default}` : ''].filter(
      (s) => s !== '',
    );
    return [name, notes.length > 0 ? `${o.description} (${notes.join('; ')})` : o.description] as const;
  });
  return helpPage(`fitgate ${command.name} [options] ${argumentUsage(command)}`, command.summary, [
    ['Arguments', [[command.argument.name, command.argument.description]]],
    ['Options', options],
  ]);
}

/** A help page: the usage line, the wrapped description, then each titled section as a table. */
function helpPage(
  usage: string,
  description: string,
  sections: ReadonlyArray<readonly [string, ReadonlyArray<readonly [string, string]>]>,
): string {
  const lines = [`Usage: ${usage}`, '', ...wrap(description, HELP_WIDTH)];
  for (const [title, rows] of sections) {
    lines.push('', `${title}:`);
    for (const line of table(rows)) lines.push(line);
  }
  return [...lines, ''].join('\n');
}

function argumentUsage(command: CommandSpec): string {
  return command.argument.required ? `<${command.argument.name}...>` : `[${command.argument.name}...]`;
}

/** Two columns: names padded to the widest, descriptions wrapped beside them. */
function table(rows: ReadonlyArray<readonly [string, string]>): string[] {
  const indent = 2 + maxOf(rows.map(([name]) => name.length)) + 2;
  return rows.flatMap(([name, text]) =>
    wrap(text, HELP_WIDTH - indent).map((line, i) => (i === 0 ? `  ${name.padEnd(indent - 4)}  ${line}` : `${' '.repeat(indent)}${line}`)),
  );
}

/** Words of `text` in lines of at most `width` characters (a longer word gets a line of its own). */
function wrap(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    if (line !== '' && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line === '' ? word : `${line} ${word}`;
  }
  lines.push(line);
  return lines;
}

/**
 * A path as repository-relative with `/`; outside the root is an InputError.
 * @param roots the root's spellings (as named, then its real path): the first that holds the path is used
 * @param given the path as the user wrote it (quoted in the message)
 * @param key what names it: the option (`--config`) or, for an argument, the path itself
 */
function toRepoPath(roots: readonly string[], absolute: string, given: string, key: string): string {
  for (const root of roots) {
    const rel = path.relative(root, absolute);
    if (!(rel === '' || rel.startsWith('..') || path.isAbsolute(rel))) return rel.split(path.sep).join('/');
  }
  const what = key === given ? 'is' : `${quoteValue(given)} is`;
  throw new InputError('path-outside', `${what} outside the repository root ${clip(roots[0])}; expected a path inside it`, { key });
}
