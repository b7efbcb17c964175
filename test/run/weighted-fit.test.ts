// Weighted least squares (`data.weight`), ridge with weights and `data.sigma` with the reduced
// chi-square, through the whole pipeline, against an independent construction in numpy
// (lstsq on the rows scaled by sqrt(w)) and sklearn (Ridge with sample_weight), to 1e-6
// relative on fitted figures. Needs Debian python3-numpy and python3-sklearn.
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { InputError } from '../../src/core/errors.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { fitModel } from '../../src/run/fit-model.js';
import { runPythonJson } from '../tools/python-json.js';
import { requireTool, skipNote } from '../tools/require-tool.js';

const missing = requireTool(['python3-numpy', 'python3-sklearn']);
const TOLERANCE = 1e-6;

/** Rows x, s (uncertainty), w, y: y = 1 + 2x - 0.3x^2 + noise of size s (fixed pseudo-random). */
function rows(n: number, seed: number): { x: number[]; s: number[]; w: number[]; y: number[] } {
  let state = seed >>> 0;
  const rand = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  const out = { x: [] as number[], s: [] as number[], w: [] as number[], y: [] as number[] };
  for (let i = 0; i < n; i++) {
    const x = Number((rand() * 6).toPrecision(8));
    const s = Number((0.05 + rand() * 0.5).toPrecision(6));
    const noise = (rand() + rand() + rand() - 1.5) * 2 * s;
    out.x.push(x);
    out.s.push(s);
    out.w.push(Number((rand() * 3).toPrecision(6)));
    out.y.push(Number((1 + 2 * x - 0.3 * x * x + noise).toPrecision(10)));
  }
  return out;
}

function csv(r: ReturnType<typeof rows>): string {
  return `x,s,w,y\n${r.x.map((x, i) => `${x},${r.s[i]},${r.w[i]},${r.y[i]}`).join('\n')}\n`;
}

const train = rows(60, 3);
const holdout = rows(25, 4);

