// The text, Markdown and HTML reports show a transformed target's figures on both scales, the
// scale the limits judged marked, with the numbers of the Result's `target_scale` block.
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { formatNumber } from '../../src/core/format.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { formatHtml } from '../../src/report/html.js';
import { formatMarkdown } from '../../src/report/markdown.js';
import { formatText } from '../../src/report/text.js';
import { fromJsonNumber, summarise, type Result } from '../../src/result/result.js';
import { evaluateModel } from '../../src/run/evaluate.js';

async function run(extra: string): Promise<Result> {
  const rowsOf = (n: number, phase: number) =>
    Array.from({ length: n }, (_, i) => {
      const x = (i * 7 + phase) % 23;
      return `${x},${(Math.exp(0.1 * x) * (1 + 0.05 * Math.sin(3 * i + phase))).toPrecision(8)}`;
    }).join('\n');
  const r = createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: kiln-log\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\n${extra}terms:\n  - linear: [x]\nlimits:\n  gap_ratio: 0.5\n`,
    'data/train.csv': `x,y\n${rowsOf(30, 1)}\n`,
    'data/holdout.csv': `x,y\n${rowsOf(12, 4)}\n`,
  });
  const settings = defaultSettings();
  const model = await evaluateModel(r, await loadDescriptor(r, 'models/m.model.yml', settings), settings);
  return summarise([model], '0.0.0');
}

describe('reports of a transformed target', () => {
  it('text, Markdown and HTML show both scales with the judged one marked', async () => {
    const result = await run('  target_transform: log\n');
    const m = result.models[0];
    expect(m.verdict).toBe('fail');
    const ts = m.target_scale;
    if (ts === undefined) throw new Error('no target_scale');
    const original = formatNumber(fromJsonNumber(ts.original.holdout_rmse));
    const transformed = formatNumber(fromJsonNumber(ts.transformed.holdout_rmse));
    expect(original).not.toBe(transformed);
    const text = formatText(result);
    const markdown = formatMarkdown(result);
    const html = formatHtml(result);
    for (const out of [text, markdown, html]) {
      expect(out).toContain('Fitted on log(y)');
      expect(out).toContain('a median of y, not its mean');
      expect(out).toContain('the limits judge the original scale');
      expect(out).toContain('original (limits)');
      expect(out).toContain(original);
      expect(out).toContain(transformed);
    }
    expect(text).toMatch(/original \(limits\)\s+\S+\s+\S+/);
    expect(markdown).toContain('| Scale | Training RMSE | Hold-out RMSE | Hold-out MAE | Hold-out R^2 | Gap ratio | CV RMSE |');
    expect(html).toContain('<table class="target-scale">');
    // The overview's hold-out RMSE is the judged (original) scale's.
    expect(fromJsonNumber(m.metrics?.holdout_rmse ?? 'NaN')).toBe(fromJsonNumber(ts.original.holdout_rmse));
  });

  it('limits on the transformed scale mark that row; without a transform no table', async () => {
    const judged = await run('  target_transform: log1p\n  limits_scale: transformed\n');
    expect(formatText(judged)).toContain('transformed (limits)');
    expect(formatMarkdown(judged)).toContain('Fitted on log(1 + y)');
    const plain = await run('');
    for (const out of [formatText(plain, { verbose: true }), formatMarkdown(plain), formatHtml(plain)])
      expect(out).not.toContain('Fitted on');
  });
});
