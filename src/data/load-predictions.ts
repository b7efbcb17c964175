/**
 * The rows of a model trained elsewhere (`predictions`): the target and the named inputs of the
 * training and hold-out files (load-model-data.ts, labels.ts for classifiers) with the model's
 * prediction of each row, read from a column of the data file or from a side file (rows in file
 * order, or matched by a key column). Side files go through the same repository reader, size cap
 * and CSV rules as data files.
 */
import type { Descriptor, PredictionSource, SettingsFile } from '../config/types.js';
import { clip, InputError, quoteValue } from '../core/errors.js';
import { type ClassLabels, loadClassifierData } from './labels.js';
import { loadModelData, type ModelTables } from './load-model-data.js';
import type { ModelData } from './model-data.js';
import { readTable } from './table.js';
import { readTextColumns } from './text-columns.js';
import type { RepoReader } from '../repo/types.js';

/** Stable codes of the errors this module throws. */
export const PREDICTIONS_ERROR = Object.freeze({
  /** The prediction column is the target or an input. */
  column: 'predictions-column',
  /** Data and side file do not hold the same rows (count, or keys missing on either side). */
  rows: 'predictions-rows',
  /** A key cell is empty or a key repeats. */
  key: 'predictions-key',
  /** A prediction is not finite, or a classifier's probability is outside [0, 1]. */
  value: 'predictions-value',
});

/** One file's rows with the model's prediction of each. */
export interface PredictedRows extends ModelData {
  /** The model's prediction of each row (length `rows`); classifiers: the probability of the positive class. */
  predictions: Float64Array;
  /** Where each prediction was read: the side file (or the data file) and its 1-based line there. */
  predictionFile: string;
  predictionLines: Int32Array;
}

/** Both files of a model trained elsewhere. */
export interface PredictionTables {
  train: PredictedRows;
  holdout: PredictedRows;
  /** Classifiers: how the target's two classes were written; null for regression. */
  labels: ClassLabels | null;
}

/**
 * Loads a model trained elsewhere: inputs (`predictions.inputs`, for leakage), target and
 * predictions of both files. Classifiers' targets become 0/1 as for models of terms (labels.ts),
 * and their predictions must be probabilities in [0, 1].
 * @throws InputError every data-file error of {@link loadModelData}, plus `predictions-column`,
 *   `predictions-rows` (naming both files and the first bad line), `predictions-key`,
 *   `predictions-value`
 */
export async function loadPredictionsData(repo: RepoReader, descriptor: Descriptor, settings: SettingsFile): Promise<PredictionTables> {
  const spec = descriptor.predictions;
  if (!spec) throw new TypeError('loadPredictionsData needs a descriptor with `predictions`');
  for (const which of ['train', 'holdout'] as const) {
    const source = spec[which];
    if (source.file !== null) continue;
    const clash = source.column === descriptor.data.target ? 'the target column' : spec.inputs.includes(source.column) ? 'an input' : null;
    if (clash !== null) {
      throw new InputError(
        PREDICTIONS_ERROR.column,
        `\`predictions.${which}.column\` names ${clash} (\`${clip(source.column)}\`); expected the column that holds the model's predictions`,
        { file: descriptor.file, line: source.line, key: `predictions.${which}.column` },
      );
    }
  }
  const classifier = descriptor.task === 'classification';
  let tables: ModelTables;
  let labels: ClassLabels | null = null;
  try {
    if (classifier) {
      const t = await loadClassifierData(repo, descriptor, spec.inputs, settings);
      labels = t.labels;
      tables = t;
    } else {
      tables = await loadModelData(repo, descriptor, spec.inputs, settings);
    }
  } catch (error) {
    throw namedInput(error, descriptor);
  }
  const out = {} as Record<'train' | 'holdout', PredictedRows>;
  for (const which of ['train', 'holdout'] as const) {
    const data = tables[which];
    const read = await readPredictions(repo, descriptor, settings, data, spec[which], which);
    checkValues(read, spec[which], which, classifier);
    out[which] = { ...data, predictions: read.values, predictionFile: read.file, predictionLines: read.lines };
  }
  return { train: out.train, holdout: out.holdout, labels };
}

/** Predictions of one file's rows, with the file and line each was read from. */
interface ReadPredictions {
  values: Float64Array;
  file: string;
  lines: Int32Array;
}

async function readPredictions(
  repo: RepoReader,
  descriptor: Descriptor,
  settings: SettingsFile,
  data: ModelData,
  source: PredictionSource,
  which: 'train' | 'holdout',
): Promise<ReadPredictions> {
  const maxBytes = settings.caps.maxFileBytes;
  const format = descriptor.data.format;
  if (source.file === null) return columnOfDataFile(repo, descriptor, data, source, which, maxBytes);
  // A side file: its own rows, every cell of the column present.
  const side = await readTable(repo, source.file, {
    columns: [source.column],
    maxBytes,
    ...(format ? { format: { ...format, missing: 'error' as const } } : {}),
  });
  const values = side.columns.get(source.column) as Float64Array;
  if (source.key === null) return inFileOrder(descriptor, data, source.file, side.lines, values, side.rows, which);
  return byKey(repo, data, source as PredictionSource & { file: string; key: string }, side.lines, values, side.rows, maxBytes);
}

