/**
 * Joins the JSON reports of shard jobs (`fitgate check --shard K/N --format json`) into one
 * Result, as if one job had checked every model: the verdict and counts are recomputed with
 * {@link summarise}; notes are kept once each, in input order.
 *
 * Every report is validated before anything is merged: bad JSON, or a key with the wrong type,
 * is an InputError naming the report file, the line and column (for JSON syntax) and the key
 * path (e.g. `models[2].verdict`). The same model name in two reports is an error too: the
 * shards of one matrix never overlap, so a repeat means reports of different runs were mixed.
 */
import { InputError } from '../core/errors.js';
import { summarise, type ModelResult, type Result } from './result.js';

/** One shard report as read from disk. */
export interface ReportInput {
  /** Path of the report as given (for messages). */
  file: string;
  /** Its text. */
  text: string;
}

/** Error codes of {@link mergeReports}. */
export const MERGE_ERROR = Object.freeze({
  none: 'merge-no-reports',
  json: 'merge-json',
  shape: 'merge-shape',
  duplicate: 'merge-duplicate',
});

const VERDICTS = ['pass', 'warn', 'fail', 'error'];
const STATUSES = ['pass', 'warn', 'fail', 'skipped'];

type Json = Record<string, unknown>;

/** 1-based line and column of a character offset. */
function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      start = i + 1;
    }
  }
  return { line, column: offset - start + 1 };
}

/**
 * Offset of the first JSON syntax error in text (RFC 8259 grammar), or -1 when it is valid.
 * Node's own messages name no position for many errors, so the location is found here.
 */
export function jsonErrorOffset(text: string): number {
  let i = 0;
  const ws = (): void => {
    while (i < text.length && ' \t\n\r'.includes(text[i])) i++;
  };
  const fail = (): never => {
    throw i;
  };
  const literal = (word: string): void => {
    if (text.startsWith(word, i)) i += word.length;
    else fail();
  };
  const string = (): void => {
    i++; // opening quote
    while (i < text.length && text[i] !== '"') {
      const c = text.charCodeAt(i);
      if (c < 0x20) fail();
      if (text[i] === '\\') {
        i++;
        if (text[i] === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 1, i + 5))) fail();
          i += 4;
        } else if (!'"\\/bfnrt'.includes(text[i] ?? 'x')) fail();
      }
      i++;
    }
    if (i >= text.length) fail();
    i++;
  };
  const number = (): void => {
    const match = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(text.slice(i, i + 400));
    if (!match || match[0] === '' || match[0] === '-') fail();
    i += (match as RegExpExecArray)[0].length;
  };
  const value = (): void => {
    ws();
    const c = text[i];
    if (c === '{') {
      i++;
      ws();
      if (text[i] === '}') return void i++;
      for (;;) {
        ws();
        if (text[i] !== '"') fail();
        string();
        ws();
        if (text[i] !== ':') fail();
        i++;
        value();
        ws();
        if (text[i] === ',') i++;
        else if (text[i] === '}') return void i++;
        else fail();
      }
    }
    if (c === '[') {
      i++;
      ws();
      if (text[i] === ']') return void i++;
      for (;;) {
        value();
        ws();
        if (text[i] === ',') i++;
        else if (text[i] === ']') return void i++;
        else fail();
      }
    }
    if (c === '"') return string();
    if (c === 't') return literal('true');
    if (c === 'f') return literal('false');
    if (c === 'n') return literal('null');
    if (c === '-' || (c !== undefined && c >= '0' && c <= '9')) return number();
    fail();
  };
  try {
    value();
    ws();
    return i < text.length ? i : -1;
  } catch (offset) {
    if (typeof offset === 'number') return Math.min(offset, text.length);
    throw offset;
  }
}

