// The JSON report of classifiers, with their chart data and a base comparison, satisfies the
// strict report schema (which `fitgate merge` checks shard reports against), and its chart data
// stays within the documented bounds.
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { validateReport } from '../../src/config/generated/report-validator.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { ROC_MAX_POINTS, CALIBRATION_BINS } from '../../src/result/classifier-chart-types.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

const root = fileURLToPath(new URL('../../examples/classifiers', import.meta.url));

describe('classifier reports against the report schema', () => {
  it('validates, with classifier_charts and base fields, and the chart data is bounded', async () => {
    const settings = defaultSettings(root);
    const repo = createFsRepository(root);
    const base = await runPipeline(settings, repo, { jobs: 1 });
    const result = await runPipeline(settings, repo, {
      jobs: 1,
      baseline: new Map(base.models.map((m) => [m.name, m])),
      baseCommit: 'a'.repeat(40),
    });
    const report = JSON.parse(JSON.stringify(result));
    const ok = validateReport(report);
    expect(ok, JSON.stringify((validateReport as unknown as { errors: unknown }).errors)).toBe(true);
    const checked = result.models.filter((m) => !m.error);
    expect(checked.length).toBeGreaterThanOrEqual(3);
    for (const m of checked) {
      const c = m.classifier_charts!;
      expect(m.base?.holdout_log_loss_change).toBe(0);
      for (const roc of [c.roc.train, c.roc.holdout]) {
        expect(roc.fpr.length).toBeLessThanOrEqual(ROC_MAX_POINTS);
        expect(roc.fpr[0]).toBe(0);
        expect(roc.tpr[roc.tpr.length - 1]).toBe(1);
      }
      expect(c.calibration.train.length).toBe(CALIBRATION_BINS);
      expect(c.calibration.holdout.reduce((s, b) => s + b.count, 0)).toBe(m.rows.holdout);
      expect(c.train.rows).toBe(m.rows.train);
    }
    // A renamed model's comparison (status `renamed` with `previous`) is part of the schema too.
    const renamed = JSON.parse(JSON.stringify(result));
    renamed.models[0].base = {
      ...renamed.models[0].base,
      status: 'renamed',
      previous: { name: 'old', descriptor: 'models/old.model.yml', matched_by: 'data' },
    };
    expect(validateReport(renamed)).toBe(true);
    // A chart list that is not bounded is refused.
    const bad = JSON.parse(JSON.stringify(result));
    bad.models[0].classifier_charts.roc.train.fpr = Array.from({ length: ROC_MAX_POINTS + 1 }, () => 0);
    expect(validateReport(bad)).toBe(false);
  });
});