/** The prediction column of the data file itself, row for row (the same split side; missing cells refused). */
async function columnOfDataFile(
  repo: RepoReader,
  descriptor: Descriptor,
  data: ModelData,
  source: PredictionSource,
  which: 'train' | 'holdout',
  maxBytes: number,
): Promise<ReadPredictions> {
  const split = descriptor.data.split ?? null;
  const side =
    split === null
      ? undefined
      : which === 'train'
        ? { column: split.column, keep: split.train, other: split.holdout }
        : { column: split.column, keep: split.holdout, other: split.train };
  const format = descriptor.data.format;
  let table: Awaited<ReturnType<typeof readTable>>;
  try {
    table = await readTable(repo, data.file, {
      columns: [source.column],
      maxBytes,
      ...(format ? { format } : {}),
      ...(side ? { split: side } : {}),
    });
  } catch (error) {
    if (error instanceof InputError && error.code === 'csv-missing-column' && error.location.key === source.column)
      throw new InputError(
        error.code,
        `${error.message} (asked for by \`predictions.${which}.column\` on line ${source.line} of ${clip(descriptor.file)})`,
        error.location,
      );
    throw error;
  }
  const all = table.columns.get(source.column) as Float64Array;
  // With `data.missing: drop` either read may have dropped rows: pair them by line.
  const values = new Float64Array(data.rows);
  let j = 0;
  for (let i = 0; i < data.rows; i++) {
    const line = data.lines[i];
    while (j < table.rows && table.lines[j] < line) j++;
    if (j >= table.rows || table.lines[j] !== line) {
      throw new InputError(
        PREDICTIONS_ERROR.rows,
        `line ${line} of ${clip(data.file)} has no prediction in column \`${clip(source.column)}\` (\`predictions.${which}.column\`); expected a prediction for every data row`,
        { file: data.file, line, key: source.column },
      );
    }
    values[i] = all[j];
  }
  return { values, file: data.file, lines: data.lines };
}

/** A side file without a key: its rows go with the data rows in file order, one for one. */
function inFileOrder(
  descriptor: Descriptor,
  data: ModelData,
  sideFile: string,
  sideLines: Int32Array,
  values: Float64Array,
  sideRows: number,
  which: 'train' | 'holdout',
): ReadPredictions {
  if ((data.dropped ?? 0) > 0) {
    throw new InputError(
      PREDICTIONS_ERROR.rows,
      `${data.dropped} rows of ${clip(data.file)} were dropped for missing cells, so the rows of ${clip(sideFile)} cannot be paired with them in file order; expected \`predictions.${which}.key\` (a key column both files hold)`,
      { file: descriptor.file, line: descriptor.predictions?.[which].line, key: `predictions.${which}` },
    );
  }
  if (sideRows !== data.rows) {
    const short = sideRows < data.rows;
    const message = short
      ? `${clip(sideFile)} has ${sideRows} prediction rows but ${clip(data.file)} has ${data.rows} data rows: line ${data.lines[sideRows]} of ${clip(data.file)} (data row ${sideRows + 1}) has no prediction row`
      : `${clip(sideFile)} has ${sideRows} prediction rows but ${clip(data.file)} has ${data.rows} data rows: line ${sideLines[data.rows]} of ${clip(sideFile)} (prediction row ${data.rows + 1}) has no data row`;
    throw new InputError(
      PREDICTIONS_ERROR.rows,
      `${message}; expected one prediction row per data row, in the same order (or \`predictions.${which}.key\` to match rows by a key column)`,
      short ? { file: data.file, line: data.lines[sideRows] } : { file: sideFile, line: sideLines[data.rows] },
    );
  }
  return { values: values.slice(0, sideRows), file: sideFile, lines: sideLines.slice(0, sideRows) };
}

/**
 * A side file with a key column: each data row takes the side row of the same key. Keys are text
 * as written (trimmed; `07` and `7` differ) and unique in each file. A side key held by no row of
 * the data file is an error; one held by a row of the other split side or a dropped row is not.
 */
