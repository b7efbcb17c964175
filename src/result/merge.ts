/**
 * Joins the JSON reports of shard jobs (`fitgate check --shard K/N --format json`) into one
 * Result, as if one job had checked every model. Nothing in a report is trusted:
 *
 * - the text is scanned before it is parsed: nesting deeper than {@link MAX_REPORT_DEPTH} and
 *   number literals that are not finite (`1e999`) are refused with the file, line and column;
 * - the parsed value is validated against the report's JSON Schema
 *   (`config/schema/report.schema.json`, precompiled): every field a reporter reads has its type,
 *   its range (whole numbers, lines from 1) and its documented strings checked, and no unknown
 *   key is let through;
 * - every check's status is recomputed from its figure and limits, every model's verdict from
 *   its checks (or its error), the report's verdict and counts from its models: a report that
 *   disagrees with itself was edited and is refused;
 * - shards are accounted for: with `--expect N` there must be N reports, and when reports name
 *   their shard (`shard: {index, count}`, written by `--shard`) every K of 1..N must be there
 *   exactly once;
 * - the same model name in two reports is an error (the shards of one run never overlap).
 *
 * Model names and other user keys are only compared and held in a Map, never used as keys of a
 * plain object, so `__proto__` and `constructor` are names like any other. Every error is an
 * InputError naming the report file and the key path (e.g. `models[2].verdict`).
 */
import { InputError, clip, quoteValue } from '../core/errors.js';
import {
  summarise,
  type ModelResult,
  type Result,
  fromJsonNumber,
  worse,
  type CheckResult,
  type CheckStatus,
  type Verdict,
} from './result.js';
import { validateReport } from '../config/generated/report-validator.js';

/** One shard report as read from disk. */
export interface ReportInput {
  /** Path of the report as given (for messages). */
  file: string;
  /** Its text. */
  text: string;
}

/** Options of {@link mergeReports}. */
export interface MergeOptions {
  /** The number of reports there must be (`--expect N`); null or absent: any number. */
  expect?: number | null;
}

/** Error codes of {@link mergeReports}. */
export const MERGE_ERROR = Object.freeze({
  none: 'merge-no-reports',
  json: 'merge-json',
  tooDeep: 'merge-too-deep',
  number: 'merge-number',
  shape: 'merge-shape',
  inconsistent: 'merge-inconsistent',
  duplicate: 'merge-duplicate',
  missingShard: 'merge-missing-shard',
});

/** Deepest nesting of arrays and objects a report may have (a real one has fewer than 10 levels). */
export const MAX_REPORT_DEPTH = 64;

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
      if (text[i] === '}') {
        i++;
        return;
      }
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
        else if (text[i] === '}') {
          i++;
          return;
        } else fail();
      }
    }
    if (c === '[') {
      i++;
      ws();
      if (text[i] === ']') {
        i++;
        return;
      }
      for (;;) {
        value();
        ws();
        if (text[i] === ',') i++;
        else if (text[i] === ']') {
          i++;
          return;
        } else fail();
      }
    }
    if (c === '"') string();
    else if (c === 't') literal('true');
    else if (c === 'f') literal('false');
    else if (c === 'n') literal('null');
    else if (c === '-' || (c !== undefined && c >= '0' && c <= '9')) number();
    else fail();
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

/**
 * The first place where a JSON text nests deeper than `maxDepth` or writes a number literal
 * whose value is not finite, or null. A linear scan that keeps no stack (only the depth), so
 * that nothing recursive ever meets a deep text; strings are skipped with their escapes.
 *
 * @param text the JSON text
 * @param maxDepth deepest nesting allowed; default {@link MAX_REPORT_DEPTH}
 * @returns the offset and what is wrong there, or null
 */
export function scanJsonText(text: string, maxDepth = MAX_REPORT_DEPTH): { offset: number; problem: 'depth' | 'number' } | null {
  let depth = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) {
      // A string: skip to its closing quote.
      for (i += 1; i < text.length && text.charCodeAt(i) !== 34; i++) if (text.charCodeAt(i) === 92) i += 1;
    } else if (c === 91 || c === 123) {
      depth += 1;
      if (depth > maxDepth) return { offset: i, problem: 'depth' };
    } else if (c === 93 || c === 125) {
      depth -= 1;
    } else if (c === 45 || (c >= 48 && c <= 57)) {
      let end = i + 1;
      while (end < text.length && isNumberChar(text.charCodeAt(end))) end += 1;
      const value = Number(text.slice(i, end));
      if (value === Infinity || value === -Infinity) return { offset: i, problem: 'number' };
      i = end - 1;
    }
  }
  return null;
}

