/**
 * Category levels as numeric codes, so that the design can read a category input like any other
 * column: the training levels, sorted by text order (JavaScript's default string order: UTF-16
 * code units), are coded 0, 1, ...; a hold-out level never seen in training is an error naming the
 * level, file and line, or with `unseen: zero` the code -1 (every indicator 0: the reference level's
 * prediction).
 */
import { InputError } from '../core/errors.js';
import { placeOfLine, type DataPart } from './data-parts.js';

/** The training levels of a category column, in text order. */
export function trainingLevels(values: readonly string[]): string[] {
  return [...new Set(values)].sort();
}

/**
 * Codes of the cells: index of the level in `levels`, or -1 for an unseen level when allowed.
 * @param where file (and parts, when read from parts), lines and the descriptor line of the term, for the error
 * @throws InputError `unseen-level` at the first unseen level when `unseen` is `error`
 */
export function levelCodes(
  values: readonly string[],
  levels: readonly string[],
  unseen: 'error' | 'zero',
  where: { file: string; parts?: DataPart[]; lines: Int32Array; column: string; termLine: number; descriptor: string },
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
      const place = placeOfLine(where, where.lines[i]);
      throw new InputError(
        'unseen-level',
        `column \`${where.column}\` has the level ${JSON.stringify(values[i].slice(0, 80))} on line ${place.line} of ${place.file}, which no training row has; the category term on line ${where.termLine} of ${where.descriptor} has no column for it (add \`unseen: zero\` to predict it as the reference level)`,
        { file: place.file, line: place.line, key: where.column },
      );
    }
    out[i] = k;
  }
  return out;
}
