/**
 * Accuracy against the NIST Statistical Reference Datasets, Linear Least Squares Regression
 * (NIST Information Technology Laboratory, https://www.itl.nist.gov/div898/strd/; each dataset's
 * page is https://www.itl.nist.gov/div898/strd/lls/data/<Name>.shtml). Files are read from the
 * shared reference folder, never copied into the repository.
 *
 * Measure: log relative error LRE = -log10(|est - cert| / |cert|), capped at 15, and
 * -log10|est| for a certified 0 (the usual convention; see the reference README). Bar: >= 9
 * on every dataset, >= 7 on Filip, for every certified parameter estimate and for the residual
 * standard deviation sqrt(rss / (n - p)). Designs are the certified models: raw powers, no
 * centring. The bar is met with `refine: true` (one refinement pass); the plain QR figures are
 * printed beside them.
 */
import { describe, expect, it } from 'vitest';
import { fitDesign, REFINE_MIN_CONDITION } from '../../src/fit/index.js';
import { requireTool, skipNote } from '../tools/require-tool.js';
import { lre, nistDesign, readNist } from './nist.js';

const DATASETS = ['Norris', 'Pontius', 'NoInt1', 'NoInt2', 'Filip', 'Longley', 'Wampler1', 'Wampler2', 'Wampler3', 'Wampler4', 'Wampler5'];
const missing = requireTool(['shared/reference']);

describe.skipIf(missing !== null)(`NIST StRD linear least squares${skipNote(missing)}`, () => {
  it.each(DATASETS)('%s: coefficients and residual SD to the required LRE', (name) => {
    const d = readNist(name);
    const { X, n, p } = nistDesign(d);
    const y = Float64Array.from(d.y);
    const bar = name === 'Filip' ? 7 : 9;
    const figures: string[] = [];
    let result: { coef: number[]; sd: number } | undefined;
    for (const refine of [false, true]) {
      const fit = fitDesign(X, y, n, p, { refine });
      const coef = d.estimates.map((c, j) => lre(fit.coefficients[j], c));
      const sd = lre(Math.sqrt(fit.rss / (n - p)), d.residualSd);
      figures.push(
        `${refine ? 'refined' : 'plain'}: min LRE coefficients ${Math.min(...coef).toFixed(2)}, residual SD ${sd.toFixed(2)}${fit.refined !== refine ? ` (refinement not applied: scaled condition ${fit.conditionNumberScaled.toPrecision(2)}, ${fit.conditionNumberScaled <= REFINE_MIN_CONDITION ? 'already accurate' : 'too large'})` : ''}`,
      );
      if (refine) result = { coef, sd };
      expect(fit.rank, `${name} rank`).toBe(p);
    }
    console.log(`NIST StRD ${name} (n ${n}, p ${p}, bar ${bar}): ${figures.join('; ')}`);
    const r = result as { coef: number[]; sd: number };
    r.coef.forEach((v, j) => {
      expect(v, `${name} B${j + d.firstIndex}: LRE ${v.toFixed(2)} (certified ${d.estimates[j]}), bar ${bar}`).toBeGreaterThanOrEqual(bar);
    });
    expect(r.sd, `${name} residual SD: LRE ${r.sd.toFixed(2)} (certified ${d.residualSd}), bar ${bar}`).toBeGreaterThanOrEqual(bar);
  });

  it('parser: Longley has 7 estimates and 16 rows of 6 predictors; NoInt1 has no intercept', () => {
    const longley = readNist('Longley');
    expect(longley.estimates.length).toBe(7);
    expect(longley.y.length).toBe(16);
    expect(longley.x.length).toBe(6);
    expect(readNist('NoInt1').firstIndex).toBe(1);
    expect(readNist('Filip').y.length).toBe(82);
  });
});

describe('lre', () => {
  it('counts matching digits, caps at 15 and uses the absolute error for a certified 0', () => {
    expect(lre(1.0001, 1)).toBeCloseTo(4, 6);
    expect(lre(1, 1)).toBe(15);
    expect(lre(1e-12, 0)).toBeCloseTo(12, 6);
    expect(lre(NaN, 1)).toBe(0);
  });
});
