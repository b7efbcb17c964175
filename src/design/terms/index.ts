/**
 * The factory that turns a descriptor's term entry into a {@link Term}, keyed by its kind.
 * To add a term kind: write `basis/<kind>.ts` exporting a builder, add it to the schema,
 * to {@link createTerm} and to the README's "Terms" section.
 */
import type { TermSpec } from '../../config/types.js';
import { fourierTerm } from './fourier.js';
import { linearTerm } from './linear.js';
import { multiPolynomialTerm } from './multi-polynomial.js';
import { multiRbfTerm } from './multi-rbf.js';
import { polynomialTerm } from './polynomial.js';
import { rbfTerm } from './rbf.js';
import { splineTerm } from './spline.js';
import { transformedTerm } from './transform.js';
import type { Term, TrainingColumns, TrainingLevels, TrainingStats } from './types.js';
import { categoryTerm } from './category.js';

export type { Term, TrainingColumns, TrainingLevels, TrainingStats } from './types.js';

/** Every input column a term reads (without duplicates, in first-use order). */
export function termInputs(spec: TermSpec): string[] {
  if (spec.kind === 'linear') return [...new Set(spec.columns)];
  return spec.kind === 'multi-polynomial' || spec.kind === 'multi-rbf' ? [...spec.of] : [spec.of];
}

/**
 * Fixes a term's data-dependent parameters from the training columns.
 * @param spec the descriptor entry
 * @param training training columns by name (must hold every input of the term)
 * @param file descriptor path, for errors
 * @param levels training levels of category columns (needed by `category` terms only)
 */
export function createTerm(
  spec: TermSpec,
  training: TrainingColumns,
  file: string,
  levels: TrainingLevels = new Map(),
  stats?: TrainingStats,
): Term {
  if (spec.kind !== 'linear' && spec.kind !== 'category' && spec.transform !== undefined) {
    return transformedTerm(spec, training, file, termInputs(spec), (inner, columns) => createTerm(inner, columns, file));
  }
  switch (spec.kind) {
    case 'linear':
      return linearTerm(spec);
    case 'polynomial':
      return polynomialTerm(spec, training, file, stats);
    case 'rbf':
      return rbfTerm(spec, training);
    case 'fourier':
      return fourierTerm(spec);
    case 'spline':
      return splineTerm(spec, training, file);
    case 'multi-polynomial':
      return multiPolynomialTerm(spec, training, file, stats);
    case 'multi-rbf':
      return multiRbfTerm(spec, training, file);
    case 'category':
      return categoryTerm(spec, training, levels.get(spec.of) ?? [], file);
  }
}
