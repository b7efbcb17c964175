/**
 * Hold-out rows that repeat a training row: found by hashing the bit patterns of the input
 * values, confirmed by exact comparison on hash hits.
 */
import type { ModelData } from '../data/model-data.js';
import { mix32 } from './random.js';
import { borrowInts, returnInts } from '../core/scratch.js';

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
    h = Math.imul(h ^ (h >>> 15) ^ u32[1], 0x85ebca6b);
    h ^= h >>> 13;
  }
  return mix32(h);
}

function sameInputs(a: readonly Float64Array[], i: number, b: readonly Float64Array[], j: number): boolean {
  for (let c = 0; c < a.length; c++) if (a[c][i] !== b[c][j]) return false;
  return true;
}

/** Hash of row i's inputs and target (the target folded into {@link rowHash} of the inputs). */
function rowTargetHash(inputHash: number, y: Float64Array, i: number): number {
  f64[0] = y[i] + 0;
  return mix32(Math.imul(Math.imul(inputHash ^ u32[0], 0x9e3779b1) ^ u32[1], 0x85ebca6b));
}

/**
 * Hash table of distinct hold-out rows by open addressing with linear probing over typed arrays:
 * slot -> (hash, first distinct row), distinct rows with the same hash chained through `next`.
 * A row equal to one already in the table is not chained: `repOf` names that first row, so every
 * lookup compares with distinct rows only and the work stays linear however many rows repeat.
 * No Map, no per-row objects.
 */
interface RowTable {
  mask: number;
  slotHash: Uint32Array;
  slotHead: Int32Array;
  next: Int32Array;
  /** repOf[r]: the first hold-out row (in file order) equal to row r (r itself when it is the first). */
  repOf: Int32Array;
  /**
   * One bit per value of the top `filterBits` bits of a hash, set for every hash in the table:
   * a row whose bit is clear has no equal row in the table (equal rows hash equal), which a
   * lookup learns from a bit set small enough to stay in cache (about 16 bits per row, so at most
   * about 1 in 16 rows without a match goes on to the slots).
   */
  filter: Uint32Array;
  filterBits: number;
}

/**
 * An empty table for `rows` rows: its arrays are consecutive pieces of one array lent by
 * core/scratch.ts, added to `lent`.
 */
function newTable(rows: number, lent: Int32Array[]): RowTable {
  let size = 1024;
  while (size < 2 * rows) size *= 2;
  // size >= 2 rows, so 8 size bits are at least 16 per row: 2^13 .. 2^32 bits (32 at most).
  const filterBits = Math.min(32, Math.log2(size) + 3);
  const words = 2 ** (filterBits - 5);
  const all = borrowInts(words + 2 * size + 2 * rows);
  lent.push(all);
  const piece = (from: number, length: number): Int32Array => all.subarray(from, from + length);
  const unsigned = (from: number, length: number): Uint32Array => new Uint32Array(all.buffer, all.byteOffset + 4 * from, length);
  return {
    filter: unsigned(0, words),
    filterBits,
    mask: size - 1,
    slotHash: unsigned(words, size),
    slotHead: piece(words + size, size).fill(-1),
    next: piece(words + 2 * size, rows).fill(-1),
    repOf: piece(words + 2 * size + rows, rows),
  };
}

/** Whether some row in the table may have this hash (false: certainly none). */
function mayHold(table: RowTable, hash: number): boolean {
  const b = hash >>> (32 - table.filterBits);
  return ((table.filter[b >>> 5] >>> (b & 31)) & 1) === 1;
}

/** Records `hash` in the table's filter. */
function holdHash(table: RowTable, hash: number): void {
  const b = hash >>> (32 - table.filterBits);
  table.filter[b >>> 5] |= 1 << (b & 31);
}

/** The slot of `hash`: where it is, or the empty slot where it goes. */
function findSlot(table: RowTable, hash: number): number {
  const { slotHead, slotHash, mask } = table;
  let s = (Math.imul(hash, 0x9e3779b1) >>> 0) & mask;
  while (slotHead[s] >= 0 && slotHash[s] !== hash) s = (s + 1) & mask;
  return s;
}

// The passes are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").

/**
 * Puts the hold-out rows in the tables in file order: `inputs` by their inputs, `full` by their
 * inputs and target; a row equal to an earlier one only records that row in `repOf`.
 */
function indexRows(inputs: RowTable, full: RowTable, holdout: Pick<ModelData, 'inputs' | 'y' | 'rows'>): void {
  for (let r = 0; r < holdout.rows; r++) {
    const hash = rowHash(holdout.inputs, r);
    let s = findSlot(inputs, hash);
    let q = inputs.slotHead[s];
    while (q >= 0 && !sameInputs(holdout.inputs, q, holdout.inputs, r)) q = inputs.next[q];
    if (q >= 0) inputs.repOf[r] = q;
    else {
      inputs.repOf[r] = r;
      inputs.next[r] = inputs.slotHead[s];
      inputs.slotHash[s] = hash;
      inputs.slotHead[s] = r;
      holdHash(inputs, hash);
    }
    const hashY = rowTargetHash(hash, holdout.y, r);
    s = findSlot(full, hashY);
    q = full.slotHead[s];
    while (q >= 0 && !(holdout.y[q] === holdout.y[r] && sameInputs(holdout.inputs, q, holdout.inputs, r))) q = full.next[q];
    if (q >= 0) full.repOf[r] = q;
    else {
      full.repOf[r] = r;
      full.next[r] = full.slotHead[s];
      full.slotHash[s] = hashY;
      full.slotHead[s] = r;
    }
  }
}

