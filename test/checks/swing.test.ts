import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import swing from '../../src/checks/swing.js';
import swingBeyond from '../../src/checks/swing-beyond.js';
import type { TermWithoutLine } from './context.js';
import { buildContext, defaultLimits, descriptor, exampleTable } from './context.js';

const poly = (of: string, degree: number): TermWithoutLine => ({ kind: 'polynomial', of, degree, shift: null, scale: null });

function run(file: string, target: string, term: TermWithoutLine) {
  const d = descriptor({ terms: [term], target, limits: defaultLimits({ swing_beyond: { fail: 1 } }) });
  const context = buildContext(d, exampleTable(`${file}-train.csv`), exampleTable(`${file}-holdout.csv`));
  return { swing: runCheck(swing, context).outcome, beyond: runCheck(swingBeyond, context).outcome };
}

describe('swing check on the example data (default limit warn 0.25, fail 0.5)', () => {
  it('fails the degree-9 polynomial through the 10 irregular tank readings and passes a quadratic on them', () => {
    const wild = run('tank', 'temp_c', poly('hours', 9));
    expect(wild.swing.status, wild.swing.message).toBe('fail');
    const calm = run('tank', 'temp_c', poly('hours', 2));
    expect(calm.swing.status, calm.swing.message).toBe('pass');
  });

  it('fails the many narrow radial bumps of sugar-curve and passes a quadratic on the same data', () => {
    const bumps = run('sugar', 'brix', { kind: 'rbf', of: 'day', centers: { kind: 'count', from: 0, to: 14, count: 30 }, width: 0.15 });
    expect(bumps.swing.status, bumps.swing.message).toBe('fail');
    expect(bumps.swing.line).toBe(10);
    const calm = run('sugar', 'brix', poly('day', 2));
    expect(calm.swing.status, calm.swing.message).toBe('pass');
  });

  it('cellar-temperature: the degree-9 interpolant stays near the band between readings but leaves it far in the 10 % margin; a quadratic does neither', () => {
    const wild = run('cellar', 'temp_c', poly('depth_m', 9));
    expect(wild.beyond.status, wild.beyond.message).toBe('fail');
    const calm = run('cellar', 'temp_c', poly('depth_m', 2));
    expect(calm.swing.status, calm.swing.message).toBe('pass');
    expect(calm.beyond.status, calm.beyond.message).toBe('pass');
  });

  it('keeps chart data: the band and one curve of at most 400 points per input, with the worst point', () => {
    const { swing: outcome } = run('sugar', 'brix', {
      kind: 'rbf',
      of: 'day',
      centers: { kind: 'count', from: 0, to: 14, count: 30 },
      width: 0.15,
    });
    const detail = outcome.detail as {
      band: number[];
      curves: { input: string; x: number[]; prediction: number[] }[];
      worst_inside: { prediction: number };
    };
    expect(detail.band.length).toBe(2);
    expect(detail.curves.map((c) => c.input)).toEqual(['day']);
    expect(detail.curves[0].x.length).toBe(detail.curves[0].prediction.length);
    expect(detail.curves[0].x.length).toBeLessThanOrEqual(400);
    // The thinned curve keeps the extreme prediction.
    expect(Math.min(...detail.curves[0].prediction)).toBe(detail.worst_inside.prediction);
  });
});
