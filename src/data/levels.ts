/**
 * Category levels as numeric codes, so that the design can read a category input like any other
 * column: the training levels, sorted by text order (JavaScript's default string order: UTF-16
 * code units), are coded 0, 1, ...; a hold-out level never seen in training is an error naming the
 * level, file and line, or with `unseen: zero` the code -1 (every indicator 0: the reference level's
 * prediction).
 */
import { InputError } from '../core/errors.js';

/** The training levels of a category column, in text order. */
export function trainingLevels(values: readonly string[]): string[] {
  return [...new Set(values)].sort();
}

/**
 * Codes of the cells: index of the level in `levels`, or -1 for an unseen level when allowed.
 * @param where file, lines and the descriptor line of the term, for the error
 * @throws InputError `unseen-level` at the first unseen level when `unseen` is `error`
 */
export function levelCodes(
  values: readonly string[],
  levels: readonly string[],
  unseen: 'error' | 'zero',
  where: { file: string; lines: Int32Array; column: string; termLine: number; descriptor: string },
): Float64Array {
  const index = new Map(levels.map((l, k) => [l, k]));
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const k = index.get(values[i]);
    if (k === undefined) {
      if (unseen === 'zero') {
        out[i] = -1;
        continue;
      }
      throw new InputError(
        'unseen-level',
        `column \`${where.column}\` has the level ${JSON.stringify(values[i].slice(0, 80))} on line ${where.lines[i]} of ${where.file}, which no training row has; the category term on line ${where.termLine} of ${where.descriptor} has no column for it (add \`unseen: zero\` to predict it as the reference level)`,
        { file: where.file, line: where.lines[i], key: where.column },
      );
    }
    out[i] = k;
  }
  return out;
}