function repo(data: string, ridge: number) {
  return createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\n  ${data}\nterms:\n  - polynomial: { of: x, degree: 2, shift: 0, scale: 1 }\nfit:\n  ridge: ${ridge}\n`,
    'data/train.csv': csv(train),
    'data/holdout.csv': csv(holdout),
  });
}

const SCRIPT = `
import json, sys
import numpy as np
from sklearn.linear_model import Ridge
d = json.load(sys.stdin)
def design(x):
    x = np.asarray(x)
    return np.column_stack([np.ones_like(x), x, x * x])
tr, ho = d['train'], d['holdout']
w = np.asarray(tr[d['kind']], float)
w = 1.0 / w**2 if d['kind'] == 's' else w
X, y = design(tr['x']), np.asarray(tr['y'])
if d['ridge'] == 0:
    sw = np.sqrt(w)
    b = np.linalg.lstsq(X * sw[:, None], y * sw, rcond=None)[0]
else:
    # the penalty applies to the weighted sum of squares with weights scaled to mean 1
    m = Ridge(alpha=d['ridge'], fit_intercept=True, solver='svd').fit(X[:, 1:], y, sample_weight=w / w.mean())
    b = np.concatenate([[m.intercept_], m.coef_])
def measures(part, b):
    ww = np.asarray(part[d['kind']], float)
    ww = 1.0 / ww**2 if d['kind'] == 's' else ww
    yy = np.asarray(part['y']); f = design(part['x']) @ b; r = yy - f
    W = ww.sum(); mean = (ww * yy).sum() / W
    out = {'rmse': float(np.sqrt((ww * r * r).sum() / W)), 'mae': float((ww * np.abs(r)).sum() / W),
           'r2': float(1 - (ww * r * r).sum() / (ww * (yy - mean)**2).sum())}
    if d['kind'] == 's':
        out['chi2'] = float(((r / np.asarray(part['s']))**2).sum())
    return out
print(json.dumps({'b': b.tolist(), 'train': measures(tr, b), 'holdout': measures(ho, b)}))
`;

interface Reference {
  b: number[];
  train: { rmse: number; mae: number; r2: number; chi2?: number };
  holdout: { rmse: number; mae: number; r2: number; chi2?: number };
}

function rel(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
}

describe.skipIf(missing !== null)(`weighted fits against numpy / sklearn${skipNote(missing)}`, () => {
  for (const [kind, key, ridge] of [
    ['w', 'weight: w', 0],
    ['s', 'sigma: s', 0],
    ['w', 'weight: w', 0.7],
  ] as const) {
    it(`data.${key.split(':')[0]}, ridge ${ridge}: coefficients and weighted RMSE, MAE, R^2 to ${TOLERANCE}`, async () => {
      const ref = runPythonJson<Reference>(SCRIPT, { train, holdout, kind, ridge });
      const r = repo(key, ridge);
      const settings = defaultSettings();
      const descriptor = await loadDescriptor(r, 'models/m.model.yml', settings);
      const model = await fitModel(r, descriptor, settings);
      const b = Array.from(model.fit.coefficients);
      ref.b.forEach((v, j) => expect(rel(b[j], v), `coefficient ${j}: ${b[j]} against ${v}`).toBeLessThan(TOLERANCE));
      const m = model.metrics;
      for (const [ours, theirs] of [
        [m.trainRmse, ref.train.rmse],
        [m.trainMae, ref.train.mae],
        [m.trainR2, ref.train.r2],
        [m.holdoutRmse, ref.holdout.rmse],
        [m.holdoutMae, ref.holdout.mae],
        [m.holdoutR2, ref.holdout.r2],
      ]) {
        expect(rel(ours, theirs), `${ours} against ${theirs}`).toBeLessThan(TOLERANCE);
      }
      const result = await evaluateModel(r, descriptor, settings);
      const chi = result.checks.find((c) => c.id === 'chi-square');
      if (kind === 's') {
        const trainChi = (ref.train.chi2 as number) / (train.x.length - 3);
        expect(rel(chi?.value as number, trainChi)).toBeLessThan(TOLERANCE);
        expect(rel(result.metrics?.holdout_chi_square as number, (ref.holdout.chi2 as number) / holdout.x.length)).toBeLessThan(TOLERANCE);
        // The noise was drawn with standard deviation s (uniform sums scaled to sd s): near 1.
        expect(chi?.status, chi?.message).toBe('pass');
      } else {
        expect(chi?.code).toBe('chi-square/not-applicable');
      }
    });
  }
});

describe('weights as input', () => {
  it('a negative weight is an error naming file, line, column and value', async () => {
    const bad = { ...train, w: train.w.map((v, i) => (i === 4 ? -1 : v)) };
    const r = createMemoryRepository({
      'models/m.model.yml':
        'version: 1\nname: m\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\n  weight: w\nterms:\n  - linear: [x]\n',
      'data/train.csv': csv(bad),
      'data/holdout.csv': csv(holdout),
    });
    const settings = defaultSettings();
    const descriptor = await loadDescriptor(r, 'models/m.model.yml', settings);
    const error = await fitModel(r, descriptor, settings).then(
      () => null,
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(InputError);
    const e = error as InputError;
    expect(e.code).toBe('bad-weight');
    expect(e.location).toMatchObject({ file: 'data/train.csv', line: 6, key: 'w' });
    expect(e.message).toContain('-1');
  });

  it('weight and sigma together are a descriptor error at data.sigma', async () => {
    const r = createMemoryRepository({
      'models/m.model.yml':
        'version: 1\nname: m\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\n  weight: w\n  sigma: s\nterms:\n  - linear: [x]\n',
      'data/train.csv': csv(train),
      'data/holdout.csv': csv(holdout),
    });
    await expect(loadDescriptor(r, 'models/m.model.yml', defaultSettings())).rejects.toMatchObject({
      code: 'weight-and-sigma',
      location: { line: 8 },
    });
  });
});
