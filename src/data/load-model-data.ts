/**
 * Loads the columns one model needs from its training and hold-out files.
 */
import type { Descriptor, SettingsFile, Weighting } from '../config/types.js';
import { InputError, clip, quoteValue } from '../core/errors.js';
import type { ModelData } from './model-data.js';
import { readTable, type Table } from './table.js';
import { partsLabel, placeOfLine, type DataPart } from './data-parts.js';
import { levelCodes, trainingLevels } from './levels.js';
import type { Separator } from './csv-format.js';
import { isMissingCell } from './csv-rules.js';
import type { RepoReader } from '../repo/types.js';
import {
  fileRowSource,
  RowReservoir,
  SAMPLE_ROWS,
  streamsTrainingData,
  trainingFileSizes,
  type RowChunk,
  type RowSource,
} from './row-source.js';

/** Training and hold-out columns of one model. */
export interface ModelTables {
  train: ModelData;
  holdout: ModelData;
  /** Training input columns by name (for fixing term parameters). */
  trainColumns: Map<string, Float64Array>;
  /** Training levels (text order) of each category column; the columns hold their codes. */
  levels?: Map<string, string[]>;
  /** With {@link LoadOptions.targetAsText}: the target's cells as text (trimmed), row by row. */
  targetText?: { train: string[]; holdout: string[] };
  /**
   * Present when the training file (or its parts together) streams (row-source.ts): `train` then
   * holds a seeded sample of at most {@link SAMPLE_ROWS} rows (every row when the file has no
   * more; read from parts, with the `parts` list and table-wide lines), `trainColumns` its
   * columns, and this the source of every row with the figures of the whole file's target.
   */
  streamed?: StreamedTraining;
}

/** The training rows of a streamed model: their source and what the sampling read measured. */
export interface StreamedTraining {
  source: RowSource;
  /** Rows in the training file (all parts together). */
  rows: number;
  /** Mean and population standard deviation of the target over every row (Chan et al.'s merge of chunk figures). */
  targetMean: number;
  targetSd: number;
  /** Smallest and largest target. */
  targetMin: number;
  targetMax: number;
  /** Mean and population standard deviation of each input over every row (the same merge), by name. */
  inputStats: Map<string, { mean: number; sd: number }>;
}

/** How the loader treats a large training file. */
export interface LoadOptions {
  /** Stream the training file when its estimated CSV text is above this (row-source.ts; default STREAM_ABOVE_BYTES). */
  streamAboveBytes?: number;
  /** Rows per chunk of the streamed passes (default 65536). */
  chunkRows?: number;
  /** Sample size of a streamed model (default {@link SAMPLE_ROWS}). */
  sampleRows?: number;
  /**
   * Read the target as text (a classifier's class labels), with the same separator, split column
   * and dropped rows as the numbers; the tables then carry it as `targetText` and `y` is left 0.
   * Under `data.missing: drop` a row whose label (or category level) is a missing cell is dropped and counted.
   */
  targetAsText?: boolean;
  /** Sees every chunk of a streamed training file during the sampling read (checks that need every row). */
  onTrainChunk?: (chunk: RowChunk) => void;
}

/** The category columns of a descriptor with the first category term that reads each. */
function categoryColumns(descriptor: Descriptor): Map<string, { line: number; unseen: 'error' | 'zero' }> {
  const out = new Map<string, { line: number; unseen: 'error' | 'zero' }>();
  for (const t of descriptor.terms) if (t.kind === 'category' && !out.has(t.of)) out.set(t.of, { line: t.line, unseen: t.unseen });
  return out;
}

/**
 * Reads the input columns (in `inputs` order) and the target of both files.
 * @throws InputError `target-as-input` when a term reads the target column,
 *   `no-rows` when either file has no data rows
 */
