// `data.target_transform` (log, log1p, sqrt) through the whole pipeline, against an independent
// construction in numpy: least squares on g(y) (weighted: on the rows scaled by sqrt(w)), the
// back-transformed predictions g^-1(t_hat), and every error figure on both scales, including the
// k-fold RMSE on the original scale (contiguous folds, refitted from scratch per fold in numpy) and
// the reduced chi-square with sigma carried over by the delta method (sigma_t = g'(y) sigma), to
// 1e-6 relative. Needs Debian python3-numpy.
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { InputError } from '../../src/core/errors.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { fitModel } from '../../src/run/fit-model.js';
import { validateReport } from '../../src/config/generated/report-validator.js';
import { summarise } from '../../src/result/result.js';
import { runPythonJson } from '../tools/python-json.js';
import { requireTool, skipNote } from '../tools/require-tool.js';

const missing = requireTool(['python3-numpy']);
const TOLERANCE = 1e-6;

/** Rows x, s, w, y with y = exp(0.4 + 0.5x - 0.04x^2) * (1 + noise of size s), all y > 0 (fixed pseudo-random). */
function rows(n: number, seed: number): { x: number[]; s: number[]; w: number[]; y: number[] } {
  let state = seed >>> 0;
  const rand = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  const out = { x: [] as number[], s: [] as number[], w: [] as number[], y: [] as number[] };
  for (let i = 0; i < n; i++) {
    const x = Number((rand() * 6).toPrecision(8));
    const rel = 0.02 + rand() * 0.1;
    const noise = (rand() + rand() + rand() - 1.5) * 2 * rel;
    const y = Number((Math.exp(0.4 + 0.5 * x - 0.04 * x * x) * (1 + noise)).toPrecision(10));
    out.x.push(x);
    out.s.push(Number((rel * y).toPrecision(6)));
    out.w.push(Number((0.2 + rand() * 3).toPrecision(6)));
    out.y.push(y);
  }
  return out;
}

function csv(r: ReturnType<typeof rows>): string {
  return `x,s,w,y\n${r.x.map((x, i) => `${x},${r.s[i]},${r.w[i]},${r.y[i]}`).join('\n')}\n`;
}

const train = rows(48, 11);
const holdout = rows(20, 12);
const FOLDS = 4;

