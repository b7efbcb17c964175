/**
 * `conditioning`: condition number of the column-scaled design, naming nearly collinear terms.
 */
import { clip } from '../core/errors.js';
import type { Check } from './types.js';
import { classifierConditioning } from './classifier/measures.js';
import { formatNumber } from '../core/format.js';
import { jsonNumber } from '../result/result.js';

const check: Check = {
  id: 'conditioning',
  title: 'Conditioning of the design',
  limitKey: 'condition',
  defaultLimit: { warn: 1e8 },
  direction: 'above',
  limitSummary: '2-norm condition number of the column-scaled design matrix.',
  description: `- Default \`{ warn: 1e8 }\` (common practice). Points at the first term that has
  a nearly collinear column (the \`fit\` line when it is only the intercept).
- Figure: the 2-norm condition number s_max / s_min of the design with every column scaled to unit
  length, from the singular values of the triangular factor R of its QR factorisation (Golub & Van
  Loan, Matrix Computations, 4th ed., 2013, sections 2.6 and 5.3; column scaling: van der Sluis 1969,
  Numerische Mathematik 14). Infinite for a rank-deficient design.
- The message names the columns with weight |v_j| >= 0.1 in the right singular vector of the
  smallest singular value (the most nearly collinear combination) when the figure is above 1e3.
- Metric \`condition_number_scaled\`. Detail: \`collinear_columns\`, \`collinear_term_lines\`, \`rank\`,
  \`singular_values_scaled\`.`,
  advice:
    'Drop or merge the named terms, lower the degree, centre and scale polynomial inputs (the default shift and scale), or add a ridge penalty.',
  line: (d) => d.termsLine,
  measureClassifier: classifierConditioning,
  measure({ fit, design, descriptor }) {
    const value = fit.conditionNumberScaled;
    const columns = fit.collinearColumns.map((j) => design.columnNames[j]);
    // Term of each collinear column (the intercept belongs to the `fit` block).
    const termOf = (j: number): number => {
      let t = -1;
      design.termOffsets.forEach((offset, i) => {
        if (j >= offset && design.terms[i].columnNames.length > 0) t = i;
      });
      return t;
    };
    const terms = [...new Set(fit.collinearColumns.map(termOf).filter((t) => t >= 0))];
    const line = terms.length > 0 ? design.terms[terms[0]].spec.line : descriptor.fit.line;
    const named =
      columns.length > 0
        ? `; nearly collinear: ${columns
            .slice(0, 8)
            .map((c) => clip(c))
            .join(
              ', ',
            )}${columns.length > 8 ? ', …' : ''}${terms.length > 0 ? ` (${terms.length === 1 ? 'term on line' : 'terms on lines'} ${terms.map((t) => design.terms[t].spec.line).join(', ')})` : ''}`
        : '';
    return {
      value,
      message: `the column-scaled design has condition number ${formatNumber(value)} (rank ${fit.rank} of ${design.p})${value > 1e3 ? named : ''}`,
      line,
      metrics: { condition_number_scaled: jsonNumber(value) },
      detail: {
        collinear_columns: columns,
        collinear_term_lines: terms.map((t) => design.terms[t].spec.line),
        rank: fit.rank,
        singular_values_scaled: Array.from(fit.singularValuesScaled, jsonNumber),
      },
    };
  },
};

export default check;
