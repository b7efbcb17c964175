// The spike figure's data variation TV_y (diagnostics/spikes.ts): the total variation of the mean
// target over the input's distinct values in ascending order, each mean summed in row order, the
// rows weighted when weights are given, an even-stride sample of SPIKE_MAX_ROWS rows above it.
// Checked here bit for bit against a plain computation (a Map of value -> sums, sorted keys).
import { describe, expect, it } from 'vitest';
import { createDesign } from '../../src/design/design-matrix.js';
import { createTerm } from '../../src/design/terms/index.js';
import { measureSpikes, SPIKE_MAX_ROWS } from '../../src/diagnostics/spikes.js';
import { measureSwing, type InsideCurve } from '../../src/diagnostics/swing.js';

/** TV_y the plain way: rows grouped by value (-0 and +0 one value) in row order, means in ascending value order. */
function plainDataVariation(x: Float64Array, y: Float64Array, n: number, weights?: Float64Array): number {
  const m = Math.min(n, SPIKE_MAX_ROWS);
  const groups = new Map<number, { sum: number; total: number }>();
  for (let t = 0; t < m; t++) {
    const r = m === n ? t : Math.floor((t * n) / m);
    const key = x[r] === 0 ? 0 : x[r];
    const g = groups.get(key) ?? { sum: 0, total: 0 };
    const w = weights === undefined ? 1 : weights[r];
    g.sum += weights === undefined ? y[r] : w * y[r];
    g.total += w;
    groups.set(key, g);
  }
  const means = [...groups.keys()]
    .sort((a, b) => a - b)
    .filter((v) => Number.isFinite(v) && (groups.get(v)?.total ?? 0) > 0)
    .map((v) => {
      const g = groups.get(v);
      return g === undefined ? Number.NaN : g.sum / g.total;
    });
  let s = 0;
  for (let k = 1; k < means.length; k++) s += Math.abs(means[k] - means[k - 1]);
  return s;
}

/** A seeded generator (xorshift32), so the rows are the same on every run. */
function random(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return () => {
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    return s / 2 ** 32;
  };
}

function figures(n: number, seed: number, options: { weights?: boolean; levels?: number; value?: (u: number, i: number) => number } = {}) {
  const next = random(seed);
  const levels = options.levels ?? 0;
  const value = options.value;
  // Values on a coarse lattice repeat (several rows per value); -0 and +0 both occur.
  const x = Float64Array.from({ length: n }, (_, i) =>
    value !== undefined
      ? value(next(), i)
      : (levels > 0 ? Math.floor(next() * levels) - levels / 2 : next() * 10 - 5) * (i % 7 === 0 ? -1 : 1),
  );
  const y = Float64Array.from(x, (v) => Math.sin(v) + next());
  const weights = options.weights ? Float64Array.from({ length: n }, (_, i) => (i % 11 === 0 ? 0 : 0.5 + next())) : undefined;
  const design = createDesign(
    [createTerm({ kind: 'polynomial', of: 'x', degree: 3, shift: null, scale: null, line: 1 }, new Map([['x', x]]), 'm.yml')],
    true,
  );
  const train = { inputs: [x], y, rows: n, ...(weights ? { weights } : {}) };
  const coefficients = [0.1, 1, -0.2, 0.01];
  const spikes = measureSpikes(design, train, coefficients);
  // The same with the swing scan's curves and distinct values (as a model's checks run it).
  const known: InsideCurve[] = [];
  measureSwing(design, train, coefficients, {}, known);
  const shared = measureSpikes(design, train, coefficients, undefined, known);
  return { got: spikes.perInput[0]?.dataVariation, want: plainDataVariation(x, y, n, weights), shared, spikes, known };
}

describe('spike data variation', () => {
  it('equals the plain computation with distinct values', () => {
    const { got, want } = figures(1000, 7);
    expect(got).toBe(want);
  });

  it('equals it with repeated values, -0 and +0, and row weights (some 0)', () => {
    for (const weights of [false, true]) {
      const { got, want } = figures(3000, 11, { weights, levels: 40 });
      expect(got).toBe(want);
    }
  });

  it("is the same when it takes the swing scan's distinct values instead of sorting again", () => {
    for (const weights of [false, true]) {
      const { want, shared, spikes, known } = figures(2000, 13, { weights, levels: 60 });
      expect(known.length).toBe(1);
      expect(known[0].distinct?.length).toBeGreaterThan(50);
      // The swing sort's slot of each row: the rows are summed without looking their values up.
      expect(known[0].slots?.length).toBe(2000);
      expect(shared.perInput[0]?.dataVariation).toBe(want);
      expect(shared).toEqual(spikes);
    }
  });

  it('equals it with values bunched at one end (many to a bucket of the slot table) and over 600 orders of magnitude', () => {
    for (const value of [(u: number) => u ** 12, (u: number, i: number) => (i % 2 === 0 ? -1 : 1) * 10 ** (600 * u - 300)]) {
      for (const weights of [false, true]) {
        const { got, want, shared } = figures(2500, 17, { weights, value });
        expect(got).toBe(want);
        expect(shared.perInput[0]?.dataVariation).toBe(want);
      }
    }
  });

  it('equals it on the even-stride sample above SPIKE_MAX_ROWS rows', () => {
    const { got, want } = figures(SPIKE_MAX_ROWS * 3 + 17, 5, { levels: 500 });
    expect(got).toBe(want);
  });
});
