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

// The swing scan (run first) keeps its predictions along an input whose grid is the spike grid;
// swing-spikes then takes them instead of predicting the same points again. Its outcome must be
// the very one computed alone (a fresh context, no swing run first), bit for bit.
describe('swing-spikes after the swing scan', () => {
  const n = 80;
  const a = Array.from({ length: n }, (_, i) => (i * 37) % 101);
  const b = Array.from({ length: n }, (_, i) => 5 + ((i * 13) % 29));
  const target = a.map((v, i) => 3 + 0.2 * v - 0.001 * v * v + 0.5 * b[i] + ((i * 7) % 5) * 0.3);
  const rows = table(['a', 'b', 'y'], [a, b, target]);
  const cases = {
    'one input (polynomial)': [{ kind: 'polynomial', of: 'a', degree: 3, shift: null, scale: null }],
    'two inputs, one term reading both': [{ kind: 'multi-polynomial', of: ['a', 'b'], degree: 2, shift: [0, 0], scale: [1, 1] }],
    'two inputs, a term each': [
      { kind: 'polynomial', of: 'a', degree: 3, shift: null, scale: null },
      { kind: 'linear', columns: ['b'] },
    ],
  } as const;
  for (const [name, terms] of Object.entries(cases)) {
    it(`${name}: the same outcome as computed alone`, () => {
      const d = descriptor({ terms: terms as never, target: 'y', limits: defaultLimits() });
      const alone = runCheck(swingSpikes, buildContext(d, rows, rows)).outcome;
      const context = buildContext(d, rows, rows);
      runCheck(swing, context);
      const shared = context.analyses.swingInsideCurves();
      const after = runCheck(swingSpikes, context).outcome;
      expect(after).toEqual(alone);
      expect(typeof alone.value).toBe('number');
      // Only inputs every term reads are shared: both inputs of the one term, input a alone, none with a term each.
      expect(shared.map((k) => k.input)).toEqual(name.startsWith('one') ? [0] : name.includes('one term') ? [0, 1] : []);
    });
  }
});
