/**
 * `swing-beyond`: how far predictions just past the training range leave the band of training targets.
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { jsonNumber } from '../result/result.js';
import { describePoint, inputLine } from './swing.js';

const check: Check = {
  id: 'swing-beyond',
  title: 'Swing beyond the samples',
  limitKey: 'swing_beyond',
  defaultLimit: { warn: 1 },
  direction: 'above',
  limitSummary: 'Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation).',
  description: `- Default \`{ warn: 1 }\`. Points like \`swing\`.
- Figure: the \`swing\` figure over the margins outside the training range: 40 evenly spaced points on
  each side of each input, up to 10 % of its range beyond the smallest and the largest training value
  (other inputs at their medians). Reported apart from \`swing\` because some extrapolation error is
  expected of any model. Metric \`swing_beyond\`; detail \`margin\`, \`points\`, \`worst\`. The chart curves
  are in the \`swing\` outcome (they include the margins).`,
  advice:
    'Do not use the model outside its training range, or choose terms that level off (fewer polynomial powers, radial terms) so that it extrapolates calmly.',
  line: (d) => d.termsLine,
  measure(context) {
    const swing = context.analyses.swing();
    if (Number.isNaN(swing.beyond)) {
      return {
        value: null,
        reason: 'not-applicable',
        message: 'no input has two distinct training values, so there is no range to step beyond',
      };
    }
    const where = describePoint(swing.worstBeyond, context);
    return {
      value: swing.beyond,
      message:
        swing.beyond > 0
          ? `within ${formatNumber(swing.margin * 100)} % of the range beyond the samples the predictions leave the training target band [${formatNumber(swing.band[0])}, ${formatNumber(swing.band[1])}] by ${formatNumber(swing.beyond)} band widths (prediction ${formatNumber(swing.worstBeyond?.prediction)} at ${where})`
          : `within ${formatNumber(swing.margin * 100)} % of the range beyond the samples the predictions stay inside the training target band`,
      line: inputLine(context, swing.worstBeyond),
      metrics: { swing_beyond: jsonNumber(swing.beyond) },
      detail: {
        margin: swing.margin,
        points: swing.points.beyond,
        worst:
          swing.worstBeyond === null ? null : { inputs: swing.worstBeyond.inputs, prediction: jsonNumber(swing.worstBeyond.prediction) },
      },
    };
  },
};

export default check;