async function byKey(
  repo: RepoReader,
  data: ModelData,
  source: PredictionSource & { file: string; key: string },
  sideLines: Int32Array,
  values: Float64Array,
  sideRows: number,
  maxBytes: number,
): Promise<ReadPredictions> {
  const keyColumn = source.key;
  const dataKeys = await readTextColumns(repo, data.file, [keyColumn], maxBytes);
  const sideKeys = await readTextColumns(repo, source.file, [keyColumn], maxBytes);
  // Every key of the data file (all its rows) by line, for the rows used and for the others.
  const allDataKeys = new Set<string>();
  const dataKeyOf = keysByLine(dataKeys, keyColumn, data.file);
  for (const k of dataKeyOf.values()) allDataKeys.add(k);
  // Side rows by key (unique), paired with their numeric row by line.
  const sideKeyOf = keysByLine(sideKeys, keyColumn, source.file);
  const sideIndex = new Map<string, number>();
  for (let j = 0; j < sideRows; j++) {
    const k = sideKeyOf.get(sideLines[j]);
    if (k === undefined) {
      throw new InputError(PREDICTIONS_ERROR.rows, `line ${sideLines[j]} of ${clip(source.file)} has a prediction but no key`, {
        file: source.file,
        line: sideLines[j],
        key: keyColumn,
      });
    }
    const first = sideIndex.get(k);
    if (first !== undefined) throw duplicateKey(source.file, keyColumn, k, sideLines[first], sideLines[j]);
    sideIndex.set(k, j);
  }
  const out = new Float64Array(data.rows);
  const lines = new Int32Array(data.rows);
  const used = new Map<string, number>();
  for (let i = 0; i < data.rows; i++) {
    const k = dataKeyOf.get(data.lines[i]);
    if (k === undefined) {
      throw new InputError(
        PREDICTIONS_ERROR.key,
        `line ${data.lines[i]} of ${clip(data.file)} has no key in column \`${clip(keyColumn)}\` as its text is read; expected one record per line (no line breaks inside quoted cells)`,
        { file: data.file, line: data.lines[i], key: keyColumn },
      );
    }
    const seen = used.get(k);
    if (seen !== undefined) throw duplicateKey(data.file, keyColumn, k, data.lines[seen], data.lines[i]);
    used.set(k, i);
    const j = sideIndex.get(k);
    if (j === undefined) {
      throw new InputError(
        PREDICTIONS_ERROR.rows,
        `line ${data.lines[i]} of ${clip(data.file)} has key ${quoteValue(k, 40)} (column \`${clip(keyColumn)}\`), which no row of ${clip(source.file)} holds; expected a prediction row for every data row (${data.rows} data rows, ${sideRows} prediction rows)`,
        { file: data.file, line: data.lines[i], key: keyColumn },
      );
    }
    out[i] = values[j];
    lines[i] = sideLines[j];
  }
  for (let j = 0; j < sideRows; j++) {
    const k = sideKeyOf.get(sideLines[j]) as string;
    if (!allDataKeys.has(k)) {
      throw new InputError(
        PREDICTIONS_ERROR.rows,
        `line ${sideLines[j]} of ${clip(source.file)} has key ${quoteValue(k, 40)} (column \`${clip(keyColumn)}\`), which no row of ${clip(data.file)} holds; expected predictions of the data file's rows only (${data.rows} data rows, ${sideRows} prediction rows)`,
        { file: source.file, line: sideLines[j], key: keyColumn },
      );
    }
  }
  return { values: out, file: source.file, lines };
}

/** Key of each row by its line; an empty key cell is an error naming the file and line. */
function keysByLine(text: Awaited<ReturnType<typeof readTextColumns>>, column: string, file: string): Map<number, string> {
  const keys = text.columns.get(column) as string[];
  const out = new Map<number, string>();
  for (let r = 0; r < keys.length; r++) {
    if (keys[r] === '') {
      throw new InputError(
        PREDICTIONS_ERROR.key,
        `line ${text.lines[r]} of ${clip(file)} has an empty key in column \`${clip(column)}\`; expected a key in every row`,
        {
          file,
          line: text.lines[r],
          key: column,
        },
      );
    }
    out.set(text.lines[r], keys[r]);
  }
  return out;
}

function duplicateKey(file: string, column: string, key: string, firstLine: number, line: number): InputError {
  return new InputError(
    PREDICTIONS_ERROR.key,
    `line ${line} of ${clip(file)} repeats key ${quoteValue(key, 40)} of line ${firstLine} (column \`${clip(column)}\`); expected each key once`,
    { file, line, key: column },
  );
}

/** Predictions are finite; a classifier's are probabilities in [0, 1]. */
function checkValues(read: ReadPredictions, source: PredictionSource, which: 'train' | 'holdout', classifier: boolean): void {
  for (let i = 0; i < read.values.length; i++) {
    const v = read.values[i];
    const bad = classifier ? !(v >= 0 && v <= 1) : !Number.isFinite(v);
    if (!bad) continue;
    throw new InputError(
      PREDICTIONS_ERROR.value,
      classifier
        ? `the prediction ${v} on line ${read.lines[i]} of ${clip(read.file)} (column \`${clip(source.column)}\`, \`predictions.${which}\`) is not a probability; a classifier's predictions (\`task: classification\`) are probabilities of the positive class in [0, 1]`
        : `the prediction ${v} on line ${read.lines[i]} of ${clip(read.file)} (column \`${clip(source.column)}\`, \`predictions.${which}\`) is not a finite number`,
      { file: read.file, line: read.lines[i], key: source.column },
    );
  }
}

/** A missing input column names `predictions.inputs` as the asker. */
function namedInput(error: unknown, descriptor: Descriptor): unknown {
  if (!(error instanceof InputError) || error.code !== 'csv-missing-column' || error.location.key === undefined) return error;
  if (!descriptor.predictions?.inputs.includes(error.location.key)) return error;
  return new InputError(
    error.code,
    `${error.message} (asked for by \`predictions.inputs\` on line ${descriptor.predictions.line} of ${clip(descriptor.file)})`,
    error.location,
  );
}
