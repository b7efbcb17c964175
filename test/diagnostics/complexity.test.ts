import { describe, expect, it } from 'vitest';
import { oneStandardErrorRule, sweepComplexity } from '../../src/diagnostics/complexity.js';
import { createTerm } from '../../src/design/terms/index.js';
import { createDesign } from '../../src/design/design-matrix.js';
import { descriptor } from '../checks/context.js';
import { fitRows, predictRow, relDiff, selectRows } from './helpers.js';
import { assignFolds } from '../../src/diagnostics/folds.js';
import { complementFactors, foldFactors, summariseFolds } from '../../src/diagnostics/cross-validation.js';
import { seededRandom } from '../../src/diagnostics/random.js';

describe('one-standard-error rule (Hastie, Tibshirani & Friedman, ESL 2nd ed. section 7.10)', () => {
  it('picks the simplest setting within one standard error of the minimum, on a hand-made curve', () => {
    // Minimum 1.0 at index 4 with se 0.3: threshold 1.3; index 2 (1.25) is the first at or below it.
    const curve = [5, 2, 1.25, 1.1, 1.0, 1.05, 1.4].map((mean) => ({ mean, se: 0.3 }));
    expect(oneStandardErrorRule(curve)).toEqual({ best: 4, chosen: 2 });
  });

  it('uses the standard error of the minimum, not of the candidate', () => {
    const curve = [
      { mean: 1.5, se: 10 },
      { mean: 1.0, se: 0.1 },
    ];
    expect(oneStandardErrorRule(curve).chosen).toBe(1);
  });

  it('ignores non-finite means and treats a NaN standard error as 0', () => {
    expect(
      oneStandardErrorRule([
        { mean: Number.NaN, se: 0 },
        { mean: 2, se: Number.NaN },
        { mean: 3, se: 0 },
      ]),
    ).toEqual({ best: 1, chosen: 1 });
    expect(oneStandardErrorRule([{ mean: Infinity, se: 0 }])).toEqual({ best: -1, chosen: -1 });
  });
});

describe('sweep of the polynomial degree', () => {
  it('suggests degree 3 for a cubic with little noise fitted at degree 9 (known by construction)', () => {
    const u = seededRandom(4);
    const n = 200;
    const x = Float64Array.from({ length: n }, () => 4 * u() - 2);
    const y = Float64Array.from(x, (v) => 1 + v - 2 * v ** 2 + v ** 3 + 0.05 * (u() - 0.5));
    const d = descriptor({ terms: [{ kind: 'polynomial', of: 'x', degree: 9, shift: null, scale: null }], target: 'y', folds: 5 });
    const design = createDesign([createTerm(d.terms[0], new Map([['x', x]]), d.file)], true);
    const rows = { inputs: [x], y, rows: n };
    const sweep = sweepComplexity(d, design, rows, fitRows(design, rows));
    expect(sweep?.kind).toBe('degree');
    expect(sweep?.curve.map((c) => c.setting)).toEqual(Array.from({ length: 12 }, (_, i) => i + 1));
    expect(sweep?.curve[sweep.chosen].label).toBe('degree 3');
    expect(sweep?.curve[sweep.current].setting).toBe(9);
    expect(sweep?.line).toBe(10);
  });

  it('subsamples deterministically above the row cap and says so', () => {
    const n = 300;
    const x = Float64Array.from({ length: n }, (_, i) => i / n);
    const y = Float64Array.from(x, (v) => v * v);
    const d = descriptor({ terms: [{ kind: 'polynomial', of: 'x', degree: 2, shift: null, scale: null }], target: 'y' });
    const design = createDesign([createTerm(d.terms[0], new Map([['x', x]]), d.file)], true);
    const rows = { inputs: [x], y, rows: n };
    const sweep = sweepComplexity(d, design, rows, fitRows(design, rows), { maxRows: 100 });
    expect(sweep?.subsampled).toBe(true);
    expect(sweep?.rows).toBe(100);
  });
});

