/**
 * The shape every basis term shares once its parameters are fixed from the training data.
 */
import type { TermSpec } from '../../config/types.js';

/** A term with every parameter fixed (shift, scale, centres), ready to fill design columns. */
export interface Term {
  /** The descriptor entry this term came from (for lines and messages). */
  readonly spec: TermSpec;
  /** Input column names this term reads, in the order `fill` receives them. */
  readonly inputs: readonly string[];
  /** Names of the design columns it builds, e.g. `x^2`, `rbf(x; c=1.5)`. */
  readonly columnNames: readonly string[];
  /** Parameters fixed from the training data, for the report (shift, scale, centres...). */
  readonly fixed: Record<string, number | number[]>;
  /**
   * Fills this term's design columns for a block of rows: every entry of them, zeros included
   * (the block's buffer is reused and holds whatever was there before: design/blocks.ts).
   * @param inputs one Float64Array per entry of `inputs`, each holding at least `m` rows
   * @param m rows in the block
   * @param out column-major design block with `m` rows (`out[j * m + i]`)
   * @param offset index of this term's first column in `out`
   */
  fill(inputs: readonly Float64Array[], m: number, out: Float64Array, offset: number): void;
  /**
   * Whether the term is defined at this value of one of its inputs (absent: everywhere). Scans
   * beyond the training range (swing margins) leave out values a term is not defined at, e.g.
   * x <= 0 under `transform: log`.
   */
  admits?(input: string, value: number): boolean;
  /**
   * The scale the term sees its inputs on, when it transforms them (`transform: log` ...): a name
   * and the increasing map and its inverse. Scans of an input that every term reads on the same
   * scale are laid out on that scale (even steps in log x, margins of 10 % of the log range).
   */
  /** The only values its (single) input takes, for a category's level codes: scans use exactly these. */
  discreteValues?: readonly number[];
  /** A category's training levels as written, by code (`levels[code]`), to name a code in messages. */
  levels?: readonly string[];
  inputScale?: { name: string; forward(value: number): number; inverse(value: number): number };
}

/** Training columns by name, used to fix data-dependent parameters. */
export type TrainingColumns = ReadonlyMap<string, Float64Array>;

/** Training levels (text order) of each category column, by name; their codes are the columns' values. */
export type TrainingLevels = ReadonlyMap<string, readonly string[]>;

/**
 * Mean and population standard deviation of input columns measured over every training row, by
 * column name, when the training columns at hand are only a sample (a streamed training file:
 * data/load-model-data.ts). Polynomial terms take their default shift and scale from here when a
 * column is listed, so that they equal the full-data ones; absent: from the columns themselves.
 */
export type TrainingStats = ReadonlyMap<string, { mean: number; sd: number }>;
