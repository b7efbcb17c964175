// The new term kinds against independent constructions in numpy / scipy (scipy comes with Debian's
// python3-sklearn): Fourier columns from numpy's sin and cos, B-splines from scipy.interpolate.BSpline
// (one coefficient vector e_j per basis function, extrapolating), natural cubic splines from
// scipy.interpolate.CubicSpline(bc_type='natural') through each column's values at the knots, knots
// at quantiles from numpy.quantile. Design values to 1e-9 relative to each column's scale.
import { describe, expect, it } from 'vitest';
import type { TermSpec } from '../../src/config/types.js';
import { createTerm } from '../../src/design/terms/index.js';
import { bsplineValues } from '../../src/design/terms/spline.js';
import { runPythonJson } from '../tools/python-json.js';
import { requireTool, skipNote } from '../tools/require-tool.js';

const missing = requireTool(['python3-numpy', 'python3-sklearn']);
const TOLERANCE = 1e-9;

/** Training x (uneven, fixed pseudo-random) and evaluation points inside and beyond its range. */
function trainingX(n: number, seed: number, scale: number): number[] {
  let s = seed >>> 0;
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    out.push(Number(((s / 2 ** 32) ** 1.5 * scale).toPrecision(9)));
  }
  return out;
}

/** The term's design columns at points `at` (column-major list of columns). */
function columns(
  spec: TermSpec,
  train: number[],
  at: number[],
): { names: readonly string[]; cols: number[][]; fixed: Record<string, unknown> } {
  const term = createTerm(spec, new Map([['x', Float64Array.from(train)]]), 'm.model.yml');
  const m = at.length;
  const out = new Float64Array(m * term.columnNames.length);
  term.fill([Float64Array.from(at)], m, out, 0);
  return { names: term.columnNames, fixed: term.fixed, cols: term.columnNames.map((_, j) => Array.from(out.subarray(j * m, (j + 1) * m))) };
}

/** Largest |a - b| / scale over a column, scale = the reference column's largest |value| (at least 1e-300). */
function worst(ours: number[][], theirs: number[][]): number {
  let w = 0;
  ours.forEach((col, j) => {
    const scale = Math.max(1e-300, ...theirs[j].map(Math.abs));
    col.forEach((v, i) => {
      w = Math.max(w, Math.abs(v - theirs[j][i]) / scale);
    });
  });
  return w;
}

const SCRIPT = `
import json, sys
import numpy as np
from scipy.interpolate import BSpline, CubicSpline
d = json.load(sys.stdin)
x = np.asarray(d['train']); at = np.asarray(d['at']); out = {}
kind = d['kind']
if kind == 'fourier':
    cols = []
    for j in range(1, d['harmonics'] + 1):
        cols += [np.sin(2 * np.pi * j * at / d['period']), np.cos(2 * np.pi * j * at / d['period'])]
    out['cols'] = [c.tolist() for c in cols]
else:
    a, b = x.min(), x.max()
    if 'count' in d:
        k = d['count']
        interior = np.quantile(x, [(j + 1) / (k + 1) for j in range(k)])
    else:
        interior = np.asarray(d['knots'], float)
    out['knots'] = interior.tolist()
    if kind == 'bspline':
        deg = d['degree']
        t = np.concatenate([[a] * (deg + 1), interior, [b] * (deg + 1)])
        nb = len(t) - deg - 1
        cols = []
        for j in range(1, nb):
            c = np.zeros(nb); c[j] = 1
            cols.append(BSpline(t, c, deg, extrapolate=True)(at))
        out['cols'] = [c.tolist() for c in cols]
        # The span check: [1, B_2..B_nb] against the truncated power basis [1, x..x^deg, (x - t_k)_+^deg].
        xs = np.linspace(a, b, 400)
        B = np.column_stack([np.ones_like(xs)] + [BSpline(t, np.eye(nb)[j], deg)(xs) for j in range(1, nb)])
        T = np.column_stack([xs**p for p in range(deg + 1)] + [np.maximum(xs - k, 0)**deg for k in interior])
        out['xs'] = xs.tolist()
        out['truncated'] = [c.tolist() for c in T.T]
    else:
        knots = np.concatenate([[a], interior, [b]])
        inside = at[(at >= a) & (at <= b)]
        out['inside'] = inside.tolist()
        out['knot_points'] = knots.tolist()
    out['lower'] = float(a); out['upper'] = float(b)
print(json.dumps(out))
`;

