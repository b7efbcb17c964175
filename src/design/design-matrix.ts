/**
 * The design matrix Phi = [1 | columns of each term, in order], built block by block so that a
 * model's rows never have to sit in memory as an n x p matrix.
 */
import type { Term } from './terms/index.js';

/** Name of the intercept column. */
export const INTERCEPT = '(intercept)';

/** A fixed design: which columns, in which order, and how to fill a block of rows. */
export interface Design {
  /** Number of columns p. */
  readonly p: number;
  /** Column names, intercept first when there is one. */
  readonly columnNames: readonly string[];
  /** Whether column j is penalised by ridge (every column but the intercept). */
  readonly penalised: readonly boolean[];
  /** Index of the first column of each term. */
  readonly termOffsets: readonly number[];
  /** True when column 0 is the intercept. */
  readonly intercept: boolean;
  /** The terms, in order. */
  readonly terms: readonly Term[];
  /** Input column names the design reads, in order. */
  readonly inputs: readonly string[];
  /**
   * Fills a column-major block of `m` rows (`out[j * m + i]`, length at least m * p) from the
   * input columns (one per entry of `inputs`, each at least `m` long, `start` is the first row).
   * Returns `out`.
   */
  fill(inputs: readonly Float64Array[], start: number, m: number, out?: Float64Array): Float64Array;
}

/**
 * Builds a design from fixed terms.
 * @param terms the terms in descriptor order
 * @param intercept whether to put a column of ones first
 */
export function createDesign(terms: readonly Term[], intercept: boolean): Design {
  const inputs: string[] = [];
  for (const t of terms) for (const c of t.inputs) if (!inputs.includes(c)) inputs.push(c);
  const names: string[] = intercept ? ['(intercept)'] : [];
  const offsets: number[] = [];
  for (const t of terms) {
    offsets.push(names.length);
    for (const name of t.columnNames) names.push(name);
  }
  const p = names.length;
  const penalised = names.map((_, j) => !(intercept && j === 0));
  const termInputIndex = terms.map((t) => t.inputs.map((c) => inputs.indexOf(c)));
  return {
    p,
    columnNames: names,
    penalised,
    termOffsets: offsets,
    intercept,
    terms,
    inputs,
    fill(cols, start, m, out = new Float64Array(m * p)) {
      if (intercept) out.fill(1, 0, m);
      const views = cols.map((c) => c.subarray(start, start + m));
      for (let t = 0; t < terms.length; t++) {
        terms[t].fill(
          termInputIndex[t].map((k) => views[k]),
          m,
          out,
          offsets[t],
        );
      }
      return out;
    },
  };
}
