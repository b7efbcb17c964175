// A term over several inputs is rebuilt from the real inputs wherever the model is evaluated, so
// the swing scan never evaluates an impossible combination (an interaction column varied while
// its parents stay fixed): every scanned prediction equals the fitted polynomial in the scanned
// inputs, computed here independently from the coefficients.
import { describe, expect, it } from 'vitest';
import { measureSwing } from '../../src/diagnostics/swing.js';
import { buildContext, defaultLimits, descriptor, table } from '../checks/context.js';

describe('swing of a model with a temperature x humidity interaction', () => {
  it('every curve point is the polynomial of its own inputs (no fixed interaction column)', () => {
    const n = 60;
    const t = Array.from({ length: n }, (_, i) => 10 + ((i * 7) % 23));
    const h = Array.from({ length: n }, (_, i) => 30 + ((i * 11) % 41));
    const y = t.map((tv, i) => 0.5 * tv + 0.02 * h[i] + 0.01 * tv * h[i] + ((i % 5) - 2) * 0.05);
    const train = table(['t', 'h', 'y'], [t, h, y]);
    const d = descriptor({
      terms: [{ kind: 'multi-polynomial', of: ['t', 'h'], degree: 2, shift: [0, 0], scale: [1, 1] }],
      target: 'y',
      limits: defaultLimits(),
    });
    const context = buildContext(d, train, train);
    expect(context.design.columnNames).toEqual(['(intercept)', 't', 'h', 't^2', 't*h', 'h^2']);
    const b = context.fit.coefficients;
    const model = (tv: number, hv: number): number => b[0] + b[1] * tv + b[2] * hv + b[3] * tv * tv + b[4] * tv * hv + b[5] * hv * hv;
    const swing = measureSwing(context.design, context.train, b);
    expect(swing.curves.map((c) => c.input)).toEqual(['t', 'h']);
    let points = 0;
    for (const curve of swing.curves) {
      curve.x.forEach((x, i) => {
        const tv = curve.input === 't' ? x : curve.others.t;
        const hv = curve.input === 'h' ? x : curve.others.h;
        const expected = model(tv, hv);
        expect(Math.abs(curve.prediction[i] - expected)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
        points++;
      });
    }
    expect(points).toBeGreaterThan(100);
    // The worst points name both real inputs, and their predictions are the polynomial's there.
    for (const worst of [swing.worstInside, swing.worstBeyond]) {
      if (worst === null) continue;
      expect(Object.keys(worst.inputs).sort()).toEqual(['h', 't']);
      expect(Math.abs(worst.prediction - model(worst.inputs.t, worst.inputs.h))).toBeLessThanOrEqual(
        1e-9 * Math.max(1, Math.abs(worst.prediction)),
      );
    }
  });
});
