/**
 * `swing`: how far predictions between the training samples leave the band of training targets.
 */
import { clip } from '../errors.js';
import type { Check, CheckContext } from './types.js';
import { formatNumber } from '../format.js';
import { jsonNumber } from '../result.js';
import { jsonRecord } from '../diagnostics/json.js';
import { sharedSwing } from '../diagnostics/shared.js';
import type { Swing, SwingPoint } from '../diagnostics/swing.js';

/** Describes a point's inputs for a message, e.g. `depth_m = 5.1`. */
export function describePoint(point: SwingPoint | null): string {
  if (point === null) return '';
  return Object.entries(point.inputs)
    .map(([name, v]) => `${clip(name)} = ${formatNumber(v)}`)
    .join(', ');
}

/** The chart data every swing outcome carries (see the README for its shape). */
export function swingDetail(swing: Swing): Record<string, unknown> {
  return jsonRecord({
    band: swing.band,
    inside: swing.inside,
    beyond: swing.beyond,
    margin: swing.margin,
    points: swing.points,
    worst_inside: swing.worstInside,
    worst_beyond: swing.worstBeyond,
    segments: swing.segments,
    curves: swing.curves,
  });
}

/** Line of the first term that reads this input, else the terms line. */
export function inputLine(context: CheckContext, point: SwingPoint | null): number | undefined {
  if (point === null) return undefined;
  const names = Object.keys(point.inputs);
  const term = context.design.terms.find((t) => t.inputs.some((c) => names.length === 1 && c === names[0]));
  return term?.spec.line;
}

const check: Check = {
  id: 'swing',
  title: 'Swing between samples',
  limitKey: 'swing',
  description:
    'How far the predictions between the training samples leave the band [min y, max y] of the training targets, in units of the band width: max(0, max(pred) - max y, min y - min(pred)) / (max y - min y) over a dense grid. One input: 201 evenly spaced points across the training range plus 8 points inside every gap between neighbouring distinct values (the widest 4,000 gaps when there are more; above 20,000 rows the gaps of 20,000 rows at an even stride plus the extremes). Several inputs: the same grid along each input with the others at their training medians (the 4,000 gaps shared evenly: the widest ceil(4,000 / inputs) gaps of each input), plus 8 points on each segment between a training row and its 3 nearest neighbours (Euclidean distance on inputs divided by their standard deviations; at most 1,000 rows, an even stride through the file). A model that interpolates its samples with a high-degree polynomial or narrow radial bumps swings far outside the band between them (Runge phenomenon: Runge 1901, Zeitschrift für Mathematik und Physik 46). 0 when every prediction stays inside the band.',
  advice: 'Lower the degree, widen or thin the radial centres, or add a ridge penalty so that the curve stops swinging between the samples.',
  line: (d) => d.termsLine,
  measure(context) {
    const swing = sharedSwing(context);
    if (Number.isNaN(swing.inside)) {
      return { value: null, reason: 'not-applicable', message: 'no input has two distinct training values, so there is nothing between samples to scan', detail: swingDetail(swing) };
    }
    const where = describePoint(swing.worstInside);
    return {
      value: swing.inside,
      message:
        swing.inside > 0
          ? `between the samples the predictions leave the training target band [${formatNumber(swing.band[0])}, ${formatNumber(swing.band[1])}] by ${formatNumber(swing.inside)} band widths (prediction ${formatNumber(swing.worstInside?.prediction)} at ${where}; ${swing.points.inside} points scanned)`
          : `the predictions stay inside the training target band [${formatNumber(swing.band[0])}, ${formatNumber(swing.band[1])}] at ${swing.points.inside} points between the samples`,
      line: inputLine(context, swing.worstInside),
      metrics: { swing: jsonNumber(swing.inside) },
      detail: swingDetail(swing),
    };
  },
};

export default check;
