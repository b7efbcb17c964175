// The classifier complexity sweep (diagnostics/classifier-complexity.ts), whose fold fits start
// after the first Newton step prepared from each setting's fit on all its rows, against the same
// CV log-losses from fold fits made independently from the default start.
import { describe, expect, it } from 'vitest';
import { createDesign, type Design } from '../../src/design/design-matrix.js';
import { createTerm } from '../../src/design/terms/index.js';
import { sweepClassifier } from '../../src/diagnostics/classifier-complexity.js';
import { assignFolds } from '../../src/diagnostics/folds.js';
import { seededRandom } from '../../src/diagnostics/random.js';
import { fitLogistic, outOfFoldDeviance, type LogisticRows } from '../../src/fit/logistic.js';
import { descriptor } from '../checks/context.js';

/** Invented rows: one input, labels drawn from a logistic curve with a bump (seeded). */
function rows(n: number): LogisticRows {
  const random = seededRandom(17);
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    x[i] = 6 * random() - 3;
    const eta = 0.3 + 1.1 * x[i] - 0.8 * Math.sin(2 * x[i]);
    y[i] = random() < 1 / (1 + Math.exp(-eta)) ? 1 : 0;
  }
  return { inputs: [x], y, rows: n };
}

/** The CV log-loss of each fold of one setting, every fold fitted on its own from the default start. */
function independent(design: Design, data: LogisticRows, ridge: number, k: number): number[] {
  const folds = assignFolds(data.rows, k, 'shuffled', 1);
  const fits = fitLogistic(
    design,
    data,
    { ridge, penalised: [...design.penalised] },
    Array.from({ length: k }, (_, f) => ({ foldOf: folds.foldOf, exclude: f })),
  );
  const deviance = outOfFoldDeviance(
    design,
    data,
    folds.foldOf,
    fits.map((x) => x.coefficients),
  );
  return Array.from(deviance, (d, f) => d / 2 / folds.sizes[f]);
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

describe('classifier complexity sweep', () => {
  it('ridge: every setting has the CV log-loss of independent fold fits', () => {
    const data = rows(2500);
    const d = descriptor({ terms: [{ kind: 'polynomial', of: 'x', degree: 4, shift: null, scale: null }], target: 'y', ridge: 2 });
    const design = createDesign([createTerm(d.terms[0], new Map([['x', data.inputs[0]]]), d.file)], true);
    const sweep = sweepClassifier(d, design, data)!;
    expect(sweep.kind).toBe('ridge');
    expect(sweep.points.length).toBe(8);
    for (const point of sweep.points) {
      const expected = mean(independent(design, data, point.value, 5));
      expect(Math.abs(point.cvLogLoss - expected) / expected, `ridge ${point.value}`).toBeLessThan(1e-9);
    }
  });

  it('degree: every setting has the CV log-loss of independent fold fits', () => {
    const data = rows(2000);
    const d = descriptor({ terms: [{ kind: 'polynomial', of: 'x', degree: 3, shift: null, scale: null }], target: 'y' });
    const columns = new Map([['x', data.inputs[0]]]);
    const design = createDesign([createTerm(d.terms[0], columns, d.file)], true);
    const sweep = sweepClassifier(d, design, data)!;
    expect(sweep.kind).toBe('degree');
    expect(sweep.points.map((p) => p.value)).toEqual([1, 2, 3, 4, 5, 6]);
    for (const point of sweep.points) {
      const spec = { ...d.terms[0], degree: point.value } as (typeof d.terms)[0];
      const dg = createDesign([createTerm(spec, columns, d.file)], true);
      const expected = mean(independent(dg, data, 0, 5));
      expect(Math.abs(point.cvLogLoss - expected) / expected, `degree ${point.value}`).toBeLessThan(1e-9);
    }
  });
});

describe('classifier complexity sweep of spline knots and Fourier harmonics', () => {
  const data = rows(1500);
  const columns = new Map([['x', data.inputs[0]]]);
  const cases = [
    {
      kind: 'knots',
      term: { kind: 'spline', of: 'x', knots: { kind: 'count', count: 3 }, degree: 3, natural: false },
      values: [1, 2, 3, 4, 5, 6, 7],
      at: (value: number) => ({ kind: 'spline', of: 'x', knots: { kind: 'count', count: value }, degree: 3, natural: false }),
    },
    {
      kind: 'harmonics',
      term: { kind: 'fourier', of: 'x', period: 6, harmonics: 2 },
      values: [1, 2, 3, 4, 5],
      at: (value: number) => ({ kind: 'fourier', of: 'x', period: 6, harmonics: value }),
    },
  ] as const;
  for (const c of cases) {
    it(`${c.kind}: the settings of the regression sweep, each with the CV log-loss of independent fold fits`, () => {
      const d = descriptor({ terms: [c.term as never], target: 'y' });
      const design = createDesign([createTerm(d.terms[0], columns, d.file)], true);
      const sweep = sweepClassifier(d, design, data)!;
      expect(sweep.kind).toBe(c.kind);
      expect(sweep.points.map((p) => p.value)).toEqual(c.values);
      expect(sweep.points[sweep.current].value).toBe(c.values.find((v) => v === (c.kind === 'knots' ? 3 : 2)));
      for (const point of sweep.points) {
        const spec = { ...c.at(point.value), line: d.terms[0].line } as (typeof d.terms)[0];
        const dg = createDesign([createTerm(spec, columns, d.file)], true);
        const expected = mean(independent(dg, data, 0, 5));
        expect(Number.isFinite(point.cvLogLoss), `${c.kind} ${point.value}`).toBe(true);
        expect(Math.abs(point.cvLogLoss - expected) / expected, `${c.kind} ${point.value}`).toBeLessThan(1e-9);
      }
    });
  }
});