const CS_SCRIPT = `
import json, sys
import numpy as np
from scipy.interpolate import CubicSpline
d = json.load(sys.stdin)
knots = np.asarray(d['knots']); at = np.asarray(d['at']); b = knots[-1]; a = knots[0]
cols = []
for values in d['values']:
    s = CubicSpline(knots, values, bc_type='natural')
    inside = (at >= a) & (at <= b)
    above = at > b
    below = at < a
    v = np.where(inside, s(np.clip(at, a, b)), 0.0)
    v = np.where(above, s(b) + s(b, 1) * (at - b), v)
    v = np.where(below, s(a) + s(a, 1) * (at - a), v)
    cols.append(v.tolist())
print(json.dumps({'cols': cols}))
`;

interface Reference {
  cols?: number[][];
  knots?: number[];
  xs?: number[];
  truncated?: number[][];
  lower: number;
  upper: number;
}

const train = trainingX(80, 5, 20);
const lo = Math.min(...train);
const hi = Math.max(...train);
const at = [...Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60), lo - 3, lo - 0.5, hi + 0.25, hi + 4, ...train.slice(0, 10)];

describe.skipIf(missing !== null)(`terms against numpy / scipy${skipNote(missing)}`, () => {
  it(`fourier: sin/cos pairs of 2 pi j x / P to ${TOLERANCE}`, () => {
    const spec: TermSpec = { kind: 'fourier', of: 'x', period: 7, harmonics: 3, line: 1 };
    const ours = columns(spec, train, at);
    const ref = runPythonJson<Reference>(SCRIPT, { kind: 'fourier', period: 7, harmonics: 3, train, at });
    expect(ours.names).toEqual([
      'sin(2pi*1*x/7)',
      'cos(2pi*1*x/7)',
      'sin(2pi*2*x/7)',
      'cos(2pi*2*x/7)',
      'sin(2pi*3*x/7)',
      'cos(2pi*3*x/7)',
    ]);
    expect(worst(ours.cols, ref.cols as number[][])).toBeLessThan(TOLERANCE);
  });

  for (const [degree, knots] of [
    [3, { kind: 'count', count: 5 }],
    [2, { kind: 'list', values: [2, 5.5, 11] }],
    [1, { kind: 'count', count: 3 }],
  ] as const) {
    it(`B-spline degree ${degree}, knots ${JSON.stringify(knots)}: scipy's BSpline (extrapolating) to ${TOLERANCE}, and the truncated-power span`, () => {
      const spec: TermSpec = {
        kind: 'spline',
        of: 'x',
        knots: knots.kind === 'list' ? { kind: 'list', values: [...knots.values] } : knots,
        degree,
        natural: false,
        line: 1,
      };
      const ours = columns(spec, train, at);
      const ref = runPythonJson<Reference>(SCRIPT, {
        kind: 'bspline',
        degree,
        ...(knots.kind === 'count' ? { count: knots.count } : { knots: knots.values }),
        train,
        at,
      });
      // Knots at the same quantiles as numpy.quantile (linear interpolation).
      (ref.knots as number[]).forEach((k, j) =>
        expect(Math.abs((ours.fixed.knots as number[])[j] - k)).toBeLessThanOrEqual(1e-12 * Math.abs(k)),
      );
      expect(ours.cols.length).toBe((ref.cols as number[][]).length);
      expect(worst(ours.cols, ref.cols as number[][])).toBeLessThan(TOLERANCE);
      // [1, our columns] spans the truncated power basis: least-squares residual of each truncated
      // power column on [1, B] is at rounding level (the same space of splines).
      const xs = ref.xs as number[];
      const B = columns(spec, train, xs).cols;
      for (const target of ref.truncated as number[][]) expect(projectionResidual([xs.map(() => 1), ...B], target)).toBeLessThan(1e-9);
    });
  }

  it(`natural cubic spline: equals scipy's natural CubicSpline through its knot values inside, linear beyond, to ${TOLERANCE}`, () => {
    const spec: TermSpec = { kind: 'spline', of: 'x', knots: { kind: 'count', count: 4 }, degree: 3, natural: true, line: 1 };
    const ref = runPythonJson<Reference & { knot_points: number[] }>(SCRIPT, { kind: 'natural', count: 4, train, at });
    const knots = ref.knot_points;
    const ours = columns(spec, train, at);
    const atKnots = columns(spec, train, knots).cols;
    expect(ours.cols.length).toBe(5);
    const cs = runPythonJson<{ cols: number[][] }>(CS_SCRIPT, { knots, values: atKnots, at });
    expect(worst(ours.cols, cs.cols)).toBeLessThan(TOLERANCE);
  });
});

