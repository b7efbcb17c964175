/**
 * A model's plan, made before any pass over its rows: read the columns it needs, fix the terms'
 * parameters from the training rows, check the design's size, the target and the estimated work
 * (cost.ts) against the caps, and assign the cross-validation folds.
 */
import type { Descriptor, SettingsFile } from '../config/types.js';
import { clip, InputError } from '../core/errors.js';
import { loadModelData, type LoadOptions, type ModelTables } from '../data/load-model-data.js';
import { memoryRowSource, type RowChunk, type RowSource } from '../data/row-source.js';
import { lineOfFile, type DataPart } from '../data/data-parts.js';
import { transformTables, type OriginalTarget } from '../data/target-transform.js';
import { createDesign, type Design } from '../design/design-matrix.js';
import { meanAndSd, range } from '../design/stats.js';
import { createTerm, termInputs } from '../design/terms/index.js';
import { checkTransformDomain } from '../design/terms/transform.js';
import { rowScaling, type RowScaling } from '../design/weighted-design.js';
import { assignFolds, streamedFolds, type Folds } from '../diagnostics/folds.js';
import { firstBeyond } from '../kernels/index.js';
import type { RepoReader } from '../repo/types.js';
import { checkDeadline } from '../core/deadline.js';
import { checkBudget, estimateCost, modelShape } from './cost.js';

/**
 * Largest number of design columns. The diagnostics take singular value decompositions of p x p
 * factors (several per model and fold when the design is rank deficient), whose cost grows with
 * p^3: at 200 columns each takes about 0.4 s here, so a pull request cannot make a run take hours.
 */
export const MAX_PARAMETERS = 200;

/**
 * Largest magnitude of a design value or target: sums of squares of up to 1e9 rows must stay
 * finite in double precision (1e140^2 * 1e9 = 1e289 < 1.8e308).
 */
export const MAX_MAGNITUDE = 1e140;

/** What the passes over a model's rows work from. */
export interface ModelPlan {
  descriptor: Descriptor;
  tables: ModelTables;
  /** The design with every term's parameters fixed from the training rows. */
  design: Design;
  /** Cross-validation folds of the training rows (from the descriptor's `fit` settings). */
  folds: Folds;
  /** Population standard deviation of the training target (> 0). */
  targetSd: number;
  /** sqrt(w) and sqrt(w) y of the training rows for a weighted fit; null (or absent) when unweighted. */
  scaling?: RowScaling | null;
  /** With `data.target_transform`: the targets as written (the tables hold t = g(y)); null (or absent) otherwise. */
  originalTargets?: { train: OriginalTarget; holdout: OriginalTarget } | null;
  /**
   * Every training row, for the passes: the columns of `tables.train` (one chunk), or the file
   * streamed again on each pass when `tables.streamed` (then `tables.train` is a sample).
   */
  source: RowSource;
  /** Training rows (all of them, also when `tables.train` is a sample). */
  rows: number;
  /** Smallest and largest training target. */
  targetRange: [number, number];
  /** Rows per chunk of a streamed pass (tests); default a whole number of design blocks near 65536. */
  chunkRows?: number;
}

/** Options of a run's scale (tests force the streamed path with a low threshold). */
export type ScaleOptions = Pick<LoadOptions, 'streamAboveBytes' | 'chunkRows' | 'sampleRows'>;

/**
 * Plans one model.
 * @param load how the columns are read: default {@link loadModelData}; classifiers read their target as two classes
 * @throws InputError for bad data, a design over the caps, a target out of range or constant
 *   or work estimated over `caps.max_operations` (`over-budget`)
 */
