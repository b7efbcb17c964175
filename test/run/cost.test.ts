import { describe, expect, it } from 'vitest';
import { defaultSettings } from '../../src/config/settings-file.js';
import type { SettingsFile } from '../../src/config/types.js';
import { InputError } from '../../src/core/errors.js';
import { sweepComplexity, sweepShape } from '../../src/diagnostics/complexity.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { buildCost, checkBudget, estimateCost, modelShape, OVER_BUDGET, SVD_OPERATIONS, type ModelShape } from '../../src/run/cost.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { buildContext, descriptor, table } from '../checks/context.js';

/** n rows of x in [0, 10) and a smooth target with a little noise. */
function rows(n: number, seed = 1): number[][] {
  let s = seed;
  const u = (): number => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
  return Array.from({ length: n }, (_, i) => {
    const x = (10 * i) / n + 0.001 * u();
    return [x, Math.sin(x) + 0.1 * u()];
  });
}

function shape(over: Partial<ModelShape> = {}): ModelShape {
  return { trainRows: 10_000, holdoutRows: 2000, inputs: 1, columns: 10, buildPerRow: 40, folds: 5, shipped: false, sweep: null, ...over };
}

describe('the cost estimate', () => {
  it('grows with the rows in the passes and with p^3 in the decompositions', () => {
    const base = estimateCost(shape());
    const part = (e: ReturnType<typeof estimateCost>, stage: string): number =>
      e.parts.find((p) => p.stage === stage)?.operations ?? Number.NaN;
    const doubled = estimateCost(shape({ trainRows: 20_000 }));
    expect(part(doubled, 'fold pass') / part(base, 'fold pass')).toBe(2);
    const wide = estimateCost(shape({ columns: 20 }));
    // The fit's decompositions and the fold merges are the p^3 part (no rows in it).
    expect(part(wide, 'fold merges and fit') / part(base, 'fold merges and fit')).toBe(8);
    expect(part(wide, 'cross-validation') / part(base, 'cross-validation')).toBe(8);
    expect(base.total).toBe(base.parts.reduce((a, p) => a + p.operations, 0));
    // Below 2 folds there is no k-fold work at all.
    expect(part(estimateCost(shape({ folds: 1 })), 'cross-validation')).toBe(0);
  });

  it('counts a row of the design by its columns, radial columns dearer (an exponential each)', () => {
    const d = descriptor({
      terms: [
        { kind: 'polynomial', of: 'x', degree: 3, shift: null, scale: null },
        { kind: 'rbf', of: 'x', centers: { kind: 'list', values: [1, 2] }, width: 1 },
      ],
      target: 'y',
    });
    const t = table(['x', 'y'], [rows(50).map((r) => r[0]), rows(50).map((r) => r[1])]);
    const ctx = buildContext(d, t, t);
    // intercept + 3 powers at 4 each, 2 radial columns at 20 each
    expect(buildCost(ctx.design)).toBe(4 + 3 * 4 + 2 * 20);
  });

  it('follows the complexity sweep: the settings it counts are the settings the sweep fits', () => {
    const data = rows(400);
    const t = table(['x', 'y'], [data.map((r) => r[0]), data.map((r) => r[1])]);
    const cases = [
      descriptor({
        terms: [
          { kind: 'polynomial', of: 'x', degree: 4, shift: null, scale: null },
          { kind: 'linear', columns: ['x'] },
        ],
        target: 'y',
      }),
      descriptor({ terms: [{ kind: 'rbf', of: 'x', centers: { kind: 'count', from: 0, to: 10, count: 6 }, width: 2 }], target: 'y' }),
      descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', ridge: 0.5 }),
      descriptor({ terms: [{ kind: 'spline', of: 'x', knots: { kind: 'count', count: 3 }, degree: 3, natural: false }], target: 'y' }),
      descriptor({ terms: [{ kind: 'fourier', of: 'x', period: 10, harmonics: 2 }], target: 'y' }),
    ];
    for (const d of cases) {
      const ctx = buildContext(d, t, t);
      const predicted = sweepShape(d, ctx.design, 400);
      const sweep = sweepComplexity(d, ctx.design, ctx.train, ctx.fit);
      if (predicted === null || sweep === null) throw new Error(`no sweep for ${d.terms[0].kind}`);
      expect(predicted.kind).toBe(sweep.kind);
      expect(predicted.rows).toBe(sweep.rows);
      if (sweep.kind === 'ridge') expect(sweep.curve.length).toBeLessThanOrEqual(predicted.parameters.length);
      else expect(sweep.curve.map((c) => c.parameters)).toEqual(predicted.parameters);
    }
  });

  it('subsamples degree sweeps as the sweep does: above 50,000 rows it counts 50,000', () => {
    const d = descriptor({ terms: [{ kind: 'polynomial', of: 'x', degree: 2, shift: null, scale: null }], target: 'y' });
    const t = table(
      ['x', 'y'],
      [
        [1, 2, 3, 4],
        [1, 4, 9, 16],
      ],
    );
    const ctx = buildContext(d, t, t);
    expect(sweepShape(d, ctx.design, 1_000_000)).toEqual({ kind: 'degree', rows: 50_000, parameters: [2, 3, 4, 5, 6] });
    expect(modelShape(d, ctx.design, 1_000_000, 10).sweep?.rows).toBe(50_000);
  });

  it('refuses under the default cap the heaviest shape the other default caps allow, and passes an ordinary model', () => {
    const caps = defaultSettings().caps;
    // 200 columns x 1,000,000 rows = caps.max_cells: the fold pass alone is 4e10 operations.
    expect(estimateCost(shape({ trainRows: caps.maxCells / 200, columns: 200, buildPerRow: 800 })).total).toBeGreaterThan(
      caps.maxOperations,
    );
    // A 200-column design of radial columns with a width sweep: decompositions alone are over it.
    const p = 200;
    const rbf = shape({
      trainRows: 20_000,
      columns: p,
      buildPerRow: 20 * p,
      sweep: { kind: 'width', rows: 20_000, parameters: Array(7).fill(p) },
    });
    expect(estimateCost(rbf).parts.find((x) => x.stage === 'complexity sweep')?.operations).toBeGreaterThan(
      7 * 5 * 5 * SVD_OPERATIONS * p ** 3,
    );
    expect(estimateCost(rbf).total).toBeGreaterThan(caps.maxOperations);
    // 100,000 rows of a cubic in two inputs: far below.
    expect(estimateCost(shape({ trainRows: 100_000, holdoutRows: 25_000, inputs: 2, columns: 7, buildPerRow: 28 })).total).toBeLessThan(
      caps.maxOperations / 100,
    );
  });

  it('names the descriptor line, the largest stages and the cap to raise', () => {
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y' });
    const settings: SettingsFile = {
      ...defaultSettings(),
      file: 'ci/fitgate.yml',
      caps: { ...defaultSettings().caps, maxOperations: 1000 },
    };
    const estimate = estimateCost(shape());
    let error: unknown = null;
    try {
      checkBudget(d, estimate, settings);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(InputError);
    const e = error as InputError;
    expect(e.code).toBe(OVER_BUDGET);
    expect(e.location).toEqual({ file: d.file, line: d.termsLine, key: 'terms' });
    expect(e.message).toMatch(/^the estimated work of this model, \d\.\de\d+ operations, is over the cap of 1,?000 \(largest: /);
    expect(e.message).toContain('raise caps.max_operations in ci/fitgate.yml');
    expect(e.message).toMatch(/largest: scoring pass \d\.\de\d+ \(10000 \+ 2000 rows x 10 columns\), /);
    // At the cap it passes.
    expect(() => checkBudget(d, estimate, { ...settings, caps: { ...settings.caps, maxOperations: estimate.total } })).not.toThrow();
  });

  it('refuses an over-budget model before any pass over its rows: that model is an error, with the descriptor line', async () => {
    const csv = `x,y\n${rows(200)
      .map((r) => r.join(','))
      .join('\n')}\n`;
    const repo = createMemoryRepository({
      'm.model.yml':
        'version: 1\nname: m\ndata: { train: t.csv, holdout: t.csv, target: y }\nterms:\n  - polynomial: { of: x, degree: 3 }\n',
      't.csv': csv,
    });
    const settings: SettingsFile = { ...defaultSettings(), caps: { ...defaultSettings().caps, maxOperations: 1e6 } };
    const d = await loadDescriptor(repo, 'm.model.yml', settings);
    const result = await evaluateModel(repo, d, settings);
    expect(result.verdict).toBe('error');
    expect(result.error).toMatchObject({ code: OVER_BUDGET, file: 'm.model.yml', line: 4 });
    expect(result.error?.message).toContain('caps.max_operations');
    // Within the default cap it is checked as usual.
    expect((await evaluateModel(repo, d, defaultSettings())).error).toBeNull();
  });
});
