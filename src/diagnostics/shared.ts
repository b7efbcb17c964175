/**
 * Diagnostics that several checks read, computed once per model through the check context's memo.
 */
import type { CheckContext } from '../checks/types.js';
import { complementFactors, crossValidate, foldFactors, type CrossValidation, type FoldFactors } from './cross-validation.js';
import { assignFolds, type Folds } from './folds.js';
import { findLeakage, type Leakage } from './leakage.js';
import { measureSwing, type Swing } from './swing.js';

/** Memo key of {@link sharedFolds} (the pipeline fills it from its own pass). */
export const SHARED_FOLDS_KEY = 'diagnostics/folds';
/** Memo key of {@link sharedCrossValidation} (the pipeline fills it from its own passes). */
export const SHARED_CROSS_VALIDATION_KEY = 'diagnostics/cross-validation';

/** Memo key of {@link sharedFoldFactors} (the pipeline fills it from its own pass). */
export const SHARED_FOLD_FACTORS_KEY = 'diagnostics/fold-factors';

/** The model's folds from its `fit` settings (k = fit.folds, order fit.foldOrder, seed fit.seed). */
export function sharedFolds(context: CheckContext): Folds {
  return context.shared(SHARED_FOLDS_KEY, () => {
    const { folds, foldOrder, seed } = context.descriptor.fit;
    return assignFolds(context.train.rows, folds, foldOrder, seed);
  });
}

/** QR factors of each fold's training rows and of each fold's complement (one pass when not memoised). */
export function sharedFoldFactors(context: CheckContext): FoldFactors {
  return context.shared(SHARED_FOLD_FACTORS_KEY, () => {
    const perFold = foldFactors(context.design, context.train, sharedFolds(context));
    return { perFold, complements: complementFactors(perFold) };
  });
}

/** k-fold, leave-one-out and GCV figures of the refit (see {@link crossValidate}). */
export function sharedCrossValidation(context: CheckContext): CrossValidation {
  return context.shared(SHARED_CROSS_VALIDATION_KEY, () => {
    const { perFold, complements } = sharedFoldFactors(context);
    return crossValidate(context.design, context.train, context.fit, sharedFolds(context), { factors: perFold, complements });
  });
}

/** Memo key of {@link sharedSwing}. */
export const SHARED_SWING_KEY = 'diagnostics/swing';
/** Memo key of {@link sharedLeakage}. */
export const SHARED_LEAKAGE_KEY = 'diagnostics/leakage';

/** Swing between and beyond samples of the refit (see {@link measureSwing}). */
export function sharedSwing(context: CheckContext): Swing {
  return context.shared(SHARED_SWING_KEY, () => measureSwing(context.design, context.train, context.fit.coefficients));
}

/** Hold-out rows that repeat a training row (see {@link findLeakage}). */
export function sharedLeakage(context: CheckContext): Leakage {
  return context.shared(SHARED_LEAKAGE_KEY, () => findLeakage(context.train, context.holdout));
}
