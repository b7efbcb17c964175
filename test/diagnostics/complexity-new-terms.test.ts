// The complexity sweep covers the new terms' settings: a spline's knot count, a Fourier term's
// harmonics and the degree of a polynomial over several inputs.
import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import complexity from '../../src/checks/complexity.js';
import { buildContext, defaultLimits, descriptor, table } from '../checks/context.js';

const n = 120;
const x = Array.from({ length: n }, (_, i) => ((i * 37) % 120) / 6);
const z = Array.from({ length: n }, (_, i) => ((i * 53) % 97) / 10);
const noise = Array.from({ length: n }, (_, i) => (((i * 7919) % 101) / 101 - 0.5) * 0.2);

describe('complexity sweeps of the new settings', () => {
  it('sweeps a spline knot count, simplest first, and suggests fewer knots for a smooth curve', () => {
    const train = table(['x', 'y'], [x, x.map((v, i) => Math.sin(v / 6) + noise[i])]);
    const d = descriptor({
      terms: [{ kind: 'spline', of: 'x', knots: { kind: 'count', count: 12 }, degree: 3, natural: false }],
      target: 'y',
      limits: defaultLimits(),
    });
    const { outcome } = runCheck(complexity, buildContext(d, train, train));
    const detail = outcome.detail as { setting: string; curve: { setting: number; current: boolean }[]; chosen: number };
    expect(detail.setting).toBe('knots');
    expect(detail.curve.map((c) => c.setting)).toEqual(Array.from({ length: 16 }, (_, i) => i + 1));
    expect(detail.curve.find((c) => c.current)?.setting).toBe(12);
    expect(detail.curve[detail.chosen].setting).toBeLessThan(12);
    expect(outcome.line).toBe(10);
  });

  it('sweeps Fourier harmonics', () => {
    const train = table(['x', 'y'], [x, x.map((v, i) => Math.sin((2 * Math.PI * v) / 7) + noise[i])]);
    const d = descriptor({ terms: [{ kind: 'fourier', of: 'x', period: 7, harmonics: 4 }], target: 'y', limits: defaultLimits() });
    const { outcome } = runCheck(complexity, buildContext(d, train, train));
    const detail = outcome.detail as { setting: string; curve: { setting: number; label: string }[]; chosen: number };
    expect(detail.setting).toBe('harmonics');
    expect(detail.curve.map((c) => c.setting)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    // One harmonic is the true curve: the one-standard-error rule picks it.
    expect(detail.curve[detail.chosen].label).toBe('harmonics 1');
  });

  it('sweeps the degree of a polynomial over two inputs', () => {
    const train = table(['x', 'z', 'y'], [x, z, x.map((v, i) => v * z[i] * 0.1 + noise[i])]);
    const d = descriptor({
      terms: [{ kind: 'multi-polynomial', of: ['x', 'z'], degree: 4, shift: [null, null], scale: [null, null] }],
      target: 'y',
      limits: defaultLimits(),
    });
    const { outcome } = runCheck(complexity, buildContext(d, train, train));
    const detail = outcome.detail as { setting: string; curve: { setting: number; parameters: number }[]; chosen: number };
    expect(detail.setting).toBe('degree');
    expect(detail.curve.map((c) => c.parameters)).toEqual([3, 6, 10, 15, 21, 28, 36]);
    expect(detail.curve[detail.chosen].setting).toBe(2);
  });
});