describe('sweep of the ridge penalty', () => {
  it('puts the largest penalty first, includes the current one and points at fit.ridge', () => {
    const u = seededRandom(8);
    const n = 80;
    const cols = Array.from({ length: 6 }, () => Float64Array.from({ length: n }, () => u()));
    const y = Float64Array.from({ length: n }, (_, i) => cols[0][i] + 0.5 * (u() - 0.5));
    const names = cols.map((_, j) => `x${j}`);
    const d = descriptor({ terms: [{ kind: 'linear', columns: names }], target: 'y', ridge: 0.5 });
    const design = createDesign([createTerm(d.terms[0], new Map(names.map((nm, j) => [nm, cols[j]])), d.file)], true);
    const rows = { inputs: cols, y, rows: n };
    const sweep = sweepComplexity(d, design, rows, fitRows(design, rows, 0.5));
    expect(sweep?.kind).toBe('ridge');
    expect(sweep?.line).toBe(21);
    const settings = sweep?.curve.map((c) => c.setting) ?? [];
    for (let i = 1; i < settings.length; i++) expect(settings[i]).toBeLessThan(settings[i - 1]);
    expect(sweep?.curve[sweep.current].setting).toBe(0.5);
    expect(sweep?.curve.length).toBe(20);
  });

  it("takes the caller's folds with its fold factors only when they are the model's own folds", () => {
    const u = seededRandom(9);
    const n = 61;
    const x = Float64Array.from({ length: n }, () => u());
    const y = Float64Array.from({ length: n }, (_, i) => x[i] + 0.3 * (u() - 0.5));
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', ridge: 0.2 });
    const design = createDesign([createTerm(d.terms[0], new Map([['x', x]]), d.file)], true);
    const rows = { inputs: [x], y, rows: n };
    const fit = fitRows(design, rows, 0.2);
    const own = assignFolds(n, d.fit.folds, d.fit.foldOrder, d.fit.seed);
    const factors = () => {
      const perFold = foldFactors(design, rows, own);
      return { perFold, complements: complementFactors(perFold) };
    };
    const plain = sweepComplexity(d, design, rows, fit, { factors });
    let asked = 0;
    const given = sweepComplexity(d, design, rows, fit, {
      factors,
      folds: () => {
        asked++;
        return own;
      },
    });
    expect(asked).toBe(1);
    expect(given).toEqual(plain);
    // Folds of other settings (here of fewer rows) are not taken: the sweep assigns its own.
    const other = assignFolds(n - 1, d.fit.folds, d.fit.foldOrder, d.fit.seed);
    expect(sweepComplexity(d, design, rows, fit, { factors, folds: () => other })).toEqual(plain);
  });

  it('scores every lambda like brute-force refits on each fold complement, on every row (no subsample)', () => {
    const u = seededRandom(12);
    const n = 120;
    const x = Float64Array.from({ length: n }, () => 2 * u() - 1);
    const y = Float64Array.from(x, (v) => Math.sin(3 * v) + 0.2 * (u() - 0.5));
    const d = descriptor({ terms: [{ kind: 'polynomial', of: 'x', degree: 6, shift: null, scale: null }], target: 'y', ridge: 0.3 });
    const design = createDesign([createTerm(d.terms[0], new Map([['x', x]]), d.file)], true);
    const rows = { inputs: [x], y, rows: n };
    const sweep = sweepComplexity(d, design, rows, fitRows(design, rows, 0.3), { maxRows: 50 });
    expect(sweep?.subsampled).toBe(false);
    expect(sweep?.rows).toBe(n);
    const folds = assignFolds(n, d.fit.folds, d.fit.foldOrder, d.fit.seed);
    for (const point of sweep?.curve ?? []) {
      const sse = new Array<number>(folds.k).fill(0);
      for (let f = 0; f < folds.k; f++) {
        const rest = selectRows(rows, (i) => folds.foldOf[i] !== f);
        const w = fitRows(design, rest, point.setting).coefficients;
        for (let i = 0; i < n; i++) if (folds.foldOf[i] === f) sse[f] += (y[i] - predictRow(design, rows, i, w)) ** 2;
      }
      const expected = summariseFolds(sse, folds.sizes);
      expect(relDiff(point.cvRmse, expected.cvRmse), `${point.label}: ${point.cvRmse} vs ${expected.cvRmse}`).toBeLessThan(1e-10);
      expect(relDiff(point.meanMse, expected.meanMse)).toBeLessThan(1e-10);
    }
  });
});
