/**
 * `coefficient-size`: the largest standardised coefficient.
 */
import { clip } from '../core/errors.js';
import type { Check } from './types.js';
import { classifierCoefficientSize } from './classifier/measures.js';
import { formatNumber } from '../core/format.js';

const check: Check = {
  id: 'coefficient-size',
  title: 'Coefficient size',
  limitKey: 'coefficient',
  defaultLimit: 25,
  direction: 'above',
  limitSummary: 'Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns.',
  description: `- Default \`25\`. Points at the term whose column has the largest figure.
- Figure: max over non-intercept columns of |w_j| * sd(phi_j) / sd(y), population standard
  deviations over the training rows: the change of the prediction, in target standard deviations,
  for one standard deviation of that column (standardised regression coefficient; Draper & Smith,
  Applied Regression Analysis, 3rd ed., 1998, section 16.3). Huge values mean that columns cancel
  each other, the signature of an overfit or ill-conditioned fit.`,
  advice: 'Add a ridge penalty (`fit.ridge`) or remove nearly collinear terms so that columns stop cancelling each other.',
  line: (d) => d.fit.ridgeLine,
  measureClassifier: classifierCoefficientSize,
  measure({ metrics, design }) {
    if (metrics.maxStdCoefficientColumn < 0) {
      return { value: null, reason: 'no-columns', message: 'the model has no non-intercept columns' };
    }
    const column = design.columnNames[metrics.maxStdCoefficientColumn];
    const term = design.termOffsets.findLastIndex((o) => o <= metrics.maxStdCoefficientColumn);
    return {
      value: metrics.maxStdCoefficient,
      message: `largest standardised coefficient is ${formatNumber(metrics.maxStdCoefficient)}, on column \`${clip(column)}\``,
      line: term >= 0 ? design.terms[term].spec.line : undefined,
      detail: { column },
    };
  },
};

export default check;
