import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import swing from '../../src/checks/swing.js';
import swingSpikes from '../../src/checks/swing-spikes.js';
import { buildContext, defaultLimits, descriptor, exampleTable, table } from './context.js';

// The case: narrow radial bumps with an intercept (101 centres 1 apart, width 1) and 26
// training rows spread over 0..100. The curve jumps to each sample and falls back between them.
const x = Array.from({ length: 26 }, (_, i) => i * 4);
const y = x.map((v, i) => 20 + 0.1 * v + 2 * Math.sin(v / 15) + ((i * 7) % 5) * 0.1);
const train = table(['x', 'y'], [x, y]);

describe('swing-spikes (default { warn: 1.5, fail: 2 })', () => {
  it('fails the narrow bumps that swing lets through', () => {
    const d = descriptor({
      terms: [{ kind: 'rbf', of: 'x', centers: { kind: 'step', from: 0, to: 100, step: 1 }, width: 1 }],
      target: 'y',
      limits: defaultLimits(),
    });
    const context = buildContext(d, train, train);
    const inBand = runCheck(swing, context).outcome;
    expect(inBand.status, inBand.message).toBe('pass');
    const { outcome, figures } = runCheck(swingSpikes, context);
    expect(outcome.status, outcome.message).toBe('fail');
    expect(outcome.value as number).toBeGreaterThan(2);
    expect(outcome.line).toBe(10);
    expect(figures?.swing_spikes).toBe(outcome.value);
  });

  it('passes a smooth fit of the same rows', () => {
    const d = descriptor({
      terms: [{ kind: 'spline', of: 'x', knots: { kind: 'count', count: 3 }, degree: 3, natural: true }],
      target: 'y',
      limits: defaultLimits(),
    });
    const { outcome } = runCheck(swingSpikes, buildContext(d, train, train));
    expect(outcome.status, outcome.message).toBe('pass');
    expect(outcome.value as number).toBeLessThan(1.5);
  });

  it('the ratio is the curve variation over the data variation (a straight line through monotone data: 1)', () => {
    const line = table(['x', 'y'], [x, x.map((v) => 3 + 2 * v)]);
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', limits: defaultLimits() });
    const { outcome } = runCheck(swingSpikes, buildContext(d, line, line));
    expect(outcome.value as number).toBeCloseTo(1, 10);
    expect(outcome.detail).toMatchObject({ worst: 'x', inputs: [{ input: 'x', data_variation: 200 }] });
  });

  it('is skipped for a constant input', () => {
    const flat = table(['x', 'z', 'y'], [x.map(() => 1), x, y]);
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', limits: defaultLimits() });
    expect(runCheck(swingSpikes, buildContext(d, flat, flat)).outcome.code).toBe('swing-spikes/not-applicable');
  });

  it('keeps the example sugar curve (degree 3) within its limit', () => {
    const t = exampleTable('sugar-train.csv');
    const d = descriptor({
      terms: [{ kind: 'polynomial', of: t.names[0], degree: 3, shift: null, scale: null }],
      target: t.names[t.names.length - 1],
      limits: defaultLimits(),
    });
    const { outcome } = runCheck(swingSpikes, buildContext(d, t, t));
    expect(outcome.status, outcome.message).toBe('pass');
  });
});
