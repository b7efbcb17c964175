/**
 * A model's plan, made before any pass over its rows: read the columns it needs, fix the terms'
 * parameters from the training rows, check the design's size, the target and the estimated work
 * (cost.ts) against the caps, and assign the cross-validation folds.
 */
import type { Descriptor, SettingsFile } from '../config/types.js';
import { clip, InputError } from '../core/errors.js';
import { loadModelData, type ModelTables } from '../data/load-model-data.js';
import { lineOfFile } from '../data/data-parts.js';
import { transformTables, type OriginalTarget } from '../data/target-transform.js';
import { createDesign, type Design } from '../design/design-matrix.js';
import { meanAndSd } from '../design/stats.js';
import { createTerm, termInputs } from '../design/terms/index.js';
import { checkTransformDomain } from '../design/terms/transform.js';
import { rowScaling, type RowScaling } from '../design/weighted-design.js';
import { assignFolds, type Folds } from '../diagnostics/folds.js';
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
}

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
): Promise<ModelPlan> {
  const inputs: string[] = [];
  for (const t of descriptor.terms) for (const c of termInputs(t)) if (!inputs.includes(c)) inputs.push(c);
  let tables = await load(repo, descriptor, inputs, settings);
  checkDeadline('reading of the data');
  const { train } = tables;
  const file = descriptor.file;

  // A transformed input outside its transform's domain is an error naming file, line, column, value.
  for (const spec of descriptor.terms)
    for (const data of [train, tables.holdout]) checkTransformDomain(spec, termInputs(spec), data, inputs);
  // Fix term parameters from the training rows, then check the size before taking memory.
  const terms = descriptor.terms.map((spec) => createTerm(spec, tables.trainColumns, file, tables.levels));
  const design = createDesign(terms, descriptor.fit.intercept);
  const p = design.p;
  if (p > MAX_PARAMETERS) {
    throw new InputError(
      'too-many-parameters',
      `the terms build ${p} design columns; at most ${MAX_PARAMETERS} are supported (the diagnostics decompose p x p factors, at a cost that grows with p^3); use fewer radial centres or a lower degree`,
      { file, line: descriptor.termsLine, key: 'terms' },
    );
  }
  if (train.rows * p > settings.caps.maxCells) {
    throw new InputError(
      'too-large',
      `${train.rows} training rows x ${p} parameters = ${train.rows * p} cells is over the cap of ${settings.caps.maxCells}; raise caps.max_cells in the settings file to allow it`,
      { file, line: descriptor.termsLine, key: 'terms' },
    );
  }
  for (const data of [train, tables.holdout]) {
    const i = firstBeyond(data.y, data.rows, MAX_MAGNITUDE);
    if (i >= 0) {
      throw new InputError(
        'target-range',
        `the target \`${clip(descriptor.data.target)}\` is ${data.y[i]} on ${lineOfFile(data, data.lines[i])}; expected values within ±${MAX_MAGNITUDE} (sums of squares must stay finite): rescale the target`,
        { file, line: descriptor.data.lines.target, key: 'data.target' },
      );
    }
  }
  // `data.target_transform`: the fit and every figure of the passes work on t = g(y).
  const transform = descriptor.data.targetTransform ?? null;
  let originalTargets: ModelPlan['originalTargets'] = null;
  if (transform !== null) {
    const transformed = transformTables(tables, transform.kind, descriptor.data.target);
    tables = transformed.tables;
    originalTargets = transformed.original;
  }
  const targetStats = meanAndSd(tables.train.y, tables.train.rows);
  if (!(targetStats.sd > 0)) {
    throw new InputError(
      'constant-target',
      `the target \`${clip(descriptor.data.target)}\` is constant (${train.y[0]}) in every training row; there is nothing to model`,
      { file, line: descriptor.data.lines.target, key: 'data.target' },
    );
  }
  // The whole model's work, estimated from its shape before the first pass over the rows.
  checkBudget(descriptor, estimateCost(modelShape(descriptor, design, train.rows, tables.holdout.rows)), settings);
  const folds = assignFolds(train.rows, descriptor.fit.folds, descriptor.fit.foldOrder, descriptor.fit.seed);
  return { descriptor, tables, design, folds, targetSd: targetStats.sd, scaling: rowScaling(tables.train), originalTargets };
}