/** Digits, `e`, `E`, `+`, `-` and `.`: the characters of a JSON number literal. */
function isNumberChar(c: number): boolean {
  return (c >= 48 && c <= 57) || c === 101 || c === 69 || c === 43 || c === 45 || c === 46;
}

/** Parses a report's JSON: bounded first (depth, numbers), then a syntax error gets its line and column. */
function parseJson(input: ReportInput): unknown {
  const scanned = scanJsonText(input.text);
  if (scanned !== null) {
    const where = { file: input.file, ...lineColumn(input.text, scanned.offset) };
    if (scanned.problem === 'depth') {
      throw new InputError(
        MERGE_ERROR.tooDeep,
        `the JSON nests arrays and objects more than ${MAX_REPORT_DEPTH} levels deep; expected a fitgate JSON report (a few levels)`,
        where,
      );
    }
    const literal = /^-?[0-9eE+.-]*/.exec(input.text.slice(scanned.offset, scanned.offset + 200))?.[0] ?? '';
    throw new InputError(
      MERGE_ERROR.number,
      `the number ${quoteValue(literal)} is beyond the range of 64-bit floating point; expected finite numbers (a report writes the others as "Infinity", "-Infinity" or "NaN")`,
      where,
    );
  }
  try {
    return JSON.parse(input.text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const offset = jsonErrorOffset(input.text);
    const where = offset >= 0 ? lineColumn(input.text, offset) : {};
    throw new InputError(
      MERGE_ERROR.json,
      `expected a fitgate JSON report (from \`fitgate check --format json\`), but the JSON does not parse: ${clip(message)}`,
      {
        file: input.file,
        ...where,
      },
    );
  }
}

/** A JSON pointer (`/models/2/verdict`) as a key path (`models[2].verdict`); `(top level)` for the root. */
function keyPath(pointer: string, extra?: string): string {
  const parts =
    pointer === ''
      ? []
      : pointer
          .slice(1)
          .split('/')
          .map((p) => p.replace(/~1/g, '/').replace(/~0/g, '~'));
  if (extra !== undefined) parts.push(extra);
  let out = '';
  for (const part of parts) out += /^\d+$/.test(part) ? `[${part}]` : out === '' ? part : `.${part}`;
  return out === '' ? '(top level)' : out;
}

/** The value at a JSON pointer (own properties only). */
function valueAt(root: unknown, pointer: string): unknown {
  let node = root;
  for (const part of pointer === '' ? [] : pointer.slice(1).split('/')) {
    if (node === null || typeof node !== 'object' || !Object.hasOwn(node, part)) return undefined;
    node = (node as Record<string, unknown>)[part];
  }
  return node;
}

/** An ajv error, as much of it as is read here. */
interface SchemaError {
  instancePath: string;
  keyword: string;
  params: Record<string, unknown>;
}

/** What a failed keyword expected, in words. */
function expectation(error: SchemaError): string {
  const p = error.params;
  switch (error.keyword) {
    case 'type': {
      const types = String(p.type).split(',');
      const words: Record<string, string> = {
        string: 'a string',
        number: 'a number',
        integer: 'a whole number',
        object: 'an object',
        array: 'an array',
        boolean: 'true or false',
        null: 'null',
      };
      return types.map((t) => words[t] ?? t).join(' or ');
    }
    case 'enum':
      return `one of ${(p.allowedValues as unknown[]).map((v) => String(v)).join(', ')}`;
    case 'const':
      return JSON.stringify(p.allowedValue);
    case 'minimum':
      return `a number >= ${String(p.limit)}`;
    case 'minItems':
    case 'maxItems':
      return `${String(p.limit)} items`;
    default:
      return `a value that passes \`${error.keyword}\``;
  }
}

/** The InputError for a report that does not fit the schema: the deepest error, in words. */
function schemaError(file: string, value: unknown, errors: readonly SchemaError[]): InputError {
  const depth = (e: SchemaError): number => (e.instancePath === '' ? 0 : e.instancePath.split('/').length);
  const deepest = errors.reduce((best, e) => (depth(e) > depth(best) ? e : best), errors[0]);
  if (deepest.keyword === 'required') {
    const missing = String(deepest.params.missingProperty);
    return new InputError(MERGE_ERROR.shape, `expected key \`${clip(missing)}\`, got nothing`, {
      file,
      key: keyPath(deepest.instancePath, missing),
    });
  }
  if (deepest.keyword === 'additionalProperties') {
    const extra = String(deepest.params.additionalProperty);
    return new InputError(MERGE_ERROR.shape, `expected no key \`${clip(extra)}\` (it is not part of a fitgate JSON report)`, {
      file,
      key: keyPath(deepest.instancePath, extra),
    });
  }
  // Alternatives (anyOf) at one place: every branch's expectation, once each.
  const here = errors.filter((e) => e.instancePath === deepest.instancePath && e.keyword !== 'anyOf');
  const expected = [...new Set((here.length > 0 ? here : [deepest]).map(expectation))].join(', or ');
  return new InputError(MERGE_ERROR.shape, `expected ${expected}, got ${quoteValue(valueAt(value, deepest.instancePath))}`, {
    file,
    key: keyPath(deepest.instancePath),
  });
}

/** The status the registry gives a figure against its limits (checks/types.ts `judge`); both when limits alone cannot tell. */
function statusesOf(check: CheckResult): CheckStatus[] {
  const value = check.value === null ? Number.NaN : fromJsonNumber(check.value);
  if (Number.isNaN(value)) return ['skipped'];
  const floor = check.floor ?? { warn: null, fail: null };
  if ((check.limit !== null && value > check.limit) || (floor.fail !== null && value < floor.fail)) return ['fail'];
  if ((check.warn !== null && value > check.warn) || (floor.warn !== null && value < floor.warn)) return ['warn'];
  // Without thresholds the limit may be off (skipped) or have neither set (pass).
  return check.limit === null && check.warn === null && floor.fail === null && floor.warn === null ? ['pass', 'skipped'] : ['pass'];
}

/** Refuses a report whose statuses, verdicts and counts disagree with their own figures. */
function checkConsistency(file: string, report: Result): void {
  const inconsistent = (key: string, message: string): never => {
    throw new InputError(MERGE_ERROR.inconsistent, `${message}; expected the report as fitgate wrote it (was it edited?)`, { file, key });
  };
  let verdict: Verdict = 'pass';
  const counts = { models: report.models.length, pass: 0, warn: 0, fail: 0, error: 0 };
  report.models.forEach((m, i) => {
    let expected: Verdict = 'pass';
    m.checks.forEach((c, j) => {
      const allowed = statusesOf(c);
      if (!allowed.includes(c.status))
        inconsistent(
          `models[${i}].checks[${j}].status`,
          `the status is ${quoteValue(c.status)} but the figure ${quoteValue(c.value)} against the limits (fail ${quoteValue(c.limit)}, warn ${quoteValue(c.warn)}) gives ${allowed.join(' or ')}`,
        );
      if (c.status === 'fail' || c.status === 'warn') expected = worse(expected, c.status);
    });
    if (m.error !== null) expected = 'error';
    if (m.verdict !== expected) {
      const because =
        m.error !== null ? 'the model has an error' : m.verdict === 'error' ? 'the model has no error' : 'its checks give that';
      inconsistent(`models[${i}].verdict`, `the verdict is ${quoteValue(m.verdict)} but ${because}: ${quoteValue(expected)}`);
    }
    counts[m.verdict] += 1;
    verdict = worse(verdict, m.verdict);
  });
  if (report.verdict !== verdict)
    inconsistent('verdict', `the report's verdict is ${quoteValue(report.verdict)} but its models give ${quoteValue(verdict)}`);
  for (const key of ['models', 'pass', 'warn', 'fail', 'error'] as const) {
    if (report.counts[key] !== counts[key])
      inconsistent(`counts.${key}`, `the count is ${report.counts[key]} but the models give ${counts[key]}`);
  }
}

/** One report: bounded, parsed, validated against the schema, consistent with itself. */
function readReport(input: ReportInput): Result {
  const value = parseJson(input);
  if (!validateReport(value)) throw schemaError(input.file, value, (validateReport as unknown as { errors: SchemaError[] }).errors ?? []);
  const report = value as Result;
  checkConsistency(input.file, report);
  return report;
}

/** With `--expect N` there must be N reports; reports that name their shard must cover 1..N once each. */
function checkShards(inputs: readonly ReportInput[], reports: readonly Result[], expect: number | null): void {
  if (expect !== null && reports.length !== expect) {
    throw new InputError(
      MERGE_ERROR.missingShard,
      `--expect ${expect} asks for ${expect} shard report${expect === 1 ? '' : 's'}, got ${reports.length}; expected every shard's report (did a shard job fail before writing it?)`,
      { key: '--expect' },
    );
  }
  const named = reports.map((r, i) => ({ shard: r.shard, file: inputs[i].file })).filter((r) => r.shard !== undefined);
  if (named.length === 0) return;
  const unnamed = reports.findIndex((r) => r.shard === undefined);
  if (unnamed >= 0) {
    throw new InputError(
      MERGE_ERROR.missingShard,
      `the report names no shard while ${clip(named[0].file)} is shard ${named[0].shard?.index}/${named[0].shard?.count}; expected reports of one sharded run`,
      { file: inputs[unnamed].file, key: 'shard' },
    );
  }
  const count = expect ?? named[0].shard?.count ?? 0;
  const seen = new Map<number, string>();
  for (const { shard, file } of named) {
    if (shard === undefined) continue;
    if (shard.count !== count || shard.index > count) {
      throw new InputError(
        MERGE_ERROR.missingShard,
        `the report is shard ${shard.index}/${shard.count}, but ${expect !== null ? `--expect ${expect}` : `${clip(named[0].file)} is of ${count} shards`}; expected reports of one run split ${count} ways`,
        { file, key: 'shard' },
      );
    }
    const first = seen.get(shard.index);
    if (first !== undefined)
      throw new InputError(
        MERGE_ERROR.duplicate,
        `shard ${shard.index}/${count} is also ${clip(first)}; expected each shard's report once`,
        { file, key: 'shard.index' },
      );
    seen.set(shard.index, file);
  }
  const missing: number[] = [];
  for (let k = 1; k <= count && missing.length < 20; k++) if (!seen.has(k)) missing.push(k);
  if (missing.length > 0) {
    throw new InputError(
      MERGE_ERROR.missingShard,
      `the reports are of a run split ${count} ways, but shard${missing.length === 1 ? '' : 's'} ${missing.map((k) => `${k}/${count}`).join(', ')} ${missing.length === 1 ? 'is' : 'are'} missing; expected every shard's report`,
      { key: 'shard' },
    );
  }
}

/**
 * Joins shard reports into one Result.
 * @param inputs the reports' texts with their paths, in the order given (at least one)
 * @param version the tool version to record in the merged Result
 * @param options `expect`: the number of reports there must be (default: any)
 * @returns the merged Result: models of every report sorted as {@link summarise} sorts them,
 *   verdict and counts recomputed, notes de-duplicated in input order (no `shard`: it is whole)
 * @throws InputError `merge-no-reports` for an empty list, `merge-json` for text that is not
 *   JSON (with line and column), `merge-too-deep` and `merge-number` for text refused before
 *   parsing, `merge-shape` for a key of the wrong type or range (with the key path),
 *   `merge-inconsistent` for statuses, verdicts or counts that disagree with the figures,
 *   `merge-duplicate` when two reports (or one) hold the same model name or shard,
 *   `merge-missing-shard` when a shard's report is missing
 */
export function mergeReports(inputs: readonly ReportInput[], version: string, options: MergeOptions = {}): Result {
  if (inputs.length === 0) {
    throw new InputError(
      MERGE_ERROR.none,
      'expected at least one JSON report to merge (the files `fitgate check --shard K/N --format json --out FILE` wrote), got none',
    );
  }
  const reports = inputs.map(readReport);
  checkShards(inputs, reports, options.expect ?? null);
  const models: ModelResult[] = [];
  const notes: string[] = [];
  const seen = new Map<string, { file: string; index: number }>();
  reports.forEach((report, r) => {
    const input = inputs[r];
    report.models.forEach((model, index) => {
      const first = seen.get(model.name);
      if (first) {
        throw new InputError(
          MERGE_ERROR.duplicate,
          `model ${quoteValue(model.name)} is also in ${clip(first.file)} (models[${first.index}]); expected every model in exactly one shard report (were reports of different runs mixed?)`,
          { file: input.file, key: `models[${index}].name` },
        );
      }
      seen.set(model.name, { file: input.file, index });
      models.push(model);
    });
    for (const note of report.notes) if (!notes.includes(note)) notes.push(note);
  });
  return summarise(models, version, notes);
}
