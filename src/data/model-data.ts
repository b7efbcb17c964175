/**
 * The columns of one model's rows: what the loader produces and every later stage reads.
 */

/** The data of one model, as columns (column-major, one Float64Array per input). */
export interface ModelData {
  /** Input columns in `design.inputs` order. */
  inputs: Float64Array[];
  /** Target column. */
  y: Float64Array;
  /** 1-based file line of each row. */
  lines: Int32Array;
  /** Number of rows. */
  rows: number;
  /** Repository-relative file path. */
  file: string;
  /** Rows dropped for a missing cell under `data.missing: drop` (absent otherwise). */
  dropped?: number;
}
