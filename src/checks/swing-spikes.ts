/**
 * `swing-spikes`: spikes inside the band (the curve's total variation between the samples against the targets' own).
 */
import { clip } from '../core/errors.js';
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { jsonRecord } from '../core/json.js';
import { measureSpikes } from '../diagnostics/spikes.js';
import { jsonNumber } from '../result/result.js';

const check: Check = {
  id: 'swing-spikes',
  title: 'Spikes between samples',
  limitKey: 'swing_spikes',
  defaultLimit: { warn: 1.5, fail: 2 },
  direction: 'above',
  limitSummary: "Total variation of the predictions between the training samples divided by the training targets' own total variation.",
  description: `- Default \`{ warn: 1.5, fail: 2 }\` (our own choice, not common practice: a curve through every
  sample scores at least 1; a smooth fit of noisy data far below 1). Points at the line of the term that
  reads the worst input (models of one input), else at \`terms\`. Part of the swing family.
- Why: \`swing\` only sees predictions that leave the band of training targets. Narrow radial bumps over
  an intercept jump to each sample and fall back between them, never leaving the band: \`swing\` passes,
  the curve is still absurd between the samples.
- Figure, for each input with two distinct training values (the other inputs at their training medians,
  as the swing curves): TV_f = sum |f(g_(k+1)) - f(g_k)| over the points \`swing\` scans inside the
  training range, TV_y = sum |ybar_(j+1) - ybar_j| over the input's distinct training values ascending
  (ybar_j the mean target at the j-th value, weighted sum w y / sum w for weighted models; above 20,000 rows an even-stride sample of 20,000; of a
  training file read as a stream, docs/scale.md, its seeded sample of at most 100,000 rows), and
  the ratio TV_f / TV_y; the figure is the largest ratio. Total variation: the sum of absolute
  increments (Jordan 1881). With several inputs TV_y also holds the other inputs' effects, so the
  figure is lenient there.
- Metric \`swing_spikes\`. Detail: \`worst\` (the input) and \`inputs\`:
  \`[{ input, curve_variation, data_variation, ratio }]\`. The swing curves in the \`swing\` outcome show
  the spikes; when the check warns or fails, the HTML charts mark the intervals between neighbouring
  training values where the curve goes up and down more than the limit allows (docs/reports.md).
- A model with \`data.target_transform\` is judged on the scale \`data.limits_scale\` names: on the
  original one (the default) the curve is back-transformed and TV_y is that of the target as written.`,
  advice:
    'Widen or thin the radial centres, lower the degree or the knot count, or add a ridge penalty, so that the curve stops jumping to each sample.',
  line: (d) => d.termsLine,
  measure(context) {
    // A transformed target judged on the original scale: back-transformed curve, targets as written.
    const scale = context.targetScale ?? null;
    const original =
      scale !== null && scale.limitsScale === 'original'
        ? { kind: scale.transform, y: scale.originalRows.train.y, weights: scale.originalRows.train.weights }
        : undefined;
    // The swing check (listed before this one) has predicted the same points: taken, not redone.
    const spikes = measureSpikes(context.design, context.train, context.fit.coefficients, original, context.analyses.swingInsideCurves());
    if (Number.isNaN(spikes.ratio)) {
      return {
        value: null,
        reason: 'not-applicable',
        message: 'no input has two distinct training values with different mean targets, so there is no variation to compare with',
      };
    }
    const worst = spikes.perInput.find((s) => s.input === spikes.worst);
    const term = context.design.terms.find((t) => context.design.inputs.length === 1 && t.inputs.includes(spikes.worst ?? ''));
    return {
      value: spikes.ratio,
      message: `along \`${clip(spikes.worst ?? '')}\` the predictions between the samples vary ${formatNumber(spikes.ratio)} times as much as the training targets (total variation ${formatNumber(worst?.curveVariation)} against ${formatNumber(worst?.dataVariation)})`,
      ...(term ? { line: term.spec.line } : {}),
      metrics: { swing_spikes: jsonNumber(spikes.ratio) },
      detail: jsonRecord({
        worst: spikes.worst,
        inputs: spikes.perInput.map((s) => ({
          input: s.input,
          curve_variation: s.curveVariation,
          data_variation: s.dataVariation,
          ratio: s.ratio,
        })),
      }),
    };
  },
};

export default check;
