/**
 * `separation`: complete or quasi-complete separation of a classifier's training rows.
 */
import type { Check } from './types.js';
import { linesText, partLines } from '../data/data-parts.js';

const check: Check = {
  id: 'separation',
  title: 'Separation',
  limitKey: 'separation',
  defaultLimit: { warn: 0, fail: 1 },
  direction: 'above',
  limitSummary: 'Separation of the training rows (classifiers): 0 none, 1 quasi-complete (or any with ridge > 0), 2 complete.',
  description: `- Default \`{ warn: 0, fail: 1 }\`: fails on complete separation, warns on quasi-complete. Classifiers only. Points at the \`terms\` line.
- Figure: 2 when some direction b of the design separates the classes completely ((2y_i - 1) x_i^T b > 0
  for every training row), 1 when it does so quasi-completely (>= 0 for every row, > 0 for some), 0 when
  the classes overlap. Only with overlap do finite maximum-likelihood coefficients exist (Albert &
  Anderson 1984, "On the existence of maximum likelihood estimates in logistic regression models",
  Biometrika 71(1)); otherwise the fit's coefficients grow without bound and its probabilities reach 0
  and 1. With \`fit.ridge\` > 0 the penalised fit exists, so complete separation counts 1 (a warning).
- Exact test by linear programming (Konis 2007, DPhil thesis, University of Oxford): maximise the sum
  of (2y_i - 1) x_i^T b subject to (2y_i - 1) x_i^T b >= 0 for every row and |b_j| <= 1, repeated over the
  rows not yet separated, rows entering the program as cutting planes. Detail: the separated rows'
  count and first lines, the columns of the separating direction and the direction itself.`,
  advice:
    'Remove or merge the terms along which the classes separate, add a ridge penalty (`fit.ridge`), or collect rows where the classes overlap.',
  line: (d) => d.termsLine,
  tasks: ['classification'],
  measure: () => ({ value: null, reason: 'not-for-regression', message: 'applies to classifiers only' }),
  measureClassifier({ separation, design, descriptor, trainSource }) {
    const own = trainSource === undefined ? null : partLines(trainSource, separation.lines);
    const columns = separation.columns.map((j) => `\`${design.columnNames[j]}\``).join(', ');
    const detail = {
      kind: separation.kind,
      separated_rows: separation.separatedRows,
      lines: own?.lines ?? separation.lines,
      ...(own !== null ? { line_files: own.files } : {}),
      columns: separation.columns.map((j) => design.columnNames[j]),
      direction: separation.direction,
      exact: separation.exact,
    };
    const metrics = { separation: separation.kind, separated_rows: separation.separatedRows };
    if (separation.kind === 'none') {
      return {
        value: 0,
        message: `the classes overlap: finite maximum-likelihood coefficients exist${separation.exact ? '' : ' (the test stopped at its size cap)'}`,
        detail,
        metrics,
      };
    }
    const penalised = descriptor.fit.ridge > 0;
    const value = separation.kind === 'complete' && !penalised ? 2 : 1;
    const lines =
      (trainSource === undefined ? separation.lines.slice(0, 10).join(', ') : linesText(trainSource, separation.lines.slice(0, 10))) +
      (separation.separatedRows > 10 ? ', …' : '');
    return {
      value,
      message: `${separation.kind} separation: ${separation.separatedRows} training rows (lines ${lines}) are separated along ${columns}${penalised ? '; the ridge penalty keeps the coefficients finite' : '; the maximum-likelihood coefficients are infinite'}`,
      detail,
      metrics,
    };
  },
};

export default check;
