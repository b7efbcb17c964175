/**
 * The text of the files `fitgate init` writes: a settings file and a first descriptor, each
 * starting with a `# yaml-language-server: $schema=` line (editors that read it validate and
 * complete the file against fitgate's JSON Schema) and spelling out every limit with its
 * built-in default as a comment. Pure text: the entry decides paths and writes.
 */
import { LIMIT_KEYS } from './generated/limit-keys.js';
import type { LimitSpec } from './types.js';
import { maxOf } from '../core/extremes.js';

/** What the first descriptor holds. */
export interface FirstModel {
  /** Model name (already valid: letters, digits, `-`, `_`, `.`). */
  name: string;
  /** `regression` or `classification`. */
  task: string;
  /** Training and hold-out CSV paths relative to the descriptor's folder, and the target column. */
  train: string;
  holdout: string;
  target: string;
  /** Input columns, in file order. */
  inputs: string[];
  /** 1: one `linear` term of every input; 2: a degree-2 `polynomial` per input (standardised by default). */
  degree: 1 | 2;
  /** Training rows. */
  rows: number;
  /** Where the schema is: a URL or a path relative to the descriptor's folder. */
  schema: string;
  /** Lines saying where the data came from (e.g. how the hold-out was split), written as comments. */
  notes: string[];
  /** Decimal mark of the files (`data.decimal`, written when a comma). Default `.`. */
  decimal?: '.' | ',';
  /** Rows with a missing cell (`data.missing`, written when `drop`). Default `error`. */
  missing?: 'error' | 'drop';
}

/** Limit written into the descriptor for the parameter ratio, with the reason. */
export interface RatioLimit {
  value: number;
  comment: string;
}

/** The built-in default of `params_per_sample` (the parameter-ratio check; common practice: >= 10 rows per parameter). */
const RATIO_DEFAULT = Number(LIMIT_KEYS.find((k) => k.key === 'params_per_sample')?.defaultSpec ?? 0.1);

/** Columns of the first model's design: the intercept plus one per input (degree 1) or two (degree 2). */
export function firstModelParameters(inputs: number, degree: 1 | 2): number {
  return 1 + inputs * degree;
}

/**
 * The smallest number of two significant digits at or above `x` (0.1333 -> 0.14).
 * @param x a positive finite number
 */
export function roundUp2(x: number): number {
  const step = 10 ** (Math.floor(Math.log10(x)) - 1);
  return Number((Math.ceil(x / step - 1e-9) * step).toPrecision(2));
}

/**
 * The `params_per_sample` limit suited to the file: the default when the first model is within
 * it, else the model's own ratio rounded up, with a comment saying why either way.
 *
 * @param parameters columns of the design (intercept included)
 * @param rows training rows
 */
export function ratioLimitFor(parameters: number, rows: number): RatioLimit {
  const ratio = parameters / rows;
  const figure = `${parameters} parameters for ${rows} training rows`;
  if (ratio <= RATIO_DEFAULT) {
    return {
      value: RATIO_DEFAULT,
      comment: `${figure}: the default ${RATIO_DEFAULT} (common practice: at least ${1 / RATIO_DEFAULT} rows per parameter) suits this file`,
    };
  }
  return {
    value: roundUp2(ratio),
    comment: `${figure}: the default ${RATIO_DEFAULT} (common practice: at least ${1 / RATIO_DEFAULT} rows per parameter) would fail this small file; relaxed to let the first model through. Add rows and lower it again.`,
  };
}

function specText(spec: LimitSpec): string {
  return typeof spec === 'object' && spec !== null
    ? JSON.stringify(spec).replace(/"/g, '').replace(/,/g, ', ').replace(/:/g, ': ').replace(/^\{/, '{ ').replace(/\}$/, ' }')
    : String(spec);
}

/** A YAML plain scalar when safe, else a double-quoted one (JSON string syntax is valid YAML). */
function scalar(text: string): string {
  const plain =
    /^[A-Za-z_.][A-Za-z0-9_.\-/]*$/.test(text) && !/^(true|false|null|yes|no|on|off|y|n|~)$/i.test(text) && !/^\.(inf|nan)$/i.test(text);
  return plain ? text : JSON.stringify(text);
}

/** Every limit key but those given, as commented lines `<prefix>key: default   # summary`. */
function commentedLimits(prefix: string, except: string[]): string[] {
  const rows = LIMIT_KEYS.filter((k) => !except.includes(k.key));
  const width = maxOf(rows.map((k) => `${k.key}: ${specText(k.defaultSpec)}`.length));
  return rows.map((k) => `${prefix}${`${k.key}: ${specText(k.defaultSpec)}`.padEnd(width)}  # ${k.description}`);
}

/**
 * The descriptor text of the first model.
 * @param model what it holds; see {@link FirstModel}
 * @param ratio the parameter-ratio limit to write (see {@link ratioLimitFor})
 */
export function descriptorText(model: FirstModel, ratio: RatioLimit): string {
  const terms =
    model.degree === 1
      ? [`  - linear: [${model.inputs.map(scalar).join(', ')}]`]
      : model.inputs.map((c) => `  - polynomial: { of: ${scalar(c)}, degree: 2 }   # z = (x - mean) / sd of the training rows`);
  return [
    `# yaml-language-server: $schema=${model.schema}`,
    `# First model of ${scalar(model.target)}, written by \`fitgate init\`. Check it with \`fitgate check\`.`,
    ...model.notes.map((n) => `# ${n}`),
    'version: 1',
    `name: ${scalar(model.name)}`,
    `task: ${model.task}`,
    'data:',
    `  train: ${scalar(model.train)}`,
    `  holdout: ${scalar(model.holdout)}`,
    `  target: ${scalar(model.target)}`,
    ...(model.decimal === ',' ? ['  decimal: ","                # the files write numbers with a decimal comma'] : []),
    ...(model.missing === 'drop'
      ? ['  missing: drop               # rows with an empty or NA-like cell in a used column are dropped and counted']
      : []),
    `terms:                       # ${model.degree === 1 ? 'linear terms: a modest first model' : 'degree 2, inputs standardised: a modest first model'}`,
    ...terms,
    'fit:',
    '  intercept: true',
    '  ridge: 0                    # L2 penalty on every coefficient but the intercept; 0 = least squares',
    "limits:                       # this model's limits; the commented ones show the built-in defaults",
    `  params_per_sample: ${ratio.value}   # ${ratio.comment}`,
    ...commentedLimits('  # ', ['params_per_sample']),
    '',
  ].join('\n');
}

/**
 * The settings file text: where the descriptors are and every limit's default, commented.
 * @param schema URL or path (relative to the settings file's folder) of the settings schema
 * @param pattern glob of the descriptors
 */
export function settingsText(schema: string, pattern: string): string {
  return [
    `# yaml-language-server: $schema=${schema}`,
    "# fitgate settings, written by `fitgate init`. A descriptor's own `limits` win key by key.",
    'version: 1',
    'models:                       # glob patterns of model descriptors, relative to this folder',
    `  - ${JSON.stringify(pattern)}`,
    '# limits:                     # defaults for every model; uncomment to change one',
    ...commentedLimits('#   ', []),
    '',
  ].join('\n');
}
