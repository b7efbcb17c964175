/**
 * `events-per-parameter`: rows of the smaller class per fitted parameter (classifiers).
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { predictionsEventsPerParameter } from './predictions/measures.js';

const check: Check = {
  id: 'events-per-parameter',
  title: 'Events per parameter',
  limitKey: 'events_per_parameter',
  defaultLimit: 10,
  direction: 'below',
  limitSummary: 'Training rows of the smaller class divided by the fitted parameters (classifiers); fails below the limit.',
  description: `- Default \`10\` (a floor: the check fails when the figure is below it). Classifiers only. Points at the \`terms\` line.
- Figure: min(positives, negatives in the training rows) / p, p the design's columns. A logistic model
  with fewer than about ten events of the rarer class per parameter gives biased coefficients and
  over-confident probabilities (Peduzzi, Concato, Kemper, Holford & Feinstein 1996, "A simulation study
  of the number of events per variable in logistic regression analysis", Journal of Clinical
  Epidemiology 49(12)). The default 10 is common practice after that study, not a law.`,
  advice: 'Use fewer terms or a lower degree, or collect more rows of the rarer class.',
  line: (d) => d.termsLine,
  tasks: ['classification'],
  measurePredictions: predictionsEventsPerParameter,
  measure: () => ({ value: null, reason: 'not-for-regression', message: 'applies to classifiers only' }),
  measureClassifier({ train, design }) {
    const events = Math.min(train.positives, train.negatives);
    const value = events / design.p;
    return {
      value,
      message: `${events} training rows of the smaller class (${train.positives} positive, ${train.negatives} negative) for ${design.p} parameters: ${formatNumber(value)} per parameter`,
      metrics: { events_per_parameter: value },
    };
  },
};

export default check;