export async function loadModelData(
  repo: RepoReader,
  descriptor: Descriptor,
  inputs: readonly string[],
  settings: SettingsFile,
  options: LoadOptions = {},
): Promise<ModelTables> {
  const { data } = descriptor;
  if (inputs.includes(data.target)) {
    throw new InputError(
      'target-as-input',
      `the target column \`${clip(data.target)}\` is also used as an input by a term; a model may not read its own target`,
      { file: descriptor.file, line: data.lines.target, key: 'data.target' },
    );
  }
  const weighting = data.weighting ?? null;
  if (weighting !== null && weighting.column === data.target) {
    throw new InputError(
      'weight-is-target',
      `\`data.${weighting.kind}\` names the target column \`${data.target}\`; expected a column of its own`,
      {
        file: descriptor.file,
        line: weighting.line,
        key: `data.${weighting.kind}`,
      },
    );
  }
  // Category inputs are text: read apart (text-columns.ts) and coded (levels.ts), never as numbers.
  const categories = categoryColumns(descriptor);
  const numeric = inputs.filter((c) => !categories.has(c));
  const textTarget = options.targetAsText === true;
  const columns = [
    ...numeric,
    ...(textTarget ? [] : [data.target]),
    ...(weighting !== null && !inputs.includes(weighting.column) ? [weighting.column] : []),
  ];
  const levels = new Map<string, string[]>();
  const maxBytes = settings.caps.maxFileBytes;
  const format = data.format;
  const split = data.split ?? null;
  const load = async (
    path: string,
    partPaths: readonly string[] | undefined,
    line: number,
    key: string,
  ): Promise<ModelData & { byName: Map<string, Float64Array>; targetText?: string[] }> => {
    let table: Awaited<ReturnType<typeof readTable>>;
    // With a split column both sides read the one file, each keeping its own label's rows.
    const side =
      split === null
        ? undefined
        : key === 'data.train'
          ? { column: split.column, keep: split.train, other: split.holdout }
          : { column: split.column, keep: split.holdout, other: split.train };
    try {
      table = await readTable(repo, partPaths ?? path, {
        columns,
        maxBytes,
        ...(format ? { format } : {}),
        ...(side ? { split: side } : {}),
      });
    } catch (error) {
      throw withAsker(error, descriptor);
    }
    // Text columns (category inputs, a target of class labels) of the rows the numeric read kept.
    const textNames = [...categories.keys(), ...(textTarget ? [data.target] : [])];
    let text: Map<string, string[]> | null = null;
    if (textNames.length > 0 && table.rows > 0) {
      try {
        text = await readCategoryText(repo, table, textNames, maxBytes, format?.separator ?? 'auto');
      } catch (error) {
        throw withAsker(error, descriptor);
      }
      // Under `missing: drop` a missing cell in a text column drops its row, as in a numeric one.
      if (format?.missing === 'drop') table = dropMissingText(table, text);
    }
    if (table.rows === 0) {
      const why = side
        ? ` labelled ${quoteValue(side.keep)} in column ${quoteValue(side.column)}`
        : table.dropped > 0
          ? ` left after dropping ${table.dropped} with missing cells`
          : '';
      const named = partPaths === undefined ? `\`${clip(path)}\`` : `the ${partPaths.length} parts of \`${key}\` (${clip(table.file)})`;
      throw new InputError(
        'no-rows',
        `${named} ${partPaths === undefined ? 'has' : 'have'} no data rows${why}; expected at least one row`,
        {
          file: descriptor.file,
          line,
          key,
        },
      );
    }
    if (text !== null) {
      for (const [name, term] of categories) {
        const values = text.get(name) as string[];
        if (!levels.has(name)) levels.set(name, trainingLevels(values));
        const where = {
          file: table.file,
          ...(table.parts ? { parts: table.parts } : {}),
          lines: table.lines,
          column: name,
          termLine: term.line,
          descriptor: descriptor.file,
        };
        table.columns.set(name, levelCodes(values, levels.get(name) as string[], term.unseen, where));
      }
    }
    const rows = {
      inputs: inputs.map((c) => table.columns.get(c) as Float64Array),
      y: textTarget ? new Float64Array(table.rows) : (table.columns.get(data.target) as Float64Array),
      lines: table.lines,
      rows: table.rows,
      file: table.file,
      ...(table.parts ? { parts: table.parts } : {}),
      ...(format?.missing === 'drop' ? { dropped: table.dropped } : {}),
      byName: table.columns,
      ...(text !== null && textTarget ? { targetText: text.get(data.target) as string[] } : {}),
    };
    return weighting === null
      ? rows
      : {
          ...rows,
          ...rowWeights(weighting, table.columns.get(weighting.column) as Float64Array, rows.lines, rows.rows, rows.file, rows.parts),
        };
  };
  // Training data streams when its files together (one, or the parts) are estimated too large to hold.
  const trainParts = data.trainParts;
  if (streamsTrainingData(await trainingFileSizes(repo, data.train, trainParts), options.streamAboveBytes)) {
    const trainLabel = trainParts === undefined ? data.train : partsLabel(trainParts);
    const why =
      categories.size > 0
        ? 'a category term'
        : textTarget
          ? 'a target of text class labels'
          : weighting !== null
            ? `\`data.${weighting.kind}\``
            : (data.targetTransform ?? null) !== null
              ? '`data.target_transform`'
              : null;
    if (why !== null) {
      throw new InputError(
        'too-large-to-hold',
        `${trainParts === undefined ? 'the training file' : `the ${trainParts.length} training parts`} ${clip(trainLabel)} ${trainParts === undefined ? 'is' : 'are'} too large to hold in memory and ${trainParts === undefined ? 'is' : 'are'} read as a stream, which a model with ${why} does not support yet; expected ${trainParts === undefined ? 'a smaller file' : 'smaller parts'}, or a model without it`,
        { file: descriptor.file, line: data.lines.train, key: 'data.train' },
      );
    }
    const split = data.split ?? null;
    const counts = { dropped: 0 };
    const source = fileRowSource(repo, trainParts ?? data.train, {
      inputs,
      target: data.target,
      maxBytes,
      ...(options.chunkRows ? { chunkRows: options.chunkRows } : {}),
      ...(format ? { format } : {}),
      ...(split ? { split: { column: split.column, keep: split.train, other: split.holdout } } : {}),
      counts,
    });
    const reservoir = new RowReservoir(inputs.length, options.sampleRows ?? SAMPLE_ROWS, descriptor.fit.seed);
    const target = { n: 0, mean: 0, m2: 0, min: Infinity, max: -Infinity };
    const inputFigures = inputs.map(() => ({ n: 0, mean: 0, m2: 0, min: Infinity, max: -Infinity }));
    // Read from parts: the parts with their line offsets, complete once the read has reached the last.
    let parts: DataPart[] | undefined;
    try {
      await source.forEachChunk((chunk) => {
        parts = chunk.parts;
        options.onTrainChunk?.(chunk);
        reservoir.add(chunk);
        addTargetFigures(target, chunk.y, chunk.rows);
        for (let c = 0; c < inputs.length; c++) addTargetFigures(inputFigures[c], chunk.inputs[c], chunk.rows);
      });
    } catch (error) {
      throw withAsker(error, descriptor);
    }
    if (reservoir.seen === 0) {
      // The words of the in-memory path (`load` above), which also names the parts and why none are left.
      const why = split
        ? ` labelled ${quoteValue(split.train)} in column ${quoteValue(split.column)}`
        : counts.dropped > 0
          ? ` left after dropping ${counts.dropped} with missing cells`
          : '';
      const named =
        trainParts === undefined
          ? `\`${clip(data.train)}\` has`
          : `the ${trainParts.length} parts of \`data.train\` (${clip(trainLabel)}) have`;
      throw new InputError('no-rows', `${named} no data rows${why}; expected at least one row`, {
        file: descriptor.file,
        line: data.lines.train,
        key: 'data.train',
      });
    }
    const sample: ModelData = {
      ...reservoir.rows(trainLabel),
      ...(parts !== undefined ? { parts } : {}),
      sampleOf: reservoir.seen,
      ...(format?.missing === 'drop' ? { dropped: counts.dropped } : {}),
    };
    const holdout = await load(data.holdout, data.holdoutParts, data.lines.holdout, 'data.holdout');
    const { byName: _unused, targetText: _text, ...holdoutData } = holdout;
    const trainColumns = new Map<string, Float64Array>(inputs.map((name, c) => [name, sample.inputs[c]]));
    return {
      train: sample,
      holdout: holdoutData,
      trainColumns,
      levels,
      streamed: {
        source,
        rows: reservoir.seen,
        targetMean: target.mean,
        targetSd: Math.sqrt(target.m2 / target.n),
        targetMin: target.min,
        targetMax: target.max,
        inputStats: new Map(
          inputs.map((name, c) => [name, { mean: inputFigures[c].mean, sd: Math.sqrt(inputFigures[c].m2 / inputFigures[c].n) }]),
        ),
      },
    };
  }
  const train = await load(data.train, data.trainParts, data.lines.train, 'data.train');
  const holdout = await load(data.holdout, data.holdoutParts, data.lines.holdout, 'data.holdout');
  const { byName, targetText: trainText, ...trainData } = train;
  if (trainData.weights !== undefined && !trainData.weights.some((w) => w > 0)) {
    throw new InputError('bad-weight', `every training row of ${trainData.file} has weight 0; expected at least one positive weight`, {
      file: descriptor.file,
      line: data.weighting?.line,
      key: `data.${data.weighting?.kind}`,
    });
  }
  const { byName: _unused, targetText: holdoutText, ...holdoutData } = holdout;
  return {
    train: trainData,
    holdout: holdoutData,
    trainColumns: byName,
    levels,
    ...(textTarget ? { targetText: { train: trainText ?? [], holdout: holdoutText ?? [] } } : {}),
  };
}