/** Relative residual ||r|| / ||y|| of the least-squares projection of y on the columns (normal equations by Gram-Schmidt). */
function projectionResidual(cols: number[][], y: number[]): number {
  const basis: number[][] = [];
  for (const c of cols) {
    const v = [...c];
    for (let pass = 0; pass < 2; pass++) {
      for (const q of basis) {
        const dot = q.reduce((s, qi, i) => s + qi * v[i], 0);
        for (let i = 0; i < v.length; i++) v[i] -= dot * q[i];
      }
    }
    const norm = Math.sqrt(v.reduce((s, vi) => s + vi * vi, 0));
    if (norm > 1e-10) basis.push(v.map((vi) => vi / norm));
  }
  const r = [...y];
  for (let pass = 0; pass < 2; pass++) {
    for (const q of basis) {
      const dot = q.reduce((s, qi, i) => s + qi * r[i], 0);
      for (let i = 0; i < r.length; i++) r[i] -= dot * q[i];
    }
  }
  const ny = Math.sqrt(y.reduce((s, v) => s + v * v, 0));
  return Math.sqrt(r.reduce((s, v) => s + v * v, 0)) / ny;
}

describe('B-spline published values', () => {
  it('the uniform cubic B-splines are 1/6, 2/3, 1/6 at an interior knot (de Boor 1978, from memory; Cox-de Boor recursion)', () => {
    const t = Float64Array.from([0, 0, 0, 0, 1, 2, 3, 4, 5, 6, 6, 6, 6]);
    const basis = new Float64Array(4);
    bsplineValues(t, 3, 6, 3, basis, new Float64Array(4), new Float64Array(4));
    // At x = t_6 = 3 the non-zero B-splines are B_3 .. B_6: B_3, B_4, B_5 are uniform (knots 0..4,
    // 1..5, 2..6) and take 1/6, 2/3, 1/6; B_6 starts at 3 and is 0 there.
    const expected = [1 / 6, 2 / 3, 1 / 6, 0];
    expected.forEach((v, r) => expect(basis[r]).toBeCloseTo(v, 15));
  });
});

const POLY_SCRIPT = `
import json, sys
import numpy as np
from sklearn.preprocessing import PolynomialFeatures
d = json.load(sys.stdin)
X = np.column_stack(d['train']); A = np.column_stack(d['at'])
shift = X.mean(axis=0) if d['standardise'] else np.zeros(X.shape[1])
scale = X.std(axis=0) if d['standardise'] else np.ones(X.shape[1])
pf = PolynomialFeatures(degree=d['degree'], include_bias=False).fit((X - shift) / scale)
Z = pf.transform((A - shift) / scale)
print(json.dumps({'cols': Z.T.tolist(), 'names': list(pf.get_feature_names_out(d['names']))}))
`;

describe.skipIf(missing !== null)(`polynomial over several inputs against sklearn's PolynomialFeatures${skipNote(missing)}`, () => {
  for (const [names, degree, standardise] of [
    [['a', 'b'], 3, true],
    [['a', 'b', 'c'], 2, true],
    [['a', 'b'], 2, false],
  ] as const) {
    it(`${names.join(', ')}, degree ${degree}${standardise ? '' : ', raw'}: every monomial, same order, to ${TOLERANCE}`, () => {
      const trainCols = names.map((_, i) => trainingX(50, 11 + i, 4 + i));
      const atCols = names.map((_, i) => trainingX(30, 31 + i, 6 + i));
      const spec: TermSpec = {
        kind: 'multi-polynomial',
        of: [...names],
        degree,
        shift: names.map(() => (standardise ? null : 0)),
        scale: names.map(() => (standardise ? null : 1)),
        line: 1,
      };
      const term = createTerm(spec, new Map(names.map((n, i) => [n, Float64Array.from(trainCols[i])])), 'm.model.yml');
      const m = atCols[0].length;
      const out = new Float64Array(m * term.columnNames.length);
      term.fill(
        atCols.map((c) => Float64Array.from(c)),
        m,
        out,
        0,
      );
      const ours = term.columnNames.map((_, j) => Array.from(out.subarray(j * m, (j + 1) * m)));
      const ref = runPythonJson<{ cols: number[][]; names: string[] }>(POLY_SCRIPT, {
        train: trainCols,
        at: atCols,
        degree,
        standardise,
        names,
      });
      expect(ours.length).toBe(ref.cols.length);
      // sklearn names `a^2 b`; ours `z(a)^2*z(b)` (or `a^2*b` raw): the same powers in the same order.
      expect(term.columnNames.map((n) => n.replace(/z\(([a-z])\)/g, '$1').replace(/\*/g, ' '))).toEqual(ref.names);
      expect(worst(ours, ref.cols)).toBeLessThan(TOLERANCE);
    });
  }
});

