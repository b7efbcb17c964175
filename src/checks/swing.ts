/**
 * `swing`: how far predictions between the training samples leave the band of training targets.
 */
import { clip } from '../core/errors.js';
import type { Check, CheckContext } from './types.js';
import { formatNumber } from '../core/format.js';
import { jsonNumber } from '../result/result.js';
import { jsonRecord } from '../core/json.js';
import type { Swing, SwingPoint } from '../diagnostics/swing.js';
import { predictionsSwing } from './predictions/measures.js';

/**
 * Describes a point's inputs for a message, e.g. `depth_m = 5.1`; a category input by its level
 * (`site = "west"`), not by the code the scan gives it.
 */
export function describePoint(point: SwingPoint | null, context: CheckContext): string {
  if (point === null) return '';
  return Object.entries(point.inputs)
    .map(([name, v]) => {
      const levels = context.design.terms.find((t) => t.levels !== undefined && t.inputs[0] === name)?.levels;
      const level = levels?.[v];
      return `${clip(name)} = ${level !== undefined ? JSON.stringify(level.slice(0, 80)) : formatNumber(v)}`;
    })
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
  defaultLimit: { warn: 0.25, fail: 0.5 },
  direction: 'above',
  limitSummary:
    'How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths.',
  description: `- Default \`{ warn: 0.25, fail: 0.5 }\`. Points at the line of the term that reads
  the input where the largest excursion happened (models of one input), else at \`terms\`.
- Figure: how far the predictions between the training samples leave the band [min y, max y] of the
  training targets, in band widths: max(0, max(pred) - max y, min y - min(pred)) / (max y - min y).
  0 when every prediction stays in the band.
- Points scanned, one input: 201 evenly spaced points from the smallest to the largest training value
  plus 8 evenly spaced points inside every gap between neighbouring distinct values (the 4,000
  widest gaps when there are more; above 20,000 training rows the gaps are those of 20,000 rows
  at an even stride through the file plus the input's smallest and largest value, since the gaps
  of big files are far narrower than any swing). Several inputs: the same grid along each input with the other
  inputs at their training medians (the 4,000 gaps shared evenly: the widest ceil(4,000 /
  inputs) gaps of each input), plus 8 points on each segment between a training row and each of
  its 3 nearest neighbours (Euclidean distance on the inputs divided by their standard deviations;
  at most 1,000 rows, taken at an even stride through the file). A training file read as a stream
  (docs/scale.md) is scanned on its seeded sample of at most 100,000 rows (then thinned as above).
- Why: a model that interpolates its samples with a high-degree polynomial or narrow radial bumps
  can pass through every sample and still predict absurd values between them (Runge's phenomenon,
  Runge 1901, Zeitschrift für Mathematik und Physik 46).
- Metric \`swing\`. Detail (for charts): \`band: [min y, max y]\`, \`inside\`, \`beyond\`, \`margin\` (0.1),
  \`points: { inside, beyond }\` (counts), \`worst_inside\` and \`worst_beyond\`
  (\`{ inputs: { <input>: value }, prediction }\` or null), \`segments\` (\`{ rows, neighbours,
  pointsPerSegment }\` or null for one input) and \`curves\`: one per input with a spread,
  \`{ input, others: { <input>: median }, range: [min x, max x], x: number[], prediction: number[] }\`,
  x ascending over the range and both margins, at most 400 points (thinned evenly, always keeping the
  largest and smallest prediction; in a run of over 50 models, 400 x 50 / models, at least 25: see
  reports.md).`,
  advice:
    'Lower the degree, widen or thin the radial centres, or add a ridge penalty so that the curve stops swinging between the samples.',
  line: (d) => d.termsLine,
  measurePredictions: predictionsSwing,
  measure(context) {
    const swing = context.analyses.swing();
    if (Number.isNaN(swing.inside)) {
      return {
        value: null,
        reason: 'not-applicable',
        message: 'no input has two distinct training values, so there is nothing between samples to scan',
        detail: swingDetail(swing),
      };
    }
    const where = describePoint(swing.worstInside, context);
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
