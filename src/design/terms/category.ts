/**
 * `category: { of, reference?, unseen? }`: indicator (dummy) columns of a text column, one per
 * level seen in the training rows except the reference level: phi_l(x) = 1 when the row's level is
 * l, else 0 (treatment coding: Draper & Smith, Applied Regression Analysis, 3rd ed., 1998,
 * chapter 14). The reference level has no column (the intercept carries it); default: the most
 * frequent training level, ties by text order. The loader hands the column in as level codes
 * (data/levels.ts: training levels in text order coded 0, 1, ...; -1 for an unseen hold-out level
 * under `unseen: zero`, whose indicators are then all 0). Column names: `site=north`.
 */
import type { CategoryTermSpec } from '../../config/types.js';
import { InputError } from '../../core/errors.js';
import type { Term, TrainingColumns } from './types.js';

/** The reference level's code: the named level, or the most frequent (ties: the lowest code, i.e. first in text order). */
export function referenceLevel(spec: CategoryTermSpec, levels: readonly string[], codes: Float64Array, file: string): number {
  if (spec.reference !== null) {
    const k = levels.indexOf(spec.reference);
    if (k < 0) {
      throw new InputError(
        'category-reference',
        `the reference level ${JSON.stringify(spec.reference.slice(0, 80))} is not a level of \`${spec.of}\` in the training rows; its levels are ${levels
          .slice(0, 12)
          .map((l) => JSON.stringify(l.slice(0, 40)))
          .join(', ')}${levels.length > 12 ? ', …' : ''}`,
        {
          file,
          line: spec.line,
          key: 'category.reference',
        },
      );
    }
    return k;
  }
  const counts = new Int32Array(levels.length);
  for (let i = 0; i < codes.length; i++) counts[codes[i]]++;
  let best = 0;
  for (let k = 1; k < levels.length; k++) if (counts[k] > counts[best]) best = k;
  return best;
}

/**
 * Builds the category term.
 * @param levels the training levels of `spec.of` in text order (the codes' meaning)
 * @throws InputError `category-reference` for a reference that is not a training level
 */
export function categoryTerm(spec: CategoryTermSpec, training: TrainingColumns, levels: readonly string[], file: string): Term {
  const codes = training.get(spec.of) as Float64Array;
  const reference = referenceLevel(spec, levels, codes, file);
  const kept: number[] = [];
  for (let k = 0; k < levels.length; k++) if (k !== reference) kept.push(k);
  const discrete = levels.map((_, k) => k);
  return {
    spec,
    inputs: [spec.of],
    columnNames: kept.map((k) => `${spec.of}=${levels[k].slice(0, 80)}`),
    fixed: { levels: levels.length, reference },
    discreteValues: discrete,
    levels: [...levels],
    admits: (_name, value) => Number.isInteger(value) && value >= 0 && value < levels.length,
    fill(inputs, m, out, offset) {
      for (let j = 0; j < kept.length; j++) indicatorColumn(inputs[0], m, kept[j], out, (offset + j) * m);
    },
  };
}

/** out[at + i] = 1 when code[i] is k, else 0 (one loop; see DEVELOPERS.md, "Writing hot loops"). */
function indicatorColumn(code: Float64Array, m: number, k: number, out: Float64Array, at: number): void {
  for (let i = 0; i < m; i++) out[at + i] = code[i] === k ? 1 : 0;
}
