/**
 * Hold-out rows that repeat a training row: found by hashing the bit patterns of the input
 * values, confirmed by exact comparison on hash hits.
 */
import type { ModelData } from '../data/model-data.js';
import { mix32 } from './random.js';

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

/**
 * 32-bit hash of the bit patterns of row i's values (-0 counts as 0): each 32-bit half is folded
 * in with one multiply (golden-ratio and MurmurHash3 constants, Appleby 2011), then the lowbias32
 * finaliser (Wellons 2018) spreads the bits once per row. Matches are always confirmed by exact
 * comparison, so the hash only has to spread rows over the table.
 */
function rowHash(columns: readonly Float64Array[], i: number): number {
  let h = 0x811c9dc5;
  for (let c = 0; c < columns.length; c++) {
    f64[0] = columns[c][i] + 0; // -0 + 0 === +0: equal values hash equal
    h = Math.imul(h ^ u32[0], 0x9e3779b1);
    h = Math.imul((h ^ (h >>> 15)) ^ u32[1], 0x85ebca6b);
    h ^= h >>> 13;
  }
  return mix32(h);
}

function sameInputs(a: readonly Float64Array[], i: number, b: readonly Float64Array[], j: number): boolean {
  for (let c = 0; c < a.length; c++) if (a[c][i] !== b[c][j]) return false;
  return true;
}

/**
 * Hash table of rows by open addressing with linear probing over typed arrays: slot -> (hash,
 * first row), rows with the same hash chained through `next`. No Map, no per-row objects.
 */
interface RowTable {
  mask: number;
  slotHash: Uint32Array;
  slotHead: Int32Array;
  next: Int32Array;
}

/** The slot of `hash`: where it is, or the empty slot where it goes. */
function findSlot(table: RowTable, hash: number): number {
  const { slotHead, slotHash, mask } = table;
  let s = (Math.imul(hash, 0x9e3779b1) >>> 0) & mask;
  while (slotHead[s] >= 0 && slotHash[s] !== hash) s = (s + 1) & mask;
  return s;
}

// The two passes are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").

/** Puts rows 0..n-1 in the table, so that each chain lists its rows in file order. */
function indexRows(table: RowTable, inputs: readonly Float64Array[], n: number): void {
  for (let r = n - 1; r >= 0; r--) {
    const hash = rowHash(inputs, r);
    const s = findSlot(table, hash);
    table.next[r] = table.slotHead[s];
    table.slotHash[s] = hash;
    table.slotHead[s] = r;
  }
}

/**
 * Streams the training rows past the table of hold-out rows in file order: firstMatch[r] receives
 * the first training row whose inputs equal hold-out row r's, targetToo[r] = 1 when some such row
 * has its target too.
 */
function matchRows(table: RowTable, holdout: Pick<ModelData, 'inputs' | 'y'>, train: Pick<ModelData, 'inputs' | 'y' | 'rows'>, firstMatch: Int32Array, targetToo: Uint8Array): void {
  for (let i = 0; i < train.rows; i++) {
    let r = table.slotHead[findSlot(table, rowHash(train.inputs, i))];
    while (r >= 0) {
      if (sameInputs(holdout.inputs, r, train.inputs, i)) {
        if (firstMatch[r] < 0) firstMatch[r] = i;
        if (holdout.y[r] === train.y[i]) targetToo[r] = 1;
      }
      r = table.next[r];
    }
  }
}

/**
 * Finds hold-out rows equal to a training row in every input column of the model (values compared
 * exactly, as parsed doubles; -0 equals 0), and among them those whose target is equal too.
 * Cost: one pass over each file plus exact comparisons on hash hits; memory one hash table of the
 * hold-out rows (typed arrays, about 20 bytes per row).
 *
 * @param train training rows (inputs in the model's order, targets, lines)
 * @param holdout hold-out rows (same input order)
 */
export function findLeakage(train: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>, holdout: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>): Leakage {
  const columns = train.inputs.length;
  // A hash table of the hold-out rows (the smaller file, usually); the training rows then stream
  // past it in file order, so each hold-out row's first match is the earliest training row.
  const h = holdout.rows;
  let size = 1024;
  while (size < 2 * h) size *= 2;
  const table: RowTable = { mask: size - 1, slotHash: new Uint32Array(size), slotHead: new Int32Array(size).fill(-1), next: new Int32Array(h).fill(-1) };
  indexRows(table, holdout.inputs, h);
  const firstMatch = new Int32Array(h).fill(-1);
  const targetToo = new Uint8Array(h);
  if (h > 0) matchRows(table, holdout, train, firstMatch, targetToo);
  let inputMatches = 0;
  let fullMatches = 0;
  const holdoutLines: number[] = [];
  const trainLines: number[] = [];
  for (let r = 0; r < h; r++) {
    if (firstMatch[r] < 0) continue;
    inputMatches++;
    if (targetToo[r] === 1) fullMatches++;
    if (holdoutLines.length < LEAKAGE_EXAMPLE_LINES) {
      holdoutLines.push(holdout.lines[r]);
      trainLines.push(train.lines[firstMatch[r]]);
    }
  }
  return { inputMatches, fullMatches, holdoutLines, trainLines, holdoutRows: holdout.rows, columns };
}
