// Newton steps from the weighted Gram (fit/gram-step.ts) against the QR engine's step, the
// condition bound that sends ill-conditioned problems to the QR engine, and the Gram passes of
// fitLogistic reaching the optimum where the gradient vanishes.
import { describe, expect, it } from 'vitest';
import { createDesign } from '../../src/design/design-matrix.js';
import { createTerm } from '../../src/design/terms/index.js';
import { seededRandom } from '../../src/diagnostics/random.js';
import { GRAM_MAX_CONDITION, gramSize, gramStep } from '../../src/fit/gram-step.js';
import { solveCoefficients } from '../../src/fit/index.js';
import { fitLogistic, type LogisticRows } from '../../src/fit/logistic.js';
import { QrAccumulator } from '../../src/fit/qr-accumulator.js';

/** Column-major n x p design, first column ones, and labels from a logistic curve (seeded). */
function problem(n: number, p: number, seed: number, near = 0) {
  const random = seededRandom(seed);
  const X = new Float64Array(n * p);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    X[i] = 1;
    for (let j = 1; j < p; j++) X[j * n + i] = 2 * random() - 1;
    // `near` > 0: the last column nearly repeats the one before it.
    if (near > 0) X[(p - 1) * n + i] = X[(p - 2) * n + i] + near * (2 * random() - 1);
    let eta = 0.3;
    for (let j = 1; j < p; j++) eta += (j % 2 ? 0.8 : -0.5) * X[j * n + i];
    y[i] = random() < 1 / (1 + Math.exp(-eta)) ? 1 : 0;
  }
  return { X, y };
}

/** The extended Gram of [sqrt(W) X | (y - p) / sqrt(W)] and the QR factor of sqrt(W) [X | z] at w, summed plainly. */
function atCoefficients(X: Float64Array, y: Float64Array, n: number, p: number, w: Float64Array) {
  const q = gramSize(p);
  const G = new Float64Array(q * q);
  const rows = new Float64Array(n * p);
  const target = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let eta = 0;
    for (let j = 0; j < p; j++) eta += X[j * n + i] * w[j];
    const pr = 1 / (1 + Math.exp(-eta));
    const s = Math.sqrt(pr * (1 - pr));
    const u = (y[i] - pr) / s;
    const ext = new Float64Array(q);
    for (let j = 0; j < p; j++) ext[j] = s * X[j * n + i];
    ext[p] = u;
    for (let k = 0; k < q; k++) for (let j = 0; j <= k; j++) G[k * q + j] += ext[j] * ext[k];
    for (let j = 0; j < p; j++) rows[j * n + i] = ext[j];
    target[i] = s * eta + u;
  }
  const acc = new QrAccumulator(p);
  acc.addRows(rows, target, n);
  return { G, acc };
}

const relative = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-300);

describe('Gram steps', () => {
  it('solve the Newton step the QR engine solves, within 1e-10 relative, on a well-conditioned design', () => {
    const n = 2000;
    const p = 6;
    const { X, y } = problem(n, p, 3);
    const w = Float64Array.from({ length: p }, (_, j) => 0.1 * j - 0.2);
    const penalised = [false, true, true, true, true, true];
    const { G, acc } = atCoefficients(X, y, n, p, w);
    const step = gramStep(G, w, 2, penalised);
    expect(step).not.toBeNull();
    const viaQr = solveCoefficients(acc, { ridge: 2, penalised });
    for (let j = 0; j < p; j++) expect(relative(step!.w[j], viaQr[j])).toBeLessThan(1e-10);
    expect(step!.decrement).toBeGreaterThan(0);
  });

  it('give no step when the bound on the scaled Hessian exceeds 1e7 (two nearly equal columns), so the QR engine solves', () => {
    const n = 2000;
    const p = 5;
    const { X, y } = problem(n, p, 5, 1e-5);
    const w = new Float64Array(p);
    const { G } = atCoefficients(X, y, n, p, w);
    expect(GRAM_MAX_CONDITION).toBe(1e7);
    expect(gramStep(G, w, 0, new Array(p).fill(true))).toBeNull();
  });

  it('fitLogistic reaches the optimum (gradient zero) both on Gram passes and after falling back to the QR engine', () => {
    for (const near of [0, 1e-5]) {
      const n = 3000;
      const random = seededRandom(9);
      const a = new Float64Array(n);
      const b = new Float64Array(n);
      const y = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        a[i] = 2 * random() - 1;
        b[i] = near > 0 ? a[i] + near * (2 * random() - 1) : 2 * random() - 1;
        y[i] = random() < 1 / (1 + Math.exp(-(0.4 + 1.2 * a[i] - 0.7 * b[i]))) ? 1 : 0;
      }
      const data: LogisticRows = { inputs: [a, b], y, rows: n };
      const training = new Map([
        ['a', a],
        ['b', b],
      ]);
      const design = createDesign([createTerm({ kind: 'linear', columns: ['a', 'b'], line: 1 }, training, 'm')], true);
      // Nearly equal columns without a penalty: the scaled Hessian's bound is far above 1e7.
      const ridge = near > 0 ? 0 : 0.5;
      const options = { ridge, penalised: [...design.penalised] };
      const [fit] = fitLogistic(design, data, options, [{}]);
      expect(fit.converged).toBe(true);
      // A Gram fit keeps no factor unless asked; the fallback fit has the QR engine's.
      expect(fit.weightedFactor === null).toBe(near === 0);
      // Gradient of the objective / 2: X^T (y - p) - ridge E w, zero at the optimum.
      const w = fit.coefficients;
      const grad = [0, 0, 0];
      for (let i = 0; i < n; i++) {
        const pr = 1 / (1 + Math.exp(-(w[0] + w[1] * a[i] + w[2] * b[i])));
        grad[0] += y[i] - pr;
        grad[1] += (y[i] - pr) * a[i];
        grad[2] += (y[i] - pr) * b[i];
      }
      grad[1] -= ridge * w[1];
      grad[2] -= ridge * w[2];
      for (const g of grad) expect(Math.abs(g)).toBeLessThan(1e-6);
      // Asking for the factor gives the Gram's Cholesky factor at the returned coefficients when
      // the Gram is well conditioned, else the QR factor there.
      const [withFactor] = fitLogistic(design, data, options, [{ factor: true }]);
      expect(withFactor.weightedR === null).toBe(near > 0);
      expect(withFactor.weightedFactor === null ? n : withFactor.weightedFactor.rows).toBe(n);
      expect(withFactor.weightedFactor === null).toBe(near === 0);
      for (let j = 0; j < 3; j++) expect(relative(withFactor.coefficients[j], w[j])).toBeLessThan(1e-12);
    }
  });
});
