// The weighted figures beyond the fit itself, against an independent construction in numpy: the
// complexity check's degree sweep (each setting's weighted k-fold errors, every fold refitted from
// scratch by weighted least squares), the shipped coefficients' weighted RMSEs, and the spike
// figure's data variation from weighted means, to 1e-6 relative. Needs Debian python3-numpy.
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { runPythonJson } from '../tools/python-json.js';
import { requireTool, skipNote } from '../tools/require-tool.js';

const missing = requireTool(['python3-numpy']);
const TOLERANCE = 1e-6;
const FOLDS = 4;

/** Rows x (one decimal, so values repeat), w, y: y = 2 + x - 0.2x^3 + noise (fixed pseudo-random). */
function rows(n: number, seed: number): { x: number[]; w: number[]; y: number[] } {
  let state = seed >>> 0;
  const rand = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  const out = { x: [] as number[], w: [] as number[], y: [] as number[] };
  for (let i = 0; i < n; i++) {
    const x = Math.round(rand() * 40) / 10;
    const w = Number((0.1 + rand() * 4).toPrecision(6));
    const noise = (rand() + rand() + rand() - 1.5) * 0.8;
    out.x.push(x);
    out.w.push(w);
    out.y.push(Number((2 + x - 0.2 * x ** 3 + noise).toPrecision(10)));
  }
  return out;
}

const csv = (r: ReturnType<typeof rows>): string => `x,w,y\n${r.x.map((x, i) => `${x},${r.w[i]},${r.y[i]}`).join('\n')}\n`;
const train = rows(64, 21);
const holdout = rows(24, 22);
const SHIPPED = [1.9, 1.1, 0.05, -0.21];

const SCRIPT = `
import json, sys
import numpy as np
d = json.load(sys.stdin)
tr, ho, k, shipped = d['train'], d['holdout'], d['folds'], np.asarray(d['shipped'])
x, y, w = (np.asarray(tr[c], float) for c in ('x', 'y', 'w'))
n = len(y)
sizes = [n // k + (1 if f < n % k else 0) for f in range(k)]
fold = np.repeat(np.arange(k), sizes)
wn = w / w.mean()
def design(x, g):
    return np.column_stack([x ** j for j in range(g + 1)])
curve = []
for g in range(1, 7):
    X = design(x, g)
    r = np.empty(n)
    for f in range(k):
        keep = fold != f
        sw = np.sqrt(w[keep])
        b = np.linalg.lstsq(X[keep] * sw[:, None], y[keep] * sw, rcond=None)[0]
        r[~keep] = y[~keep] - X[~keep] @ b
    fold_mse = [float((wn[fold == f] * r[fold == f] ** 2).sum() / sizes[f]) for f in range(k)]
    curve.append({'degree': g, 'cv_rmse': float(np.sqrt((w * r * r).sum() / w.sum())), 'mean_mse': float(np.mean(fold_mse)),
                  'se_mse': float(np.std(fold_mse, ddof=1) / np.sqrt(k))})
def wrmse(part):
    xx, yy, ww = (np.asarray(part[c], float) for c in ('x', 'y', 'w'))
    r = yy - design(xx, 3) @ shipped
    return float(np.sqrt((ww * r * r).sum() / ww.sum()))
values = np.unique(x)
means = np.array([(w[x == v] * y[x == v]).sum() / w[x == v].sum() for v in values])
print(json.dumps({'curve': curve, 'shipped': [wrmse(tr), wrmse(ho)], 'data_variation': float(np.abs(np.diff(means)).sum())}))
`;

interface Reference {
  curve: { degree: number; cv_rmse: number; mean_mse: number; se_mse: number }[];
  shipped: [number, number];
  data_variation: number;
}

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe.skipIf(missing !== null)(`weighted sweep, shipped RMSEs and spike data variation against numpy${skipNote(missing)}`, () => {
  it(`match to ${TOLERANCE}`, async () => {
    const ref = runPythonJson<Reference>(SCRIPT, { train, holdout, folds: FOLDS, shipped: SHIPPED });
    const r = createMemoryRepository({
      'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\n  weight: w\nterms:\n  - polynomial: { of: x, degree: 3, shift: 0, scale: 1 }\nfit:\n  folds: ${FOLDS}\n  fold_order: blocks\ncoefficients: [${SHIPPED.join(', ')}]\n`,
      'data/train.csv': csv(train),
      'data/holdout.csv': csv(holdout),
    });
    const settings = defaultSettings();
    const result = await evaluateModel(r, await loadDescriptor(r, 'models/m.model.yml', settings), settings);
    const detail = result.checks.find((c) => c.id === 'complexity')?.detail as {
      setting: string;
      curve: { setting: number; cv_rmse: number; mean_mse: number; se_mse: number }[];
    };
    expect(detail.setting).toBe('degree');
    expect(detail.curve.map((p) => p.setting)).toEqual(ref.curve.map((p) => p.degree));
    detail.curve.forEach((p, i) => {
      for (const key of ['cv_rmse', 'mean_mse', 'se_mse'] as const)
        expect(rel(p[key], ref.curve[i][key]), `degree ${p.setting} ${key}: ${p[key]} against ${ref.curve[i][key]}`).toBeLessThan(
          TOLERANCE,
        );
    });
    // The current degree's weighted k-fold RMSE is the cross-validation check's too.
    expect(rel(result.metrics?.cv_rmse as number, ref.curve[2].cv_rmse)).toBeLessThan(TOLERANCE);
    expect(rel(result.shipped?.train_rmse as number, ref.shipped[0])).toBeLessThan(TOLERANCE);
    expect(rel(result.shipped?.holdout_rmse as number, ref.shipped[1])).toBeLessThan(TOLERANCE);
    const spikes = result.checks.find((c) => c.id === 'swing-spikes')?.detail as { inputs: { data_variation: number }[] };
    expect(rel(spikes.inputs[0].data_variation, ref.data_variation)).toBeLessThan(TOLERANCE);
  });
});
