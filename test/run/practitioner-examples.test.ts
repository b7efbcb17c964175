// The second example repository (examples/practitioner/: models as practitioners write them, with
// invented data) runs in-process with the verdicts its README promises, and every new check
// appears in every model's outcomes.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'examples', 'practitioner');

describe('examples/practitioner', () => {
  it('each model passes, with its new term, weights and limits measured', async () => {
    const result = await runPipeline(defaultSettings(root), createFsRepository(root));
    const byName = new Map(result.models.map((m) => [m.name, m]));
    const summary = result.models.map(
      (m) =>
        `${m.name}: ${m.verdict} ${m.checks
          .filter((c) => c.status === 'warn' || c.status === 'fail')
          .map((c) => `${c.id} ${c.message}`)
          .join('; ')}`,
    );
    expect(
      result.models.map((m) => m.verdict),
      summary.join('\n'),
    ).toEqual(result.models.map(() => 'pass'));
    expect([...byName.keys()].sort()).toEqual([
      'cellar-sensor',
      'haze-storage',
      'must-cooling',
      'press-batches',
      'refractometer',
      'shop-demand',
      'yeast-dose',
    ]);
    for (const m of result.models) {
      for (const id of ['holdout-r2', 'holdout-rmse', 'holdout-mae', 'chi-square', 'swing-spikes'])
        expect(m.checks.some((c) => c.id === id)).toBe(true);
      expect(m.checks.find((c) => c.id === 'holdout-r2')?.status).toBe('pass');
    }
    expect(byName.get('cellar-sensor')?.columns).toEqual([
      '(intercept)',
      'z(temp_c)',
      'z(rh_pct)',
      'z(temp_c)^2',
      'z(temp_c)*z(rh_pct)',
      'z(rh_pct)^2',
    ]);
    expect(byName.get('yeast-dose')?.columns).toEqual(['(intercept)', 'z(log(dose_g_hl))', 'z(log(dose_g_hl))^2']);
    expect(byName.get('shop-demand')?.checks.find((c) => c.id === 'holdout-rmse')?.status).toBe('pass');
    expect(byName.get('shop-demand')?.columns.slice(-2)).toEqual(['promotion=flyer', 'promotion=radio']);
    const chi = byName.get('refractometer')?.checks.find((c) => c.id === 'chi-square');
    expect(chi?.status, chi?.message).toBe('pass');
    // The log-scale input is scanned on its own scale: every point above 0, margins in log units.
    const swingDetail = byName.get('yeast-dose')?.checks.find((c) => c.id === 'swing')?.detail as
      | { curves: { x: number[]; range: [number, number] }[] }
      | undefined;
    const curve = swingDetail?.curves[0] ?? { x: [], range: [Number.NaN, Number.NaN] as [number, number] };
    const [lo, hi] = curve.range;
    expect(Math.min(...curve.x)).toBeCloseTo(lo / (hi / lo) ** 0.1, 6);
    expect(Math.max(...curve.x)).toBeCloseTo(hi * (hi / lo) ** 0.1, 6);
    expect(byName.get('must-cooling')?.checks.find((c) => c.id === 'complexity')?.detail).toMatchObject({ setting: 'knots' });
    // The log-target model: both scales reported, the limits judge the original one.
    const haze = byName.get('haze-storage');
    expect(haze?.target_scale).toMatchObject({ transform: 'log', limits_scale: 'original', back_transform: 'exp' });
    expect(haze?.metrics?.holdout_rmse).toBe(haze?.target_scale?.original.holdout_rmse);
    expect(haze?.metrics?.holdout_rmse).not.toBe(haze?.target_scale?.transformed.holdout_rmse);
  });
});
