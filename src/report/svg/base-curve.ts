/**
 * The base commit's curve drawn under a model's own curve (fit-curve and partial-curve charts):
 * a dashed grey line, with its legend entry and a sentence for the chart's description.
 */
import type { BaseCurve } from '../../result/chart-types.js';
import { linePath } from './frame.js';
import type { Scale } from './scale.js';

/** Colour of the base commit's curve: mid grey #6e6e6e (reads in greyscale; the dash tells it apart). */
export const BASE_CURVE_COLOUR = '#6e6e6e';

/** Dash pattern of the base commit's curve. */
export const BASE_CURVE_DASH = '5 4';

/** Legend label of the base commit's curve. */
export const BASE_CURVE_LABEL = 'base commit';

/** The dashed path of the base curve (class `base-curve`, `data-commit` the short SHA). */
export function baseCurvePath(base: BaseCurve, sx: Scale, sy: Scale): string {
  return `<path class="base-curve" data-commit="${shortSha(base.commit)}" d="${linePath(base.x, base.y, sx, sy)}" fill="none" stroke="${BASE_CURVE_COLOUR}" stroke-width="1.8" stroke-dasharray="${BASE_CURVE_DASH}" stroke-linejoin="round"/>`;
}

/** The legend entry of the base curve. */
export function baseCurveLegend(): { mark: string; label: string } {
  return {
    mark: `<line x1="0" y1="7" x2="14" y2="7" stroke="${BASE_CURVE_COLOUR}" stroke-width="1.8" stroke-dasharray="${BASE_CURVE_DASH}"/>`,
    label: BASE_CURVE_LABEL,
  };
}

/** One sentence for the chart's description. */
export function baseCurveNote(base: BaseCurve): string {
  return ` The dashed grey line is the same model fitted on the base commit ${shortSha(base.commit)}.`;
}

/** The first 7 hexadecimal digits of a SHA (other characters dropped, so it is safe in markup). */
function shortSha(commit: string): string {
  return commit.replace(/[^0-9a-f]/gi, '').slice(0, 7);
}