/**
 * Adds a chunk's values of one column (the target, or an input) to running figures: mean and sum of squared deviations merged by the
 * pairwise formula of Chan, Golub & LeVeque ("Algorithms for computing the sample variance",
 * The American Statistician 37(3), 1983, eq. 2.1), the chunk's own from two passes.
 */
function addTargetFigures(t: { n: number; mean: number; m2: number; min: number; max: number }, y: Float64Array, m: number): void {
  if (m === 0) return;
  let sum = 0;
  for (let i = 0; i < m; i++) sum += y[i];
  const mean = sum / m;
  let m2 = 0;
  for (let i = 0; i < m; i++) m2 += (y[i] - mean) * (y[i] - mean);
  const n = t.n + m;
  const delta = mean - t.mean;
  t.mean = t.n === 0 ? mean : t.mean + (delta * m) / n;
  t.m2 = t.n === 0 ? m2 : t.m2 + m2 + (delta * delta * t.n * m) / n;
  t.n = n;
  for (let i = 0; i < m; i++) {
    if (y[i] < t.min) t.min = y[i];
    if (y[i] > t.max) t.max = y[i];
  }
}

/**
 * The row weights of a `data.weight` or `data.sigma` column: w as written (finite, >= 0), or
 * w = 1 / sigma^2 with sigma finite and > 0.
 * @param parts the parts the rows were read from (lines table-wide), absent for one file
 * @throws InputError `bad-weight` naming the file (the part), line, column and value of the first bad row
 */
