/**
 * How the reports state a model's kind (format only): a model trained elsewhere (`kind:
 * 'predictions'`) is marked in every format; a model of terms is shown as before (no mark).
 */
import type { ModelResult } from '../result/result.js';

/** True for a model trained elsewhere, gated from its predictions. */
export function isPredictionsModel(m: ModelResult): boolean {
  return m.kind === 'predictions';
}

/** The short mark after a model's name in overview tables: ` (predictions)`, or '' for a model of terms. */
export function kindMark(m: ModelResult): string {
  return isPredictionsModel(m) ? ' (predictions)' : '';
}

/** The parameter count as reports show it: the number, or `not stated` for a model trained elsewhere without `parameters`. */
export function parametersText(m: ModelResult): string {
  return isPredictionsModel(m) && m.parameters === 0 ? 'not stated' : String(m.parameters);
}

/**
 * One sentence stating the kind of a model trained elsewhere, e.g. `kind: trained elsewhere,
 * gated from its predictions (48 stated parameters); checks that need a refit or coefficients
 * are skipped`; null for a model of terms.
 */
export function kindLine(m: ModelResult): string | null {
  if (!isPredictionsModel(m)) return null;
  const count = m.parameters === 0 ? 'no parameter count stated' : `${m.parameters} stated parameters`;
  return `kind: trained elsewhere, gated from its predictions (${count}); checks that need a refit or coefficients are skipped`;
}
