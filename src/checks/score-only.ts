/**
 * Checks that need a refit (cross-validation, complexity, reproducibility) on a model scored as
 * shipped (`fit.refit: false`): they are skipped with this reason instead of judging a fit the
 * model does not claim to be.
 */
import type { Descriptor } from '../config/types.js';
import type { Measurement } from './types.js';

/** The skipped measurement when the model is scored as shipped, else null (measure as usual). */
export function skipWhenScoreOnly(descriptor: Descriptor): Measurement | null {
  if (descriptor.fit.refit !== false) return null;
  return {
    value: null,
    reason: 'score-only',
    message: 'skipped: this check needs a refit, and the model is scored as shipped (`fit.refit: false`)',
    line: descriptor.fit.line,
  };
}