export function rowWeights(
  weighting: Weighting,
  values: Float64Array,
  lines: Int32Array,
  rows: number,
  file: string,
  parts?: DataPart[],
): { weights: Float64Array; sigma?: Float64Array } {
  const weights = new Float64Array(rows);
  const sigma = weighting.kind === 'sigma';
  for (let i = 0; i < rows; i++) {
    const v = values[i];
    const ok = sigma ? Number.isFinite(v) && v > 0 : Number.isFinite(v) && v >= 0;
    if (!ok) {
      const place = placeOfLine({ file, parts }, lines[i]);
      throw new InputError(
        'bad-weight',
        `column \`${weighting.column}\` (\`data.${weighting.kind}\`) is ${v} on line ${place.line} of ${place.file}; expected ${sigma ? 'a finite standard uncertainty above 0' : 'a finite weight of 0 or more'}`,
        { file: place.file, line: place.line, key: weighting.column },
      );
    }
    weights[i] = sigma ? 1 / (v * v) : v;
  }
  return sigma ? { weights, sigma: values.subarray(0, rows) } : { weights };
}

/**
 * The text of the category columns of a table, file by file (each part apart, its lines made
 * table-wide as the numeric read made them): the text of each row the numeric read kept, found by
 * its line (rows the numeric read left out, dropped for a missing cell or of the other side of a
 * split column, are skipped), read with the table's separator.
 * @throws InputError `csv-rows` when a row of numbers has no record of text on its line
 */
