/**
 * The target of a binary classifier as 0/1: the two classes of the training rows, whichever way
 * the file writes them (0/1, true/false, or two text labels with `data.positive` naming the
 * positive one), checked and mapped to 1 (positive) and 0 (negative).
 */
import { parse } from 'csv-parse';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { InputError, quoteValue } from '../core/errors.js';
import { loadModelData, type ModelTables } from './load-model-data.js';
import { readTable } from './table.js';
import { openDataFile } from './gzip-stream.js';
import { placeOfLine, type LinePlace } from './data-parts.js';
import type { RepoReader } from '../repo/types.js';

/** Largest number of distinct labels collected before a target is judged not binary. */
const MAX_LABELS = 20;

/** How the target's classes were read. */
export interface ClassLabels {
  /** The positive class as written in the file (e.g. `1`, `true`, `churned`). */
  positive: string;
  /** The negative class as written. */
  negative: string;
  /** `numeric`: the target was read as numbers; `text`: as labels. */
  kind: 'numeric' | 'text';
}

/** A classifier's tables with the target mapped to 0/1, and the labels behind it. */
export interface ClassifierTables extends ModelTables {
  labels: ClassLabels;
}

/**
 * Reads a classifier's columns: the inputs as numbers, the target as two classes mapped to 1
 * (positive) and 0 (negative). Numbers: the two values 0 and 1 (1 positive), or two other
 * numbers with `data.positive` naming one. Text: `true`/`false` (any case; true positive), or
 * two labels with `data.positive` naming one. The hold-out rows may hold only labels the
 * training rows hold.
 * @throws InputError `target-classes` when the training rows hold fewer or more than two
 *   classes (naming those found), `positive-label` when `data.positive` is needed and missing or
 *   names no class found, and the errors of {@link loadModelData}
 */
export async function loadClassifierData(
  repo: RepoReader,
  descriptor: Descriptor,
  inputs: readonly string[],
  settings: SettingsFile,
): Promise<ClassifierTables> {
  let tables: ModelTables;
  try {
    tables = await loadModelData(repo, descriptor, inputs, settings);
  } catch (error) {
    if (error instanceof InputError && error.code === 'csv-cell' && error.location.key === descriptor.data.target) {
      return loadTextLabels(repo, descriptor, inputs, settings);
    }
    throw error;
  }
  const found = distinctNumbers(tables.train.y, tables.train.rows);
  const shown = found.map((v) => String(v));
  const labels = chooseClasses(descriptor, shown, 'numeric');
  const positive = Number(labels.positive);
  const negative = Number(labels.negative);
  for (const data of [tables.train, tables.holdout]) {
    const y = data.y;
    for (let i = 0; i < data.rows; i++) {
      const v = y[i];
      if (v === positive) y[i] = 1;
      else if (v === negative) y[i] = 0;
      else throw unknownLabel(descriptor, placeOfLine(data, data.lines[i]), String(v), labels);
    }
  }
  return { ...tables, labels };
}

/** The inputs as numbers and the target as text labels (a second read of each file for the target). */
async function loadTextLabels(
  repo: RepoReader,
  descriptor: Descriptor,
  inputs: readonly string[],
  settings: SettingsFile,
): Promise<ClassifierTables> {
  const { data } = descriptor;
  const maxBytes = settings.caps.maxFileBytes;
  const read = async (path: string, parts: readonly string[] | undefined) => {
    const table = await readTable(repo, parts ?? path, { columns: [...inputs], maxBytes });
    const codes = await partsLabelCodes(repo, parts ?? [path], data.target, descriptor, maxBytes);
    if (codes.rows !== table.rows) throw new Error(`label rows ${codes.rows} differ from data rows ${table.rows} in ${table.file}`);
    return { table, codes };
  };
  const train = await read(data.train, data.trainParts);
  const holdout = await read(data.holdout, data.holdoutParts);
  const labels = chooseClasses(descriptor, train.codes.labels, 'text');
  const toY = (part: typeof train): Float64Array => {
    const y = new Float64Array(part.table.rows);
    const meaning = part.codes.labels.map((label) => (label === labels.positive ? 1 : label === labels.negative ? 0 : -1));
    for (let i = 0; i < y.length; i++) {
      const m = meaning[part.codes.codes[i]];
      if (m < 0)
        throw unknownLabel(descriptor, placeOfLine(part.table, part.table.lines[i]), part.codes.labels[part.codes.codes[i]], labels);
      y[i] = m;
    }
    return y;
  };
  const model = (part: typeof train) => ({
    inputs: inputs.map((c) => part.table.columns.get(c) as Float64Array),
    y: toY(part),
    lines: part.table.lines,
    rows: part.table.rows,
    file: part.table.file,
    ...(part.table.parts ? { parts: part.table.parts } : {}),
  });
  return { train: model(train), holdout: model(holdout), trainColumns: train.table.columns, labels };
}

/**
 * Picks the positive and negative class among the labels found in the training rows.
 * @throws InputError `target-classes` or `positive-label`
 */
