/**
 * The columns of one model's rows: what the loader produces and every later stage reads.
 */

import type { DataPart } from './data-parts.js';

/** The data of one model, as columns (column-major, one Float64Array per input). */
export interface ModelData {
  /** Input columns in `design.inputs` order. */
  inputs: Float64Array[];
  /** Target column. */
  y: Float64Array;
  /** 1-based file line of each row (read from parts: table-wide lines, see data-parts.ts). */
  lines: Int32Array;
  /** Number of rows. */
  rows: number;
  /** Repository-relative file path (read from parts: a label, see `parts`). */
  file: string;
  /**
   * Read from a list of parts (`data.train: [a.csv, b.csv]` or a glob): each part with its line
   * offset, so that `placeOfLine` (data-parts.ts) names a row's part and its own line. Absent
   * for one file.
   */
  parts?: DataPart[];
  /**
   * Row weights w (>= 0, finite) when the descriptor gives `data.weight` or `data.sigma`
   * (then w = 1 / sigma^2); absent: every row weighs 1.
   */
  weights?: Float64Array;
  /** Standard uncertainties of the target when the descriptor gives `data.sigma`. */
  sigma?: Float64Array;
  /** Rows dropped for a missing cell under `data.missing: drop` (absent otherwise). */
  dropped?: number;
  /**
   * Present when these rows are a sample of a streamed training file (data/row-source.ts): the
   * number of rows in the file. Figures per training row use it ({@link trainingRows}).
   */
  sampleOf?: number;
}

/** The number of training rows a figure should count: the file's rows, also for a sample of them. */
export function trainingRows(data: Pick<ModelData, 'rows' | 'sampleOf'>): number {
  return data.sampleOf ?? data.rows;
}
