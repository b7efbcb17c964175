// The base commit's curves in the Result: on the models a pull request changed, bounded like the
// head's own curves; not on new models nor on models whose fit is the same.
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ACTION_FETCH_HINT, evaluateBase } from '../../src/action/base-commit.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { CURVE_POINTS } from '../../src/result/chart-types.js';
import type { ModelResult, Result } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { withBaseCurves } from '../../src/run/base-curves.js';
import { makeFixture } from '../action/fixture.js';
import { oneInputCharts } from '../report/fixture.js';
import { model } from '../action/result-fixture.js';

let result: Result;
let baseSha = '';
let baseline: ReadonlyMap<string, ModelResult>;

beforeAll(async () => {
  const fixture = makeFixture();
  baseSha = fixture.baseSha;
  const settings = {
    root: path.join(fixture.workspace, 'ml'),
    config: 'fitgate.yml',
    configExplicit: false,
    descriptors: [],
    failOn: 'fail' as const,
  };
  const options = await evaluateBase(settings, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
  baseline = options.baseline!;
  result = await runPipeline(settings, createFsRepository(settings.root), { ...options, jobs: 1 });
});

describe('base curves of a pull request', () => {
  it('go on the changed model only: `wide` (degree 2 to 3), not on unchanged, new or broken ones', () => {
    const byName = new Map(result.models.map((m) => [m.name, m]));
    const wide = byName.get('wide')!.charts!.fit!;
    expect(wide.base?.commit).toBe(baseSha);
    // The base run's own curve, as bounded as the head's (a grid of CURVE_POINTS plus the points it adds).
    const own = baseline.get('wide')!.charts!.fit!;
    expect(wide.base!.x).toEqual(own.x);
    expect(wide.base!.y).toEqual(own.y);
    expect(wide.base!.x.length).toBeGreaterThanOrEqual(CURVE_POINTS);
    // The base is the quadratic fit: not the head's cubic curve.
    expect(wide.base!.y).not.toEqual(wide.y);
    // `steady` changed only its hold-out rows: same fit, same curve, nothing to overlay.
    for (const name of ['steady', 'lean', 'fresh']) expect(byName.get(name)!.charts!.fit!.base, name).toBeUndefined();
  });

  it('are matched by input, and leave the head charts as they were', () => {
    const head = oneInputCharts();
    const baseCharts = oneInputCharts();
    baseCharts.fit = { ...baseCharts.fit!, y: [1, 1, 1, 1, 1] };
    const baseline = model({ name: 'm', verdict: 'pass', charts: baseCharts, coefficients: [1, 2] });
    const out = withBaseCurves(head, { columns: ['(intercept)', 'x'], coefficients: [1, 2] }, baseline, 'abc');
    expect(out.fit!.base).toEqual({ commit: 'abc', x: [0, 0.5, 1, 1.5, 2], y: [1, 1, 1, 1, 1] });
    expect(head.fit!.base).toBeUndefined();
    // Another input on the base: no overlay; an unchanged model or no baseline: the charts themselves.
    const other = model({ name: 'm', verdict: 'pass', charts: { ...baseCharts, fit: { ...baseCharts.fit!, input: 'other' } } });
    expect(withBaseCurves(head, { columns: ['(intercept)', 'x'], coefficients: [3, 4] }, other, 'abc').fit!.base).toBeUndefined();
    const same = model({ name: 'm', verdict: 'pass', charts: oneInputCharts(), coefficients: [1, 2] });
    expect(withBaseCurves(head, { columns: ['(intercept)', 'x'], coefficients: [1, 2] }, same, 'abc')).toBe(head);
    expect(withBaseCurves(head, { columns: ['(intercept)', 'x'], coefficients: [1, 2] }, null, 'abc')).toBe(head);
  });
});