function chooseClasses(descriptor: Descriptor, found: readonly string[], kind: ClassLabels['kind']): ClassLabels {
  const where = { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' };
  const list =
    found
      .slice(0, 6)
      .map((l) => quoteValue(l, 30))
      .join(', ') + (found.length > 6 ? ', …' : '');
  if (found.length !== 2) {
    const count = found.length >= MAX_LABELS ? `at least ${MAX_LABELS}` : String(found.length);
    throw new InputError(
      'target-classes',
      `a binary classifier needs exactly two classes in the target \`${descriptor.data.target}\`; the training rows hold ${count} (${list})`,
      where,
    );
  }
  const positive = descriptor.data.positive ?? null;
  if (positive !== null) {
    const at = found.indexOf(positive);
    if (at < 0) {
      throw new InputError(
        'positive-label',
        `\`data.positive\` is ${quoteValue(positive, 30)} but the training rows' classes are ${list}; expected one of them`,
        {
          ...where,
          key: 'data.positive',
        },
      );
    }
    return { positive, negative: found[1 - at], kind };
  }
  if (kind === 'numeric' && found.includes('0') && found.includes('1')) return { positive: '1', negative: '0', kind };
  const lower = found.map((l) => l.toLowerCase());
  if (lower.includes('true') && lower.includes('false')) {
    const at = lower.indexOf('true');
    return { positive: found[at], negative: found[1 - at], kind };
  }
  throw new InputError(
    'positive-label',
    `the target \`${descriptor.data.target}\` holds the classes ${list}; set \`data.positive\` to the one that is the positive class (0/1 and true/false need no setting)`,
    where,
  );
}

function unknownLabel(descriptor: Descriptor, place: LinePlace, label: string, labels: ClassLabels): InputError {
  return new InputError(
    'target-classes',
    `the target \`${descriptor.data.target}\` is ${quoteValue(label, 30)} on line ${place.line} of ${place.file}; the training rows' classes are ${quoteValue(labels.positive, 30)} and ${quoteValue(labels.negative, 30)}`,
    { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' },
  );
}

/** Distinct values of y[0..n), in order of first appearance (at most {@link MAX_LABELS}). */
function distinctNumbers(y: Float64Array, n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n && out.length < MAX_LABELS; i++) if (!out.includes(y[i])) out.push(y[i]);
  return out;
}

/**
 * Reads one column of a CSV file as text labels (trimmed), coded by first appearance. The same
 * CSV rules as the numeric reader (comma, `"` quotes, blank lines skipped), so rows line up.
 * @throws InputError `target-classes` when more than {@link MAX_LABELS} distinct labels appear
 */
async function partsLabelCodes(
  repo: RepoReader,
  paths: readonly string[],
  column: string,
  descriptor: Descriptor,
  maxBytes: number,
): Promise<{ labels: string[]; codes: Int32Array; rows: number }> {
  if (paths.length === 1) return readLabelCodes(repo, paths[0], column, descriptor, maxBytes);
  // Parts one after the other: each part's codes renumbered into the labels of all parts, by first appearance.
  const labels: string[] = [];
  const chunks: Int32Array[] = [];
  let rows = 0;
  for (const path of paths) {
    const part = await readLabelCodes(repo, path, column, descriptor, maxBytes);
    const map = part.labels.map((label) => {
      const k = labels.indexOf(label);
      if (k >= 0) return k;
      labels.push(label);
      return labels.length - 1;
    });
    if (labels.length > MAX_LABELS) {
      throw new InputError(
        'target-classes',
        `a binary classifier needs exactly two classes in the target \`${column}\`; its parts hold more than ${MAX_LABELS}`,
        { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' },
      );
    }
    chunks.push(Int32Array.from(part.codes, (c) => map[c]));
    rows += part.rows;
  }
  const codes = new Int32Array(rows);
  let at = 0;
  for (const chunk of chunks) {
    codes.set(chunk, at);
    at += chunk.length;
  }
  return { labels, codes, rows };
}

/**
 * One file's labels and codes (see {@link partsLabelCodes}); its bytes are read as the numeric
 * reader reads them (decompressed when `.gz`, held to the same byte cap).
 */
async function readLabelCodes(
  repo: RepoReader,
  path: string,
  column: string,
  descriptor: Descriptor,
  maxBytes: number,
): Promise<{ labels: string[]; codes: Int32Array; rows: number }> {
  const labels: string[] = [];
  const index = new Map<string, number>();
  let codes = new Int32Array(1024);
  let rows = 0;
  let field = -1;
  let tooMany = false;
  const parser = parse({
    bom: true,
    delimiter: ',',
    quote: '"',
    escape: '"',
    record_delimiter: ['\r\n', '\n'],
    trim: true,
    skip_empty_lines: true,
    relax_column_count: true,
  });
  const consume = (): void => {
    for (let record = parser.read() as string[] | null; record !== null; record = parser.read() as string[] | null) {
      if (field < 0) {
        field = record.indexOf(column);
        continue;
      }
      const label = record[field] ?? '';
      let code = index.get(label);
      if (code === undefined) {
        if (labels.length >= MAX_LABELS) {
          tooMany = true;
          continue;
        }
        code = labels.length;
        labels.push(label);
        index.set(label, code);
      }
      if (rows === codes.length) {
        const next = new Int32Array(codes.length * 2);
        next.set(codes);
        codes = next;
      }
      codes[rows++] = code;
    }
  };
  parser.on('readable', consume);
  const done = new Promise<void>((resolve, reject) => {
    parser.on('end', resolve);
    parser.on('error', reject);
  });
  for await (const piece of openDataFile(repo, path, maxBytes)) parser.write(Buffer.from(piece.buffer, piece.byteOffset, piece.byteLength));
  parser.end();
  await done;
  consume();
  if (tooMany) {
    throw new InputError(
      'target-classes',
      `a binary classifier needs exactly two classes in the target \`${column}\`; ${path} holds more than ${MAX_LABELS}`,
      {
        file: descriptor.file,
        line: descriptor.data.lines.target,
        key: 'data.target',
      },
    );
  }
  return { labels, codes: codes.subarray(0, rows), rows };
}
