// Builds a check context in memory (descriptor, data, design, fit) without the loaders, so that
// check tests do not depend on the YAML and CSV readers.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createTerm, termInputs } from '../../src/design/terms/index.js';
import { meanAndSd, range } from '../../src/design/stats.js';
import type { CheckContext, CoreMetrics } from '../../src/checks/types.js';
import type { ModelData } from '../../src/data/model-data.js';
import { ModelAnalyses } from '../../src/diagnostics/analyses.js';
import { scoreShipped } from '../../src/diagnostics/shipped.js';
import { LIMIT_KEYS, toLimit } from '../../src/config/limits.js';
import type { Descriptor, Limit, TermSpec } from '../../src/config/types.js';
import { createDesign } from '../../src/design/design-matrix.js';
import { fitFactor, QrAccumulator } from '../../src/fit/index.js';
import { forEachBlock, predictRows } from '../../src/design/blocks.js';
import { addErrors, emptySums, errorMeasures } from '../../src/diagnostics/regression-metrics.js';

/** A term as written in a test, its line optional (distributes over the term kinds). */
export type TermWithoutLine = TermSpec extends infer T ? (T extends TermSpec ? Omit<T, 'line'> : never) : never;

export const repoRoot = fileURLToPath(new URL('../../', import.meta.url));

/** A small table: column names, columns, 1-based file lines (header on line 1). */
export interface Table {
  names: string[];
  columns: Float64Array[];
  lines: Int32Array;
  file: string;
}

/** Parses a plain numeric CSV (no quoting) from text. */
export function parseCsv(text: string, file = 'memory.csv'): Table {
  const rows = text.split('\n').map((l) => l.trim());
  const names = rows[0].split(',');
  const data: number[][] = [];
  const lines: number[] = [];
  rows.slice(1).forEach((r, i) => {
    if (r === '') return;
    data.push(r.split(',').map(Number));
    lines.push(i + 2);
  });
  return { names, columns: names.map((_, c) => Float64Array.from(data, (r) => r[c])), lines: Int32Array.from(lines), file };
}

/** Reads one of the example repository's CSV files. */
export function exampleTable(name: string): Table {
  return parseCsv(readFileSync(`${repoRoot}examples/data/${name}`, 'utf8'), `examples/data/${name}`);
}

/** Builds an in-memory table from columns. */
export function table(names: string[], columns: number[][], file = 'memory.csv'): Table {
  return { names, columns: columns.map((c) => Float64Array.from(c)), lines: Int32Array.from(columns[0], (_, i) => i + 2), file };
}

/** Limits used by tests: the given ones, every other key absent (off). */
export function limits(spec: Record<string, { warn?: number; fail?: number }>): Record<string, Limit> {
  const out: Record<string, Limit> = {};
  for (const [k, v] of Object.entries(spec))
    out[k] = { warn: v.warn ?? null, fail: v.fail ?? null, warnBelow: null, failBelow: null, off: false, source: 'descriptor', line: 40 };
  return out;
}

/** The built-in default limits (config/limits.ts), plus the given overrides. */
export function defaultLimits(overrides: Record<string, { warn?: number; fail?: number }> = {}): Record<string, Limit> {
  const out: Record<string, Limit> = {};
  for (const { key, defaultSpec, direction } of LIMIT_KEYS) out[key] = toLimit(defaultSpec, direction, 'default', null);
  return { ...out, ...limits(overrides) };
}

/** A descriptor built in the test. Terms get lines 10, 11, ...; `fit` line 20, `ridge` line 21. */
export function descriptor(options: {
  terms: Array<TermWithoutLine & { line?: number }>;
  target: string;
  ridge?: number;
  intercept?: boolean;
  folds?: number;
  foldOrder?: 'shuffled' | 'blocks';
  seed?: number;
  coefficients?: number[] | null;
  limits?: Record<string, Limit>;
}): Descriptor {
  return {
    file: 'models/test.model.yml',
    name: 'test',
    task: 'regression',
    data: { train: 'train.csv', holdout: 'holdout.csv', target: options.target, lines: { train: 4, holdout: 5, target: 6 } },
    terms: options.terms.map((t, i) => ({ ...t, line: t.line ?? 10 + i }) as TermSpec),
    fit: {
      intercept: options.intercept ?? true,
      ridge: options.ridge ?? 0,
      folds: options.folds ?? 5,
      foldOrder: options.foldOrder ?? 'shuffled',
      seed: options.seed ?? 1,
      line: 20,
      ridgeLine: options.ridge !== undefined ? 21 : 20,
      parameterCount: 'columns',
    },
    coefficients: options.coefficients ?? null,
    coefficientsLine: options.coefficients ? 30 : null,
    limits: options.limits ?? {},
    nameLine: 2,
    termsLine: 9,
  };
}

/** Fits a descriptor on two tables and returns a check context (core metrics filled as evaluate.ts does). */
export function buildContext(d: Descriptor, train: Table, holdout: Table): CheckContext {
  const inputs: string[] = [];
  for (const t of d.terms) for (const c of termInputs(t)) if (!inputs.includes(c)) inputs.push(c);
  const pick = (tb: Table): ModelData => {
    const col = (name: string): Float64Array => {
      const k = tb.names.indexOf(name);
      if (k < 0) throw new Error(`${tb.file} has no column ${name}`);
      return tb.columns[k];
    };
    return { inputs: inputs.map(col), y: col(d.data.target), lines: tb.lines, rows: tb.lines.length, file: tb.file };
  };
  const tr = pick(train);
  const ho = pick(holdout);
  const trainColumns = new Map(inputs.map((c, k) => [c, tr.inputs[k]]));
  const design = createDesign(
    d.terms.map((t) => createTerm(t, trainColumns, d.file)),
    d.fit.intercept,
  );
  const acc = new QrAccumulator(design.p);
  forEachBlock(design, tr, (X, start, m) => acc.addRows(X, tr.y.subarray(start, start + m), m));
  const fit = fitFactor(acc, { ridge: d.fit.ridge, penalised: design.penalised });
  const measures = (data: ModelData) => {
    const sums = emptySums();
    addErrors(sums, data.y, predictRows(design, data, fit.coefficients), data.rows);
    return errorMeasures(sums);
  };
  const trainMeasures = measures(tr);
  const holdoutMeasures = measures(ho);
  const trainRmse = trainMeasures.rmse;
  const holdoutRmse = holdoutMeasures.rmse;
  const metrics: CoreMetrics = {
    trainRmse,
    holdoutRmse,
    trainMae: trainMeasures.mae,
    holdoutMae: holdoutMeasures.mae,
    trainR2: trainMeasures.r2,
    holdoutR2: holdoutMeasures.r2,
    gapRatio: holdoutRmse / trainRmse,
    paramsPerSample: design.p / tr.rows,
    maxStdCoefficient: Number.NaN,
    maxStdCoefficientColumn: -1,
    maxAbsCoefficient: Number.NaN,
    columnSd: new Float64Array(design.p),
    targetSd: meanAndSd(tr.y).sd,
    targetRange: range(tr.y),
  };
  return {
    descriptor: d,
    design,
    fit,
    metrics,
    train: tr,
    holdout: ho,
    baseline: null,
    analyses: new ModelAnalyses({ design, fit, train: tr, holdout: ho, folds: d.fit }),
    predictions: { train: predictRows(design, tr, fit.coefficients), holdout: predictRows(design, ho, fit.coefficients) },
    shipped: d.coefficients === null ? null : scoreShipped(design, tr, ho, d.coefficients, fit.coefficients),
  };
}
