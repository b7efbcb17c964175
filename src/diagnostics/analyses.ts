/**
 * The diagnostics that several checks read, each computed at most once per model: folds, the fold
 * factors, cross-validation, swing and leakage. The run hands in what its own passes over the
 * rows already produced (folds, fold factors, cross-validation); the rest is computed on first use.
 */
import type { FitSpec } from '../config/types.js';
import type { ModelData } from '../data/model-data.js';
import type { Design } from '../design/design-matrix.js';
import type { FitResult } from '../fit/index.js';
import { complementFactors, crossValidate, foldFactors, type CrossValidation, type FoldFactors } from './cross-validation.js';
import { assignFolds, type Folds } from './folds.js';
import { findLeakage, type Leakage } from './leakage.js';
import { measureSwing, type InsideCurve, type Swing, type SwingOptions } from './swing.js';
import type { TargetTransformKind } from '../data/target-transform.js';

/** What the analyses are computed from. */
export interface AnalysisInputs {
  design: Design;
  fit: FitResult;
  train: ModelData;
  holdout: ModelData;
  /** The descriptor's fold settings (k = folds, order, seed). */
  folds: Pick<FitSpec, 'folds' | 'foldOrder' | 'seed'>;
  /** A target transform whose limits judge the original scale: swing back-transforms (see {@link SwingOptions.backTransform}); default none. */
  backTransform?: TargetTransformKind;
}

/** Results already computed by the run's passes (each optional). */
export interface KnownAnalyses {
  folds?: Folds;
  foldFactors?: FoldFactors;
  crossValidation?: CrossValidation | null;
  /** Leakage found over every training row (a streamed model's scoring pass). */
  leakage?: Leakage;
}

/** One model's shared diagnostics, each computed on first use and kept. */
export class ModelAnalyses {
  readonly #inputs: AnalysisInputs;
  #folds: Folds | undefined;
  #foldFactors: FoldFactors | undefined;
  #crossValidation: CrossValidation | undefined;
  #swing: Swing | undefined;
  readonly #insideCurves: InsideCurve[] = [];
  #leakage: Leakage | undefined;
  readonly #swingOptions: SwingOptions;

  /**
   * @param inputs the model's design, fit and rows
   * @param known results of the run's own passes; default none
   * @param swingOptions options of the swing scan (e.g. `curveShare`); default none (every default)
   */
  constructor(inputs: AnalysisInputs, known: KnownAnalyses = {}, swingOptions: SwingOptions = {}) {
    this.#inputs = inputs;
    this.#swingOptions = swingOptions;
    this.#folds = known.folds;
    this.#foldFactors = known.foldFactors;
    this.#crossValidation = known.crossValidation ?? undefined;
    this.#leakage = known.leakage;
  }

  /** The training rows' cross-validation folds (see {@link assignFolds}). */
  folds(): Folds {
    if (this.#folds === undefined) {
      const { folds, foldOrder, seed } = this.#inputs.folds;
      this.#folds = assignFolds(this.#inputs.train.rows, folds, foldOrder, seed);
    }
    return this.#folds;
  }

  /** QR factors of each fold's training rows and of each fold's complement (one pass when not known). */
  foldFactors(): FoldFactors {
    if (this.#foldFactors === undefined) {
      const perFold = foldFactors(this.#inputs.design, this.#inputs.train, this.folds());
      this.#foldFactors = { perFold, complements: complementFactors(perFold) };
    }
    return this.#foldFactors;
  }

  /** k-fold, leave-one-out and GCV figures of the refit (see {@link crossValidate}). */
  crossValidation(): CrossValidation {
    if (this.#crossValidation === undefined) {
      const { perFold, complements } = this.foldFactors();
      const { design, train, fit } = this.#inputs;
      this.#crossValidation = crossValidate(design, train, fit, this.folds(), { factors: perFold, complements });
    }
    return this.#crossValidation;
  }

  /** Swing between and beyond the samples of the refit (see {@link measureSwing}). */
  swing(): Swing {
    const back = this.#inputs.backTransform;
    this.#swing ??= measureSwing(
      this.#inputs.design,
      this.#inputs.train,
      this.#inputs.fit.coefficients,
      back ? { ...this.#swingOptions, backTransform: back } : this.#swingOptions,
      this.#insideCurves,
    );
    return this.#swing;
  }

  /**
   * The predictions the swing scan made along inputs at the points the spike figure scans (see
   * swing.ts {@link InsideCurve}); empty until {@link ModelAnalyses.swing} has run (this does not
   * run it).
   */
  swingInsideCurves(): readonly InsideCurve[] {
    return this.#insideCurves;
  }

  /** Hold-out rows that repeat a training row (see {@link findLeakage}). */
  leakage(): Leakage {
    this.#leakage ??= findLeakage(this.#inputs.train, this.#inputs.holdout);
    return this.#leakage;
  }
}
