// A published worked example of a weighted straight-line fit: K. Pearson's data (Philos. Mag. 2,
// 559, 1901) with the weights in y of D. York (Can. J. Phys. 44, 1079, 1966). Fitted by weighted
// least squares with uncertainties in y only, the published figures are intercept 6.100 ± 0.205,
// slope -0.6108 ± 0.0300 and reduced chi-square 4.29 (M. Lybanon, Am. J. Phys. 52, 22, 1984, as
// tabulated by T. M. Huber, physics.gac.edu/~huber/fitting/pearson.htm). The ten rows below are
// from memory; that they reproduce every published figure to its printed digits is the check
// that they are the published ones.
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { fitModel } from '../../src/run/fit-model.js';

const X = [0.0, 0.9, 1.8, 2.6, 3.3, 4.4, 5.2, 6.1, 6.5, 7.4];
const Y = [5.9, 5.4, 4.4, 4.6, 3.5, 3.7, 2.8, 2.8, 2.4, 1.5];
const WY = [1, 1.8, 4, 8, 20, 20, 70, 70, 100, 500];

/** The same rows as training and hold-out (only the fit is compared here). */
function repo(weighting: string) {
  const csv = `x,y,w,sigma\n${X.map((x, i) => `${x},${Y[i]},${WY[i]},${1 / Math.sqrt(WY[i])}`).join('\n')}\n`;
  return createMemoryRepository({
    'models/line.model.yml': `version: 1\nname: line\ndata:\n  train: ../data/rows.csv\n  holdout: ../data/rows.csv\n  target: y\n  ${weighting}\nterms:\n  - linear: [x]\nlimits:\n  leakage: off\n`,
    'data/rows.csv': csv,
  });
}

/** Rounds to `digits` significant digits, as a publication prints. */
const printed = (v: number, digits: number): number => Number(v.toPrecision(digits));

describe('weighted straight line on Pearson (1901) with York (1966) weights, published by Lybanon (1984)', () => {
  it('data.weight: intercept 6.100 and slope -0.6108', async () => {
    const r = repo('weight: w');
    const settings = defaultSettings();
    const model = await fitModel(r, await loadDescriptor(r, 'models/line.model.yml', settings), settings);
    const [a0, a1] = Array.from(model.fit.coefficients);
    expect(printed(a0, 4)).toBe(6.1);
    expect(printed(a1, 4)).toBe(-0.6108);
  });

  it('data.sigma = 1/sqrt(w): the same line and reduced chi-square 4.29', async () => {
    const r = repo('sigma: sigma');
    const settings = defaultSettings();
    const descriptor = await loadDescriptor(r, 'models/line.model.yml', settings);
    const model = await fitModel(r, descriptor, settings);
    const [a0, a1] = Array.from(model.fit.coefficients);
    expect(printed(a0, 4)).toBe(6.1);
    expect(printed(a1, 4)).toBe(-0.6108);
    const result = await evaluateModel(r, descriptor, settings);
    expect(result.error).toBeNull();
    expect(printed(result.metrics?.train_chi_square as number, 3)).toBe(4.29);
  });
});