export async function planModel(
  repo: RepoReader,
  descriptor: Descriptor,
  settings: SettingsFile,
  load: typeof loadModelData = loadModelData,
  scale: ScaleOptions = {},
): Promise<ModelPlan> {
  const inputs: string[] = [];
  for (const t of descriptor.terms) for (const c of termInputs(t)) if (!inputs.includes(c)) inputs.push(c);
  const file = descriptor.file;
  // A streamed training file meets the checks of every row chunk by chunk in its sampling read.
  const everyRow = (data: RowChunk): void => {
    checkDeadline('reading of the data');
    for (const spec of descriptor.terms) checkTransformDomain(spec, termInputs(spec), data, inputs);
    checkTargetRange(descriptor, data);
  };
  let tables = await load(repo, descriptor, inputs, settings, { ...scale, onTrainChunk: everyRow });
  checkDeadline('reading of the data');
  const { train } = tables;
  const streamed = tables.streamed ?? null;
  const rows = streamed === null ? train.rows : streamed.rows;

  // A transformed input outside its transform's domain is an error naming file, line, column, value.
  for (const spec of descriptor.terms)
    for (const data of streamed === null ? [train, tables.holdout] : [tables.holdout])
      checkTransformDomain(spec, termInputs(spec), data, inputs);
  // Fix term parameters from the training rows, then check the size before taking memory.
  const terms = descriptor.terms.map((spec) => createTerm(spec, tables.trainColumns, file, tables.levels, tables.streamed?.inputStats));
  const design = createDesign(terms, descriptor.fit.intercept);
  const p = design.p;
  if (p > MAX_PARAMETERS) {
    throw new InputError(
      'too-many-parameters',
      `the terms build ${p} design columns; at most ${MAX_PARAMETERS} are supported (the diagnostics decompose p x p factors, at a cost that grows with p^3); use fewer radial centres or a lower degree`,
      { file, line: descriptor.termsLine, key: 'terms' },
    );
  }
  // caps.max_cells guards the memory of columns held whole; a streamed model holds none (its
  // work is still held to caps.max_operations below).
  if (streamed === null && rows * p > settings.caps.maxCells) {
    throw new InputError(
      'too-large',
      `${rows} training rows x ${p} parameters = ${rows * p} cells is over the cap of ${settings.caps.maxCells}; raise caps.max_cells in the settings file to allow it`,
      { file, line: descriptor.termsLine, key: 'terms' },
    );
  }
  for (const data of streamed === null ? [train, tables.holdout] : [tables.holdout]) checkTargetRange(descriptor, data);
  // `data.target_transform`: the fit and every figure of the passes work on t = g(y) (a streamed
  // training file is refused with a transform: data/load-model-data.ts).
  const transform = descriptor.data.targetTransform ?? null;
  let originalTargets: ModelPlan['originalTargets'] = null;
  if (transform !== null && streamed === null) {
    const transformed = transformTables(tables, transform.kind, descriptor.data.target);
    tables = transformed.tables;
    originalTargets = transformed.original;
  }
  const targetStats =
    streamed === null ? meanAndSd(tables.train.y, tables.train.rows) : { mean: streamed.targetMean, sd: streamed.targetSd };
  if (!(targetStats.sd > 0)) {
    throw new InputError(
      'constant-target',
      `the target \`${clip(descriptor.data.target)}\` is constant (${train.y[0]}) in every training row; there is nothing to model`,
      { file, line: descriptor.data.lines.target, key: 'data.target' },
    );
  }
  // The whole model's work, estimated from its shape before the first pass over the rows.
  checkBudget(
    descriptor,
    estimateCost(modelShape(descriptor, design, rows, tables.holdout.rows, streamed === null ? undefined : train.rows)),
    settings,
  );
  const { folds: k, foldOrder, seed } = descriptor.fit;
  if (streamed !== null) {
    return {
      descriptor,
      tables,
      design,
      folds: streamedFolds(rows, k, foldOrder, seed),
      targetSd: targetStats.sd,
      scaling: null,
      source: streamed.source,
      rows,
      targetRange: [streamed.targetMin, streamed.targetMax],
      ...(scale.chunkRows ? { chunkRows: scale.chunkRows } : {}),
    };
  }
  const folds = assignFolds(rows, k, foldOrder, seed);
  return {
    descriptor,
    tables,
    design,
    folds,
    targetSd: targetStats.sd,
    scaling: rowScaling(tables.train),
    originalTargets,
    source: memoryRowSource(tables.train),
    rows,
    targetRange: range(tables.train.y, tables.train.rows),
  };
}

/** InputError `target-range` when a target is not within ±{@link MAX_MAGNITUDE}. */
function checkTargetRange(
  descriptor: Descriptor,
  data: Pick<RowChunk, 'y' | 'rows' | 'lines' | 'file'> & { parts?: readonly DataPart[] },
): void {
  const i = firstBeyond(data.y, data.rows, MAX_MAGNITUDE);
  if (i < 0) return;
  throw new InputError(
    'target-range',
    `the target \`${clip(descriptor.data.target)}\` is ${data.y[i]} on ${lineOfFile(data, data.lines[i])}; expected values within ±${MAX_MAGNITUDE} (sums of squares must stay finite): rescale the target`,
    { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' },
  );
}
