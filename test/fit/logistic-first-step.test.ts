// The folds' first Newton steps prepared from the full fit's per-fold factors
// (fit/logistic.ts, LogisticProblem.parts and firstStepsWithout): the same optimum as folds
// started from the full fit's coefficients, in one Newton pass fewer, with shuffled and
// contiguous folds, and the full fit itself unchanged by keeping the parts.
import { describe, expect, it } from 'vitest';
import { createDesign } from '../../src/design/design-matrix.js';
import { createTerm } from '../../src/design/terms/index.js';
import { assignFolds } from '../../src/diagnostics/folds.js';
import { firstStepsWithout, fitLogistic, type LogisticRows } from '../../src/fit/logistic.js';
import { seededRandom } from '../../src/diagnostics/random.js';

/** Invented rows: two inputs, labels drawn from a smooth logistic curve of them (seeded). */
function rows(n: number, seed: number): LogisticRows {
  const random = seededRandom(seed);
  const u = new Float64Array(n);
  const v = new Float64Array(n);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    u[i] = 4 * random() - 2;
    v[i] = 3 * random();
    const eta = -0.4 + 1.3 * u[i] - 0.6 * v[i] + 0.5 * u[i] * u[i];
    y[i] = random() < 1 / (1 + Math.exp(-eta)) ? 1 : 0;
  }
  return { inputs: [u, v], y, rows: n };
}

function designOf(data: LogisticRows) {
  const training = new Map([
    ['u', data.inputs[0]],
    ['v', data.inputs[1]],
  ]);
  return createDesign(
    [
      createTerm({ kind: 'polynomial', of: 'u', degree: 3, shift: null, scale: null, line: 2 }, training, 'm'),
      createTerm({ kind: 'linear', columns: ['v'], line: 3 }, training, 'm'),
    ],
    true,
  );
}

const relative = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-300);

describe('folds started from the prepared first steps', () => {
  for (const order of ['shuffled', 'blocks'] as const) {
    it(`reach the same optimum as folds started from the full fit, one pass sooner (${order} folds)`, () => {
      const data = rows(3000, 7);
      const design = designOf(data);
      const options = { ridge: 0.5, penalised: [...design.penalised] };
      const folds = assignFolds(data.rows, 5, order, 3);
      const [plain] = fitLogistic(design, data, options, [{}]);
      const [full] = fitLogistic(design, data, options, [{ parts: { of: folds.foldOf, count: folds.k } }]);
      // Keeping the parts changes only the rounding of the full fit (its factor is their merge).
      for (let j = 0; j < design.p; j++) expect(relative(full.coefficients[j], plain.coefficients[j])).toBeLessThan(1e-12);
      expect(relative(full.deviance, plain.deviance)).toBeLessThan(1e-12);
      expect(full.parts?.grams.length).toBe(5);
      let rowsInParts = 0;
      for (const r of full.parts!.rows) rowsInParts += r;
      expect(rowsInParts).toBe(data.rows);

      // Passes over the rows, counted by the design's block fills (3,000 rows: one block a pass).
      let fills = 0;
      const counted = {
        ...design,
        fill: (...a: Parameters<typeof design.fill>) => {
          fills++;
          return design.fill(...a);
        },
      };
      const fromFull = fitLogistic(
        counted,
        data,
        options,
        Array.from({ length: 5 }, (_, f) => ({ foldOf: folds.foldOf, exclude: f, start: full.coefficients })),
      );
      const steps = firstStepsWithout(full.parts!, options);
      const passesFromFull = fills;
      fills = 0;
      const prepared = fitLogistic(
        counted,
        data,
        options,
        steps.map((firstStep, f) => ({ foldOf: folds.foldOf, exclude: f, firstStep })),
      );
      for (let f = 0; f < 5; f++) {
        expect(prepared[f].converged).toBe(true);
        expect(prepared[f].rows).toBe(data.rows - folds.sizes[f]);
        for (let j = 0; j < design.p; j++) expect(relative(prepared[f].coefficients[j], fromFull[f].coefficients[j])).toBeLessThan(1e-9);
        expect(relative(prepared[f].objective, fromFull[f].objective)).toBeLessThan(1e-12);
        // The prepared step counts as the first Newton step: same number of steps, no pass spent on it.
        expect(prepared[f].iterations).toBe(fromFull[f].iterations);
      }
      expect(fills).toBe(passesFromFull - 1);
    });
  }

  it('a prepared step is the Newton step a pass over the fold rows at the same coefficients gives', () => {
    const data = rows(1200, 11);
    const design = designOf(data);
    const options = { ridge: 2, penalised: [...design.penalised], maxIterations: 1 };
    const folds = assignFolds(data.rows, 4, 'shuffled', 5);
    // One Newton step from the default start: the parts are taken at that start.
    const [full] = fitLogistic(design, data, options, [{ parts: { of: folds.foldOf, count: folds.k } }]);
    const at = full.parts!.at;
    const steps = firstStepsWithout(full.parts!, options);
    // One pass of the fold problem from `at` solves the same step (maxIterations 1: it stops there).
    const direct = fitLogistic(
      design,
      data,
      options,
      Array.from({ length: 4 }, (_, f) => ({ foldOf: folds.foldOf, exclude: f, start: at })),
    );
    const viaParts = fitLogistic(
      design,
      data,
      { ...options, maxIterations: 1 },
      steps.map((firstStep, f) => ({ foldOf: folds.foldOf, exclude: f, firstStep })),
    );
    // The fold deviance at `at` (no Newton step: maxIterations 0 stops after the first pass).
    const atStart = fitLogistic(
      design,
      data,
      { ...options, maxIterations: 0 },
      Array.from({ length: 4 }, (_, f) => ({ foldOf: folds.foldOf, exclude: f, start: at })),
    );
    for (let f = 0; f < 4; f++) {
      expect(relative(steps[f].deviance, atStart[f].deviance)).toBeLessThan(1e-12);
      expect(relative(viaParts[f].deviance, direct[f].deviance)).toBeLessThan(1e-10);
      for (let j = 0; j < design.p; j++) expect(relative(viaParts[f].coefficients[j], direct[f].coefficients[j])).toBeLessThan(1e-10);
    }
  });
});
