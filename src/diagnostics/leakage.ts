/**
 * Hold-out rows that repeat a training row: found by hashing the bit patterns of the input
 * values, confirmed by exact comparison on hash hits.
 */
import type { ModelData } from '../checks/types.js';

/** How many line numbers of each file to report. */
export const LEAKAGE_EXAMPLE_LINES = 5;

/** Hold-out rows found in the training rows. */
export interface Leakage {
  /** Hold-out rows whose inputs equal those of some training row. */
  inputMatches: number;
  /** Of those, the rows whose target also equals the target of such a training row (inputs and target equal). */
  fullMatches: number;
  /** File lines of the first matching hold-out rows (at most {@link LEAKAGE_EXAMPLE_LINES}). */
  holdoutLines: number[];
  /** File line of the first training row matched by each of those hold-out rows (same order). */
  trainLines: number[];
  /** Hold-out rows compared. */
  holdoutRows: number;
  /** Input columns compared. */
  columns: number;
}

const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);

/** 32-bit hash of the bit patterns of row i's values (-0 counts as 0). */
function rowHash(columns: readonly Float64Array[], i: number): number {
  let h = 0x811c9dc5;
  for (const col of columns) {
    f64[0] = col[i] + 0; // -0 + 0 === +0: equal values hash equal
    for (let w = 0; w < 2; w++) {
      // Multiply-xorshift mix of each 32-bit half (constants of the lowbias32 finaliser, Wellons 2018).
      let z = (u32[w] ^ h) >>> 0;
      z ^= z >>> 16;
      z = Math.imul(z, 0x7feb352d);
      z ^= z >>> 15;
      z = Math.imul(z, 0x846ca68b);
      z ^= z >>> 16;
      h = (Math.imul(h, 0x01000193) ^ z) >>> 0;
    }
  }
  return h;
}

function sameInputs(a: readonly Float64Array[], i: number, b: readonly Float64Array[], j: number): boolean {
  for (let c = 0; c < a.length; c++) if (a[c][i] !== b[c][j]) return false;
  return true;
}

/**
 * Finds hold-out rows equal to a training row in every input column of the model (values compared
 * exactly, as parsed doubles; -0 equals 0), and among them those whose target is equal too.
 * Cost: one pass over each file plus exact comparisons on hash hits; memory one hash table of the
 * training rows.
 *
 * @param train training rows (inputs in the model's order, targets, lines)
 * @param holdout hold-out rows (same input order)
 */
export function findLeakage(train: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>, holdout: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>): Leakage {
  const columns = train.inputs.length;
  // Hash table: bucket head per hash, chained through `next` (no per-row objects).
  const heads = new Map<number, number>();
  const next = new Int32Array(train.rows).fill(-1);
  for (let i = train.rows - 1; i >= 0; i--) {
    const h = rowHash(train.inputs, i);
    const head = heads.get(h);
    if (head !== undefined) next[i] = head;
    heads.set(h, i);
  }
  let inputMatches = 0;
  let fullMatches = 0;
  const holdoutLines: number[] = [];
  const trainLines: number[] = [];
  for (let r = 0; r < holdout.rows; r++) {
    let i = heads.get(rowHash(holdout.inputs, r));
    let firstMatch = -1;
    let targetToo = false;
    while (i !== undefined && i >= 0) {
      if (sameInputs(holdout.inputs, r, train.inputs, i)) {
        if (firstMatch < 0) firstMatch = i;
        if (holdout.y[r] === train.y[i]) {
          targetToo = true;
          break;
        }
      }
      i = next[i];
    }
    if (firstMatch < 0) continue;
    inputMatches++;
    if (targetToo) fullMatches++;
    if (holdoutLines.length < LEAKAGE_EXAMPLE_LINES) {
      holdoutLines.push(holdout.lines[r]);
      trainLines.push(train.lines[firstMatch]);
    }
  }
  return { inputMatches, fullMatches, holdoutLines, trainLines, holdoutRows: holdout.rows, columns };
}