async function readCategoryText(
  repo: RepoReader,
  table: Table,
  names: readonly string[],
  maxBytes: number,
  separator: Separator | 'auto',
): Promise<Map<string, string[]>> {
  const files = table.parts ?? [{ file: table.file, lineOffset: 0 }];
  const out = new Map<string, string[]>(names.map((n) => [n, []]));
  let row = 0;
  let left = maxBytes;
  // csv-parse comes with the text columns: loaded only when a model has text columns.
  const { readTextColumns } = await import('./text-columns.js');
  const rowsError = (file: string, texts: number) => {
    // One file: the message as it always was; a part: its own count (the numbers' rows are the whole table's).
    const numbers = table.parts === undefined ? `${table.rows} rows of numbers` : 'other rows of numbers';
    return new InputError(
      'csv-rows',
      `${table.parts === undefined ? file : clip(file)} gives ${texts} rows of text for its category columns but ${numbers}; expected one record per line (no line breaks inside quoted category cells)`,
      { file },
    );
  };
  for (const part of files) {
    const text = await readTextColumns(repo, part.file, names, Math.min(left, maxBytes), separator);
    left -= await repo.size(part.file);
    const n = text.lines.length;
    // Both line lists ascend: each row of numbers takes the record of text on its own line.
    const taken: number[] = [];
    for (let i = 0; i < n && row < table.rows; i++) {
      const line = text.lines[i] + part.lineOffset;
      if (table.lines[row] < line) throw rowsError(part.file, n);
      if (table.lines[row] === line) {
        taken.push(i);
        row++;
      }
    }
    for (const name of names) {
      const values = out.get(name) as string[];
      const cells = text.columns.get(name) as string[];
      for (const i of taken) values.push(cells[i]);
    }
  }
  if (row !== table.rows) {
    throw new InputError(
      'csv-rows',
      `${table.parts === undefined ? table.file : clip(table.file)} gives ${row} rows of text for its category columns but ${table.rows} rows of numbers; expected one record per line (no line breaks inside quoted category cells)`,
      { file: table.parts?.[0]?.file ?? table.file },
    );
  }
  return out;
}

/**
 * The table without the rows with a missing cell in a text column (`data.missing: drop`), counted
 * with the rows the numeric read dropped; `text` loses the same rows.
 */
function dropMissingText(table: Table, text: Map<string, string[]>): Table {
  const cellsOf = [...text.values()];
  const keep: number[] = [];
  for (let i = 0; i < table.rows; i++) if (!cellsOf.some((cells) => isMissingCell(cells[i]))) keep.push(i);
  if (keep.length === table.rows) return table;
  for (const [name, values] of text)
    text.set(
      name,
      keep.map((i) => values[i]),
    );
  const columns = new Map<string, Float64Array>();
  for (const [name, values] of table.columns)
    columns.set(
      name,
      Float64Array.from(keep, (i) => values[i]),
    );
  return {
    ...table,
    rows: keep.length,
    columns,
    lines: Int32Array.from(keep, (i) => table.lines[i]),
    dropped: table.dropped + table.rows - keep.length,
  };
}

/**
 * A missing column names the descriptor line that asked for it: `data.target`, or the first term
 * that reads the column. Other errors pass unchanged.
 */
function withAsker(error: unknown, descriptor: Descriptor): unknown {
  if (!(error instanceof InputError) || error.code !== 'csv-missing-column' || error.location.key === undefined) return error;
  const column = error.location.key;
  if (descriptor.data.weighting?.column === column) {
    const w = descriptor.data.weighting;
    return new InputError(
      error.code,
      `${error.message} (asked for by \`data.${w.kind}\` on line ${w.line} of ${descriptor.file})`,
      error.location,
    );
  }
  const term = descriptor.terms.find((t) =>
    t.kind === 'linear' ? t.columns.includes(column) : Array.isArray(t.of) ? t.of.includes(column) : t.of === column,
  );
  const asker =
    column === descriptor.data.target
      ? `\`data.target\` on line ${descriptor.data.lines.target}`
      : term
        ? `the ${term.kind} term on line ${term.line}`
        : null;
  if (asker === null) return error;
  return new InputError(error.code, `${error.message} (asked for by ${asker} of ${clip(descriptor.file)})`, error.location);
}