function repo(extra: string, data = { train: csv(train), holdout: csv(holdout) }) {
  return createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\n${extra}terms:\n  - polynomial: { of: x, degree: 2, shift: 0, scale: 1 }\nfit:\n  folds: ${FOLDS}\n  fold_order: blocks\n`,
    'data/train.csv': data.train,
    'data/holdout.csv': data.holdout,
  });
}

const SCRIPT = `
import json, sys
import numpy as np
d = json.load(sys.stdin)
kind, weighting, k = d['transform'], d['weighting'], d['folds']
g = {'log': np.log, 'log1p': np.log1p, 'sqrt': np.sqrt}[kind]
ginv = {'log': np.exp, 'log1p': np.expm1, 'sqrt': lambda t: np.maximum(t, 0.0) ** 2}[kind]
slope = {'log': lambda y: 1 / y, 'log1p': lambda y: 1 / (1 + y), 'sqrt': lambda y: 0.5 / np.sqrt(y)}[kind]
def part(p):
    x, y = np.asarray(p['x'], float), np.asarray(p['y'], float)
    X = np.column_stack([np.ones_like(x), x, x * x])
    s = np.asarray(p['s'], float)
    if weighting == 'weight':
        wo = wt = np.asarray(p['w'], float)
    elif weighting == 'sigma':
        wo = 1 / s**2
        wt = 1 / (slope(y) * s)**2
    else:
        wo = wt = np.ones_like(y)
    return X, y, g(y), wo, wt, s, s * np.abs(slope(y))
Xtr, ytr, ttr, wotr, wttr, str_, sttr = part(d['train'])
Xho, yho, tho, woho, wtho, sho, stho = part(d['holdout'])
def solve(X, t, w):
    sw = np.sqrt(w)
    return np.linalg.lstsq(X * sw[:, None], t * sw, rcond=None)[0]
b = solve(Xtr, ttr, wttr)
def measures(y, f, w):
    r = y - f; W = w.sum(); m = (w * y).sum() / W
    return {'rmse': float(np.sqrt((w * r * r).sum() / W)), 'mae': float((w * np.abs(r)).sum() / W),
            'r2': float(1 - (w * r * r).sum() / (w * (y - m)**2).sum())}
n = len(ytr)
sizes = [n // k + (1 if f < n % k else 0) for f in range(k)]
fold = np.repeat(np.arange(k), sizes)
oof_t = np.empty(n)
for f in range(k):
    keep = fold != f
    bf = solve(Xtr[keep], ttr[keep], wttr[keep])
    oof_t[~keep] = Xtr[~keep] @ bf
def cv(y, f, w):
    return float(np.sqrt((w * (y - f)**2).sum() / w.sum()))
ftr, fho = Xtr @ b, Xho @ b
out = {'b': b.tolist(),
       'transformed': {'train': measures(ttr, ftr, wttr), 'holdout': measures(tho, fho, wtho), 'cv': cv(ttr, oof_t, wttr)},
       'original': {'train': measures(ytr, ginv(ftr), wotr), 'holdout': measures(yho, ginv(fho), woho), 'cv': cv(ytr, ginv(oof_t), wotr)}}
if weighting == 'sigma':
    p = Xtr.shape[1]
    out['transformed']['chi'] = [float((((ttr - ftr) / sttr)**2).sum() / (n - p)), float((((tho - fho) / stho)**2).sum() / len(yho))]
    out['original']['chi'] = [float((((ytr - ginv(ftr)) / str_)**2).sum() / (n - p)), float((((yho - ginv(fho)) / sho)**2).sum() / len(yho))]
print(json.dumps(out))
`;

interface Side {
  train: { rmse: number; mae: number; r2: number };
  holdout: { rmse: number; mae: number; r2: number };
  cv: number;
  chi?: [number, number];
}
interface Reference {
  b: number[];
  transformed: Side;
  original: Side;
}

function rel(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
}

function expectClose(ours: unknown, theirs: number, what: string): void {
  expect(typeof ours, what).toBe('number');
  expect(rel(ours as number, theirs), `${what}: ${String(ours)} against ${theirs}`).toBeLessThan(TOLERANCE);
}

describe.skipIf(missing !== null)(`target transforms against numpy${skipNote(missing)}`, () => {
  const cases = [
    ['log', null, 'original'],
    ['log1p', null, 'original'],
    ['sqrt', null, 'transformed'],
    ['log', 'weight', 'original'],
    ['log', 'sigma', 'original'],
    ['sqrt', 'sigma', 'transformed'],
  ] as const;
  for (const [transform, weighting, scale] of cases) {
    it(`${transform}${weighting ? ` with data.${weighting}` : ''}, limits on the ${scale} scale: both scales to ${TOLERANCE}`, async () => {
      const ref = runPythonJson<Reference>(SCRIPT, { train, holdout, transform, weighting, folds: FOLDS });
      const extra = `  target_transform: ${transform}\n${scale === 'transformed' ? '  limits_scale: transformed\n' : ''}${
        weighting === 'weight' ? '  weight: w\n' : weighting === 'sigma' ? '  sigma: s\n' : ''
      }`;
      const r = repo(extra);
      const settings = defaultSettings();
      const descriptor = await loadDescriptor(r, 'models/m.model.yml', settings);
      const model = await fitModel(r, descriptor, settings);
      ref.b.forEach((v, j) => expectClose(model.fit.coefficients[j], v, `coefficient ${j}`));
      const result = await evaluateModel(r, descriptor, settings);
      const ts = result.target_scale;
      expect(ts?.transform).toBe(transform);
      expect(ts?.limits_scale).toBe(scale);
      for (const side of ['original', 'transformed'] as const) {
        const ours = ts?.[side];
        const theirs = ref[side];
        expectClose(ours?.train_rmse, theirs.train.rmse, `${side} train_rmse`);
        expectClose(ours?.holdout_rmse, theirs.holdout.rmse, `${side} holdout_rmse`);
        expectClose(ours?.train_mae, theirs.train.mae, `${side} train_mae`);
        expectClose(ours?.holdout_mae, theirs.holdout.mae, `${side} holdout_mae`);
        expectClose(ours?.train_r2, theirs.train.r2, `${side} train_r2`);
        expectClose(ours?.holdout_r2, theirs.holdout.r2, `${side} holdout_r2`);
        expectClose(ours?.gap_ratio, theirs.holdout.rmse / theirs.train.rmse, `${side} gap_ratio`);
        expectClose(ours?.cv_rmse, theirs.cv, `${side} cv_rmse`);
        if (weighting === 'sigma') {
          expectClose(ours?.train_chi_square, theirs.chi?.[0] as number, `${side} train_chi_square`);
          expectClose(ours?.holdout_chi_square, theirs.chi?.[1] as number, `${side} holdout_chi_square`);
        } else {
          expect(ours?.train_chi_square).toBeUndefined();
        }
      }
      // The checks judge the chosen scale.
      const judged = ref[scale];
      const check = (id: string) => result.checks.find((c) => c.id === id);
      expectClose(check('generalisation-gap')?.value, judged.holdout.rmse / judged.train.rmse, 'generalisation-gap value');
      expectClose(result.metrics?.holdout_rmse, judged.holdout.rmse, 'metrics.holdout_rmse');
      expectClose(result.metrics?.holdout_r2, judged.holdout.r2, 'metrics.holdout_r2');
      expectClose(result.metrics?.holdout_mae, judged.holdout.mae, 'metrics.holdout_mae');
      expectClose(result.metrics?.cv_rmse, judged.cv, 'metrics.cv_rmse');
      if (weighting === 'sigma') expectClose(check('chi-square')?.value, judged.chi?.[0] as number, 'chi-square value');
      // The report with the new block passes the strict report schema.
      expect(validateReport(JSON.parse(JSON.stringify(summarise([result], '0.0.0')))), 'report schema').toBe(true);
    });
  }
});

describe('target transform: scales of the swing family and bad input', () => {
  it('swing judges the original band when limits are on the original scale, the transformed one otherwise', async () => {
    const settings = defaultSettings();
    const ys = train.y;
    const lo = Math.min(...ys);
    const hi = Math.max(...ys);
    for (const [extra, band] of [
      ['  target_transform: log\n', [lo, hi]],
      ['  target_transform: log\n  limits_scale: transformed\n', [Math.log(lo), Math.log(hi)]],
    ] as const) {
      const r = repo(extra);
      const result = await evaluateModel(r, await loadDescriptor(r, 'models/m.model.yml', settings), settings);
      const swing = result.checks.find((c) => c.id === 'swing');
      const got = swing?.detail?.band as number[];
      expect(rel(got[0], band[0])).toBeLessThan(1e-12);
      expect(rel(got[1], band[1])).toBeLessThan(1e-12);
      // The curve is on the same scale: on the original scale every prediction is positive.
      const curve = ((swing?.detail?.curves ?? []) as { prediction: number[] }[])[0];
      if (extra.includes('transformed')) expect(curve.prediction.some((v) => v < 1)).toBe(true);
      else expect(curve.prediction.every((v) => v > 0)).toBe(true);
    }
  });

  it('a target outside the domain is an error naming file, line, column and value', async () => {
    const bad = { ...train, y: train.y.map((v, i) => (i === 6 ? -0.5 : v)) };
    const settings = defaultSettings();
    for (const [transform, ok] of [
      ['log', false],
      ['log1p', true],
      ['sqrt', false],
    ] as const) {
      const r = repo(`  target_transform: ${transform}\n`, { train: csv(bad), holdout: csv(holdout) });
      const descriptor = await loadDescriptor(r, 'models/m.model.yml', settings);
      const error = await fitModel(r, descriptor, settings).then(
        () => null,
        (e: unknown) => e,
      );
      if (ok) {
        expect(error).toBeNull();
        continue;
      }
      expect(error).toBeInstanceOf(InputError);
      const e = error as InputError;
      expect(e.code).toBe('target-domain');
      expect(e.location).toMatchObject({ file: 'data/train.csv', line: 8, key: 'y' });
      expect(e.message).toContain('-0.5');
      expect(e.message).toContain(`target_transform: ${transform}`);
    }
  });

  it('sqrt with sigma needs targets above 0 (the slope at 0 is infinite)', async () => {
    const zero = { ...holdout, y: holdout.y.map((v, i) => (i === 2 ? 0 : v)) };
    const settings = defaultSettings();
    const r = repo('  target_transform: sqrt\n  sigma: s\n', { train: csv(train), holdout: csv(zero) });
    await expect(fitModel(r, await loadDescriptor(r, 'models/m.model.yml', settings), settings)).rejects.toMatchObject({
      code: 'target-domain',
      location: { file: 'data/holdout.csv', line: 4, key: 'y' },
    });
    const plain = repo('  target_transform: sqrt\n', { train: csv(train), holdout: csv(zero) });
    await expect(fitModel(plain, await loadDescriptor(plain, 'models/m.model.yml', settings), settings)).resolves.toBeDefined();
  });

  it('limits_scale without a transform, and a transform on a classifier, are descriptor errors at their line', async () => {
    const settings = defaultSettings();
    const r = repo('  limits_scale: transformed\n');
    await expect(loadDescriptor(r, 'models/m.model.yml', settings)).rejects.toMatchObject({
      code: 'target-transform',
      location: { line: 7 },
    });
    const c = createMemoryRepository({
      'models/m.model.yml':
        'version: 1\nname: m\ntask: classification\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\n  target_transform: log\nterms:\n  - linear: [x]\n',
      'data/train.csv': csv(train),
      'data/holdout.csv': csv(holdout),
    });
    await expect(loadDescriptor(c, 'models/m.model.yml', settings)).rejects.toMatchObject({
      code: 'target-transform',
      location: { line: 8 },
    });
  });

  it('a model without a transform has no target_scale block', async () => {
    const settings = defaultSettings();
    const r = repo('');
    const result = await evaluateModel(r, await loadDescriptor(r, 'models/m.model.yml', settings), settings);
    expect(result.target_scale).toBeUndefined();
  });
});