/** Parses JSON; a syntax error becomes an InputError with the file, line and column. */
function parseJson(input: ReportInput): unknown {
  try {
    return JSON.parse(input.text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const offset = jsonErrorOffset(input.text);
    const where = offset >= 0 ? lineColumn(input.text, offset) : {};
    throw new InputError(MERGE_ERROR.json, `expected a fitgate JSON report (from \`fitgate check --format json\`), but the JSON does not parse: ${message}`, {
      file: input.file,
      ...where,
    });
  }
}

/** Checks one report's shape, throwing an InputError at the first bad key. */
class ReportValidator {
  constructor(private readonly file: string) {}

  fail(key: string, expected: string, value: unknown): never {
    let shown: string;
    try {
      shown = value === undefined ? 'nothing' : (JSON.stringify(value) ?? String(value));
    } catch {
      shown = String(value);
    }
    if (shown.length > 80) shown = `${shown.slice(0, 79)}…`;
    throw new InputError(MERGE_ERROR.shape, `expected ${expected}, got ${shown}`, { file: this.file, key });
  }

  object(value: unknown, key: string): Json {
    if (typeof value !== 'object' || value === null || Array.isArray(value)) this.fail(key, 'an object', value);
    return value as Json;
  }

  array(value: unknown, key: string): unknown[] {
    if (!Array.isArray(value)) this.fail(key, 'an array', value);
    return value;
  }

  string(value: unknown, key: string): string {
    if (typeof value !== 'string') this.fail(key, 'a string', value);
    return value;
  }

  oneOf(value: unknown, key: string, allowed: string[]): void {
    if (typeof value !== 'string' || !allowed.includes(value)) this.fail(key, `one of ${allowed.join(', ')}`, value);
  }

  count(value: unknown, key: string): void {
    if (typeof value !== 'number' || !Number.isInteger(value) || value < 0) this.fail(key, 'a whole number >= 0', value);
  }

  /** A JSON number as the report writes it: a number or `"Infinity"`, `"-Infinity"`, `"NaN"`. */
  jsonNumber(value: unknown, key: string, nullable = false): void {
    if (nullable && value === null) return;
    if (typeof value === 'number') return;
    if (value === 'Infinity' || value === '-Infinity' || value === 'NaN') return;
    this.fail(key, nullable ? 'a number or null' : 'a number', value);
  }

  model(value: unknown, key: string): ModelResult {
    const m = this.object(value, key);
    this.string(m.name, `${key}.name`);
    this.string(m.descriptor, `${key}.descriptor`);
    this.oneOf(m.verdict, `${key}.verdict`, VERDICTS);
    const rows = this.object(m.rows, `${key}.rows`);
    this.count(rows.train, `${key}.rows.train`);
    this.count(rows.holdout, `${key}.rows.holdout`);
    this.count(m.parameters, `${key}.parameters`);
    this.array(m.columns, `${key}.columns`).forEach((c, i) => this.string(c, `${key}.columns[${i}]`));
    if (m.metrics !== null) this.object(m.metrics, `${key}.metrics`);
    this.array(m.coefficients, `${key}.coefficients`).forEach((c, i) => this.jsonNumber(c, `${key}.coefficients[${i}]`));
    if (m.shipped !== null && m.shipped !== undefined) this.object(m.shipped, `${key}.shipped`);
    this.array(m.checks, `${key}.checks`).forEach((c, i) => {
      const at = `${key}.checks[${i}]`;
      const check = this.object(c, at);
      this.string(check.id, `${at}.id`);
      this.string(check.code, `${at}.code`);
      this.oneOf(check.status, `${at}.status`, STATUSES);
      this.jsonNumber(check.value, `${at}.value`, true);
      this.count(check.line, `${at}.line`);
      this.string(check.message, `${at}.message`);
    });
    if (m.error !== null) {
      const e = this.object(m.error, `${key}.error`);
      this.string(e.message, `${key}.error.message`);
      this.string(e.code, `${key}.error.code`);
    }
    if (m.verdict === 'error' && m.error === null) this.fail(`${key}.error`, 'the error of a model whose verdict is `error`', m.error);
    return m as unknown as ModelResult;
  }

  report(value: unknown): { models: ModelResult[]; notes: string[] } {
    const r = this.object(value, '(top level)');
    const tool = this.object(r.tool, 'tool');
    if (tool.name !== 'fitgate') this.fail('tool.name', '"fitgate"', tool.name);
    this.oneOf(r.verdict, 'verdict', VERDICTS);
    const models = this.array(r.models, 'models').map((m, i) => this.model(m, `models[${i}]`));
    const notes = r.notes === undefined ? [] : this.array(r.notes, 'notes').map((n, i) => this.string(n, `notes[${i}]`));
    return { models, notes };
  }
}

/**
 * Joins shard reports into one Result.
 * @param inputs the reports' texts with their paths, in the order given (at least one)
 * @param version the tool version to record in the merged Result
 * @returns the merged Result: models of every report sorted as {@link summarise} sorts them,
 *   verdict and counts recomputed, notes de-duplicated in input order
 * @throws InputError `merge-no-reports` for an empty list, `merge-json` for text that is not
 *   JSON (with line and column), `merge-shape` for a key of the wrong type (with the key path),
 *   `merge-duplicate` when two reports (or one) hold the same model name
 */
export function mergeReports(inputs: readonly ReportInput[], version: string): Result {
  if (inputs.length === 0) {
    throw new InputError(MERGE_ERROR.none, 'expected at least one JSON report to merge (the files `fitgate check --shard K/N --format json --out FILE` wrote), got none');
  }
  const models: ModelResult[] = [];
  const notes: string[] = [];
  const seen = new Map<string, { file: string; index: number }>();
  for (const input of inputs) {
    const report = new ReportValidator(input.file).report(parseJson(input));
    report.models.forEach((model, index) => {
      const first = seen.get(model.name);
      if (first) {
        throw new InputError(
          MERGE_ERROR.duplicate,
          `model \`${model.name}\` is also in ${first.file} (models[${first.index}]); expected every model in exactly one shard report (were reports of different runs mixed?)`,
          { file: input.file, key: `models[${index}].name` },
        );
      }
      seen.set(model.name, { file: input.file, index });
      models.push(model);
    });
    for (const note of report.notes) if (!notes.includes(note)) notes.push(note);
  }
  return summarise(models, version, notes);
}
