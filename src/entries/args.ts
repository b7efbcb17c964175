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
import { InputError } from '../core/errors.js';
import { maxOf } from '../core/extremes.js';
import type { Settings } from '../run/settings.js';
import { parseShard, type Shard } from '../run/shard.js';
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
function parseJobs(value: string | undefined): number | null {
  if (value === undefined) return null;
  const n = Number(value);
  if (!/^\s*\d+\s*$/.test(value) || !Number.isSafeInteger(n) || n < 1) {
    throw new InputError('jobs-value', `expected a whole number of worker threads >= 1, got ${JSON.stringify(value)}`, { key: '--jobs' });
  }
  return n;
}

/** What the command line asked for: a command to run, or text to print (help, version). */
export type Parsed = CheckCommand | MergeCommand | { kind: 'print'; text: string; status: 0 | 2 };

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
  name: 'check' | 'merge';
  summary: string;
  argument: { name: string; description: string; required: boolean };
  options: readonly OptionSpec[];
}

const FORMAT: OptionSpec = { name: 'format', value: 'format', description: 'report format', choices: ['text', 'json', 'markdown'], default: 'text' };
const OUT: OptionSpec = { name: 'out', value: 'file', description: 'write the report to a file instead of standard output' };
const FAIL_ON: OptionSpec = { name: 'fail-on', value: 'level', description: 'what fails the run', choices: ['fail', 'warn'], default: 'fail' };
const COLOR: OptionSpec = { name: 'color', description: 'force colours in the text report' };
const NO_COLOR: OptionSpec = { name: 'no-color', description: 'never use colours' };
const DEBUG: OptionSpec = { name: 'debug', description: 'print stack traces of unexpected errors' };
const HELP: OptionSpec = { name: 'help', description: 'print this help' };

/** Every command, in the order the main help lists them. */
const COMMANDS: readonly CommandSpec[] = [
  {
    name: 'check',
    summary: 'Check models against their limits. Exit status: 0 within limits, 1 a model over a limit, 2 the run could not be done.',
    argument: { name: 'descriptor', description: 'model descriptors to check (default: every model the settings file matches)', required: false },
    options: [
      { name: 'root', value: 'dir', description: 'repository root; nothing outside it is read', default: '.' },
      { name: 'config', value: 'file', description: 'settings file, relative to the root', default: 'fitgate.yml' },
      FORMAT,
      OUT,
      FAIL_ON,
      COLOR,
      NO_COLOR,
      { name: 'base', value: 'ref', description: 'also check the models as they are on this git commit and compare (hold-out RMSE, gap ratio, the base_change limit)' },
      { name: 'shard', value: 'K/N', description: 'check only share K of N of the models (descriptors sorted by path, dealt round-robin); join the JSON reports with `fitgate merge`' },
      { name: 'jobs', value: 'n', description: 'worker threads to run models on (default: one per core; 1 = serial)' },
      { name: 'html', value: 'dir', description: 'also write the HTML report (index.html, self-contained) into this folder' },
      { name: 'sarif', value: 'file', description: 'also write a SARIF 2.1.0 log for code scanning to this file' },
      { name: 'junit', value: 'file', description: 'also write a JUnit XML report to this file' },
      DEBUG,
      HELP,
    ],
  },
  {
    name: 'merge',
    summary: 'Join the JSON reports of `fitgate check --shard K/N --format json` jobs into one report. Exit status as for check.',
    argument: { name: 'report', description: 'JSON report files', required: true },
    options: [
      FORMAT,
      OUT,
      FAIL_ON,
      { name: 'html', value: 'dir', description: 'also write the HTML report of the joined result into this folder' },
      { name: 'sarif', value: 'file', description: 'also write a SARIF 2.1.0 log of the joined result to this file' },
      { name: 'junit', value: 'file', description: 'also write a JUnit XML report of the joined result to this file' },
      COLOR,
      NO_COLOR,
      DEBUG,
      HELP,
    ],
  },
];

const DESCRIPTION = 'Refit committed regression models, re-score them on their hold-out rows, and fail when they overfit.';

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
 * Parses argv (without `node` and the script).
 * @param argv arguments
 * @param cwd the working directory paths are relative to
 */
export function parseArgs(argv: string[], cwd: string): Parsed {
  const [first, ...rest] = argv;
  if (first === undefined || first === '-h' || first === '--help') return { kind: 'print', text: mainHelp(), status: 0 };
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
  if (command.argument.required && read.positionals.length === 0) return usageError(`missing required argument '${command.argument.name}'`, command);
  const value = (name: string): string | null => read.values.get(name) ?? null;
  const common = {
    format: (value('format') ?? 'text') as OutputFormat,
    out: value('out'),
    color: read.color,
    debug: read.switches.has('debug'),
    html: value('html'),
    sarif: value('sarif'),
    junit: value('junit'),
  };
  const failOn = value('fail-on') === 'warn' ? 'warn' : 'fail';
  if (command.name === 'merge') {
    return { kind: 'merge', reports: read.positionals.map((r) => path.resolve(cwd, r)), failOn, ...common };
  }
  const root = path.resolve(cwd, value('root') ?? '.');
  const config = value('config');
  const base = value('base');
  const shard = value('shard');
  return {
    kind: 'check',
    settings: {
      root,
      config: toRepoPath(root, path.resolve(root, config ?? 'fitgate.yml'), config ?? 'fitgate.yml', '--config'),
      configExplicit: config !== null,
      descriptors: read.positionals.map((d) => toRepoPath(root, path.resolve(cwd, d), d, d)),
      failOn,
    },
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
  const declared = Object.fromEntries(command.options.map((o) => [o.name, { type: o.value === undefined ? ('boolean' as const) : ('string' as const), ...(o.name === 'help' ? { short: 'h' } : {}) }]));
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
      return usageError(`option '--${spec.name} <${spec.value}>' argument '${token.value}' is invalid; expected one of ${spec.choices.join(', ')}`, command);
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
    const notes = [o.choices ? `one of ${o.choices.join(', ')}` : '', o.default !== undefined ? `default: ${o.default}` : ''].filter((s) => s !== '');
    return [name, notes.length > 0 ? `${o.description} (${notes.join('; ')})` : o.description] as const;
  });
  return helpPage(`fitgate ${command.name} [options] ${argumentUsage(command)}`, command.summary, [
    ['Arguments', [[command.argument.name, command.argument.description]]],
    ['Options', options],
  ]);
}

/** A help page: the usage line, the wrapped description, then each titled section as a table. */
function helpPage(usage: string, description: string, sections: ReadonlyArray<readonly [string, ReadonlyArray<readonly [string, string]>]>): string {
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
  return rows.flatMap(([name, text]) => wrap(text, HELP_WIDTH - indent).map((line, i) => (i === 0 ? `  ${name.padEnd(indent - 4)}  ${line}` : `${' '.repeat(indent)}${line}`)));
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