/**
 * Streams the training rows past the tables of distinct hold-out rows in file order:
 * firstMatch[q] receives the file line of the first training row whose inputs equal those of distinct row q,
 * targetToo[q] = 1 when some training row has its inputs and its target.
 */
function matchRows(
  inputs: RowTable,
  full: RowTable,
  holdout: Pick<ModelData, 'inputs' | 'y'>,
  train: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>,
  firstMatch: Int32Array,
  targetToo: Uint8Array,
): void {
  for (let i = 0; i < train.rows; i++) {
    const hash = rowHash(train.inputs, i);
    if (!mayHold(inputs, hash)) continue;
    let q = inputs.slotHead[findSlot(inputs, hash)];
    while (q >= 0 && !sameInputs(holdout.inputs, q, train.inputs, i)) q = inputs.next[q];
    if (q < 0) continue;
    if (firstMatch[q] < 0) firstMatch[q] = train.lines[i];
    q = full.slotHead[findSlot(full, rowTargetHash(hash, train.y, i))];
    while (q >= 0 && !(holdout.y[q] === train.y[i] && sameInputs(holdout.inputs, q, train.inputs, i))) q = full.next[q];
    if (q >= 0) targetToo[q] = 1;
  }
}

/**
 * Finds hold-out rows equal to a training row in every input column of the model (values compared
 * exactly, as parsed doubles; -0 equals 0), and among them those whose target is equal too.
 * Cost: one pass over each file plus exact comparisons on hash hits, against distinct hold-out
 * rows only (so repeated rows in both files stay linear); memory two hash tables of the hold-out
 * rows (typed arrays, about 40 bytes per row).
 *
 * @param train training rows (inputs in the model's order, targets, lines)
 * @param holdout hold-out rows (same input order)
 */
export function findLeakage(
  train: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>,
  holdout: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>,
): Leakage {
  const scan = new LeakageScan(holdout);
  scan.add(train);
  return scan.finish();
}

/**
 * {@link findLeakage} over training rows that arrive in chunks (a streamed model,
 * data/row-source.ts): the tables of the hold-out rows are built once, each chunk streams past
 * them in file order ({@link add}), and {@link finish} gives the figures. Memory: the hold-out
 * tables only, whatever the training rows.
 */
export class LeakageScan {
  readonly #holdout: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>;
  readonly #byInputs: RowTable;
  readonly #byRow: RowTable;
  readonly #firstMatch: Int32Array;
  readonly #targetToo: Uint8Array;
  /** The tables' arrays, lent by core/scratch.ts until {@link finish}. */
  readonly #lent: Int32Array[] = [];
  #result: Leakage | undefined;

  /** @param holdout hold-out rows (inputs in the model's order) */
  constructor(holdout: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>) {
    // Tables of the distinct hold-out rows (the smaller file, usually); the training rows then
    // stream past them in file order, so each hold-out row's first match is the earliest training row.
    const h = holdout.rows;
    this.#holdout = holdout;
    this.#byInputs = newTable(h, this.#lent);
    this.#byRow = newTable(h, this.#lent);
    indexRows(this.#byInputs, this.#byRow, holdout);
    // firstMatch (h integers) and targetToo (h bytes) share one lent array.
    const marks = borrowInts(h + Math.ceil(h / 4));
    this.#lent.push(marks);
    this.#firstMatch = marks.subarray(0, h).fill(-1);
    this.#targetToo = new Uint8Array(marks.buffer, marks.byteOffset + 4 * h, h);
  }

  /** Streams the next training rows (in file order) past the hold-out rows; not after {@link finish}. */
  add(train: Pick<ModelData, 'inputs' | 'y' | 'rows' | 'lines'>): void {
    if (this.#result !== undefined) throw new Error('LeakageScan: rows added after finish()');
    if (this.#holdout.rows > 0) matchRows(this.#byInputs, this.#byRow, this.#holdout, train, this.#firstMatch, this.#targetToo);
  }

  /** The figures over every training row added (the same object when called again); gives the tables back. */
  finish(): Leakage {
    if (this.#result === undefined) {
      this.#result = this.#figures();
      for (const array of this.#lent) returnInts(array);
    }
    return this.#result;
  }

  /** The figures, read from the tables. */
  #figures(): Leakage {
    const holdout = this.#holdout;
    const h = holdout.rows;
    let inputMatches = 0;
    let fullMatches = 0;
    const holdoutLines: number[] = [];
    const trainLines: number[] = [];
    for (let r = 0; r < h; r++) {
      const first = this.#firstMatch[this.#byInputs.repOf[r]];
      if (first < 0) continue;
      inputMatches++;
      if (this.#targetToo[this.#byRow.repOf[r]] === 1) fullMatches++;
      if (holdoutLines.length < LEAKAGE_EXAMPLE_LINES) {
        holdoutLines.push(holdout.lines[r]);
        trainLines.push(first);
      }
    }
    return { inputMatches, fullMatches, holdoutLines, trainLines, holdoutRows: holdout.rows, columns: holdout.inputs.length };
  }
}