const TRANSFORM_SCRIPT = `
import json, sys
import numpy as np
d = json.load(sys.stdin)
x = np.asarray(d['train']); at = np.asarray(d['at'])
f = {'log': np.log, 'log1p': np.log1p, 'sqrt': np.sqrt, 'standardise': lambda v: (v - x.mean()) / x.std()}[d['transform']]
tx, ta = f(x), f(at)
z = (ta - tx.mean()) / tx.std()
print(json.dumps({'cols': [(z**k).tolist() for k in range(1, d['degree'] + 1)]}))
`;

describe.skipIf(missing !== null)(`input transforms against numpy${skipNote(missing)}`, () => {
  for (const transform of ['log', 'log1p', 'sqrt', 'standardise'] as const) {
    it(`polynomial of ${transform}(x): standardised powers of the transformed input to ${TOLERANCE}`, () => {
      const positive = train.map((v) => v + 0.5);
      const points = at.filter((v) => v > 0.1);
      const spec: TermSpec = { kind: 'polynomial', of: 'x', degree: 3, shift: null, scale: null, transform, line: 1 };
      const ours = columns(spec, positive, points);
      const ref = runPythonJson<Reference>(TRANSFORM_SCRIPT, { transform, degree: 3, train: positive, at: points });
      expect(ours.names[0]).toBe(`z(${transform === 'standardise' ? 'std' : transform}(x))`);
      expect(worst(ours.cols, ref.cols as number[][])).toBeLessThan(TOLERANCE);
    });
  }
});

const MULTI_RBF_SCRIPT = `
import json, sys, itertools
import numpy as np
d = json.load(sys.stdin)
X = np.column_stack(d['train']); A = np.column_stack(d['at'])
mu, sd = X.mean(axis=0), X.std(axis=0)
if d['centers'] == 'at-samples':
    C = X
elif d['centers'] == 'grid':
    C = np.array(list(itertools.product(*[np.linspace(a['from'], a['to'], a['count']) for a in d['axes']])))
else:
    C = np.asarray(d['rows'], float)
Z, ZC = (A - mu) / sd, (C - mu) / sd
D2 = ((Z[:, None, :] - ZC[None, :, :])**2).sum(axis=2)
print(json.dumps({'cols': np.exp(-D2 / (2 * d['width']**2)).T.tolist()}))
`;

describe.skipIf(missing !== null)(`radial term over several inputs against numpy${skipNote(missing)}`, () => {
  const trainCols = [trainingX(40, 41, 5), trainingX(40, 42, 30)];
  const atCols = [trainingX(25, 43, 6), trainingX(25, 44, 33)];
  for (const centers of [
    {
      kind: 'rows',
      rows: [
        [1, 10],
        [3, 20],
        [4.5, 5],
      ],
    },
    {
      kind: 'grid',
      axes: [
        { from: 0, to: 5, count: 4 },
        { from: 0, to: 30, count: 3 },
      ],
    },
    { kind: 'at-samples' },
  ] as const) {
    it(`centres as ${centers.kind}: isotropic Gaussians on the standardised inputs to ${TOLERANCE}`, () => {
      const spec: TermSpec = { kind: 'multi-rbf', of: ['a', 'b'], centers: JSON.parse(JSON.stringify(centers)), width: 0.7, line: 1 };
      const term = createTerm(
        spec,
        new Map([
          ['a', Float64Array.from(trainCols[0])],
          ['b', Float64Array.from(trainCols[1])],
        ]),
        'm.model.yml',
      );
      const m = atCols[0].length;
      const out = new Float64Array(m * term.columnNames.length);
      term.fill(
        atCols.map((c) => Float64Array.from(c)),
        m,
        out,
        0,
      );
      const ours = term.columnNames.map((_, j) => Array.from(out.subarray(j * m, (j + 1) * m)));
      const ref = runPythonJson<{ cols: number[][] }>(MULTI_RBF_SCRIPT, {
        train: trainCols,
        at: atCols,
        width: 0.7,
        centers: centers.kind,
        ...centers,
      });
      expect(ours.length).toBe(ref.cols.length);
      expect(worst(ours, ref.cols)).toBeLessThan(TOLERANCE);
    });
  }
});
