// The classifier example (examples/classifiers, an invented apple sorting line): one classifier
// passes, one fails on separation, one fails on events per parameter and calibration slope.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { formatHtml } from '../../src/report/html.js';
import { formatJunit } from '../../src/report/junit.js';
import { formatMarkdown } from '../../src/report/markdown.js';
import { formatSarif } from '../../src/report/sarif.js';
import { formatText } from '../../src/report/text.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

const dir = path.resolve(fileURLToPath(new URL('../../examples/classifiers', import.meta.url)));

describe('examples/classifiers', async () => {
  const result = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
  const model = (name: string) => {
    const m = result.models.find((x) => x.name === name);
    if (!m) throw new Error(`no model ${name}`);
    return m;
  };
  const status = (name: string, id: string) => model(name).checks.find((c) => c.id === id)?.status;

  it('the text report carries each classifier figures; the Markdown report a calibration chart per classifier that does not pass', () => {
    const text = formatText(result);
    expect(text).toMatch(/FAIL wax-defect .*\n {2}classifier: log-loss 0\.3011 \/ 0\.4802 \(train \/ hold-out\), AUC 0\.7986 \/ 0\.5869/);
    const markdown = formatMarkdown(result);
    expect(markdown).toContain(
      'title "wax-defect: hold-out calibration (bars observed, line predicted; rows per bin 200, 108, 47, 34, 11)"',
    );
    expect(markdown).not.toContain('bruise-reject: hold-out calibration');
  });
  it('the JSON, SARIF, JUnit and HTML reports carry the classifier checks', () => {
    const json = JSON.parse(JSON.stringify(result));
    expect(
      json.models.find((m: { name: string }) => m.name === 'stem-check').checks.find((c: { id: string }) => c.id === 'separation').detail
        .kind,
    ).toBe('complete');
    const sarif = JSON.parse(formatSarif(result));
    const results = sarif.runs[0].results as { ruleId: string; level: string }[];
    expect(results.some((r) => r.ruleId === 'separation' && r.level === 'error')).toBe(true);
    expect(results.some((r) => r.ruleId === 'calibration-slope' && r.level === 'error')).toBe(true);
    const junit = formatJunit(result);
    expect(junit).toMatch(/<testcase [^>]*name="separation"/);
    expect(junit).toMatch(/events-per-parameter/);
    const html = formatHtml(result);
    expect(html).toContain('wax-defect');
    expect(html).toContain('calibration-slope');
  });
  it('bruise-reject passes', () => {
    expect(model('bruise-reject').error).toBeNull();
    expect(model('bruise-reject').verdict).toBe('pass');
  });
  it('stem-check fails on complete separation', () => {
    expect(status('stem-check', 'separation')).toBe('fail');
    expect(model('stem-check').verdict).toBe('fail');
  });
  it('stem-check (ridge 0, separated rows): neither the fit nor its folds count as converged, and the report says so', () => {
    const m = model('stem-check');
    expect((m.metrics as Record<string, unknown>).fit_converged).toBe(0);
    const cv = m.checks.find((c) => c.id === 'cross-validation');
    expect((cv?.detail as { converged?: boolean } | undefined)?.converged).toBe(false);
    expect(cv?.message).toContain('(a fold fit did not converge)');
    // The penalised examples are unaffected.
    expect((model('bruise-reject').metrics as Record<string, unknown>).fit_converged).toBe(1);
  });
  it('wax-defect fails on events per parameter and calibration slope', () => {
    expect(status('wax-defect', 'events-per-parameter')).toBe('fail');
    expect(status('wax-defect', 'calibration-slope')).toBe('fail');
  });
});
