/**
 * The swing figure of a model known only by its predictions: how far its predictions of the
 * observed rows (training and hold-out) leave the band of training targets. Without the model
 * itself nothing can be predicted between or beyond the rows, so this is the part of the swing
 * scan (diagnostics/swing.ts) that predictions allow.
 */

/** Where the predictions of the observed rows lie against the training target band. */
export interface ObservedSpread {
  /** [min y, max y] of the training targets. */
  band: [number, number];
  /** [min, max] of the predictions of the training and hold-out rows. */
  predicted: [number, number];
  /** max(0, max(pred) - max y, min y - min(pred)) / (max y - min y); NaN when the band is one value. */
  value: number;
  /** Rows whose predictions were compared (training plus hold-out). */
  rows: number;
  /** The row furthest outside the band: its file, line and prediction; null when every prediction is inside. */
  worst: { file: string; line: number; prediction: number } | null;
}

/** Predictions of one file's rows with the lines they came from. */
export interface PredictedFile {
  file: string;
  lines: Int32Array;
  predictions: Float64Array;
  rows: number;
}

/**
 * The spread of the predictions of the observed rows against the training target band (the same
 * figure as the `swing` check's, on these rows only).
 * @param y training targets (the first `trainRows` entries are read)
 * @param files the training and hold-out rows with their predictions
 */
export function observedSpread(y: Float64Array, trainRows: number, files: readonly PredictedFile[]): ObservedSpread {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < trainRows; i++) {
    if (y[i] < lo) lo = y[i];
    if (y[i] > hi) hi = y[i];
  }
  let pLo = Infinity;
  let pHi = -Infinity;
  let worstOut = 0;
  let worst: ObservedSpread['worst'] = null;
  let rows = 0;
  for (const f of files) {
    for (let i = 0; i < f.rows; i++) {
      const p = f.predictions[i];
      if (p < pLo) pLo = p;
      if (p > pHi) pHi = p;
      const out = Math.max(p - hi, lo - p);
      if (out > worstOut) {
        worstOut = out;
        worst = { file: f.file, line: f.lines[i], prediction: p };
      }
    }
    rows += f.rows;
  }
  const width = hi - lo;
  return { band: [lo, hi], predicted: [pLo, pHi], value: width > 0 ? worstOut / width : Number.NaN, rows, worst };
}
