/**
 * How the reporters show a model fitted on a transformed target (`target_scale` of the Result):
 * one table of its error figures on both scales, rows `original` and `transformed`, the scale the
 * limits judged marked. Plain text only (the transform names are fixed words, numbers are
 * formatted), so each reporter escapes nothing of the user's here.
 */
import { formatNumber } from '../core/format.js';
import { fromJsonNumber, type JsonNumber, type ModelResult, type TargetScaleFigures } from '../result/result.js';

/** Column headings of the table, in order. */
export const TARGET_SCALE_HEADINGS = [
  'Scale',
  'Training RMSE',
  'Hold-out RMSE',
  'Hold-out MAE',
  'Hold-out R^2',
  'Gap ratio',
  'CV RMSE',
] as const;

function show(v: JsonNumber | null | undefined): string {
  return v === null || v === undefined ? '–' : formatNumber(fromJsonNumber(v));
}

/** The function g of each transform, for captions. */
const FORMULA: Record<'log' | 'log1p' | 'sqrt', string> = { log: 'log(y)', log1p: 'log(1 + y)', sqrt: 'sqrt(y)' };

/**
 * One sentence on the transform: what the model is fitted on, what the original-scale predictions
 * are and which scale the limits judge; null for a model without a transform.
 */
export function targetScaleSentence(m: ModelResult): string | null {
  const t = m.target_scale;
  if (t === undefined) return null;
  const back = t.transform === 'log' ? 'exp' : t.transform === 'log1p' ? 'expm1' : 'square';
  return `Fitted on ${FORMULA[t.transform]}; original-scale figures compare y with the back-transformed predictions (${back}, a median of y, not its mean); the limits judge the ${t.limits_scale} scale`;
}

/**
 * The table's rows (cells as text, headings excluded): `original` then `transformed`, the judged
 * scale marked `(limits)`; empty for a model without a transform.
 */
export function targetScaleRows(m: ModelResult): string[][] {
  const t = m.target_scale;
  if (t === undefined) return [];
  const row = (name: 'original' | 'transformed', f: TargetScaleFigures): string[] => [
    `${name}${t.limits_scale === name ? ' (limits)' : ''}`,
    show(f.train_rmse),
    show(f.holdout_rmse),
    show(f.holdout_mae),
    show(f.holdout_r2),
    show(f.gap_ratio),
    show(f.cv_rmse),
  ];
  return [row('original', t.original), row('transformed', t.transformed)];
}
