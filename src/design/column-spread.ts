/**
 * Population standard deviations of the design columns, gathered block by block in the same
 * pass that folds rows into the factor. Sums are taken about each column's first value, which
 * keeps the subtraction well conditioned for columns with a large offset.
 */
import { sumOfDeviations, sumOfSquaredDeviations } from './stats.js';

/** Running sums per column. */
export class ColumnSpread {
  private readonly shift: Float64Array;
  private readonly s1: Float64Array;
  private readonly s2: Float64Array;
  private n = 0;

  /** @param p number of columns */
  constructor(readonly p: number) {
    this.shift = new Float64Array(p);
    this.s1 = new Float64Array(p);
    this.s2 = new Float64Array(p);
  }

  /** Adds a column-major block of `m` rows. */
  add(X: Float64Array, m: number): void {
    if (m === 0) return;
    for (let j = 0; j < this.p; j++) {
      const base = j * m;
      if (this.n === 0) this.shift[j] = X[base];
      const column = X.subarray(base, base + m);
      // One pass per sum (one loop per function; see DEVELOPERS.md, "Writing hot loops").
      this.s1[j] += sumOfDeviations(column, m, this.shift[j]);
      this.s2[j] += sumOfSquaredDeviations(column, m, this.shift[j]);
    }
    this.n += m;
  }

  /** Population standard deviation sqrt(mean((x - mean)^2)) of each column (NaN with no rows). */
  sd(): Float64Array {
    const out = new Float64Array(this.p);
    for (let j = 0; j < this.p; j++) {
      const mean = this.s1[j] / this.n;
      out[j] = Math.sqrt(Math.max(0, this.s2[j] / this.n - mean * mean));
    }
    return out;
  }
}
