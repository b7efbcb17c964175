import { describe, expect, it } from 'vitest';
import { mermaidChart } from '../../src/report/mermaid.js';
import { awkwardResult, oneInputCharts } from './fixture.js';
import type { ModelResult } from '../../src/result/result.js';

function model(charts: ModelResult['charts']): ModelResult {
  const m = awkwardResult().models[1];
  return { ...m, charts };
}

describe('mermaidChart', () => {
  it('draws the fitted curve of a one-input model with its band, escaped (golden)', () => {
    expect(mermaidChart(model(oneInputCharts()))).toBe(
      [
        '```mermaid',
        'xychart-beta',
        `  title "a|b ‹c› & 'd' 'e' 🍎 'f' ＃g;: fitted temp_c, band 1 to 3"`,
        '  x-axis "depth_m (m)" 0 --> 2',
        '  y-axis "temp_c (°C)" -1 --> 5',
        '  line [1, 1.5, 2, 3.5, 3]',
        '  line [3, 3, 3, 3, 3]',
        '  line [1, 1, 1, 1, 1]',
        '```',
        '',
      ].join('\n'),
    );
  });

  it('clips NaN and far-off curve values to one band width past the band and says so', () => {
    const c = oneInputCharts();
    if (!c.fit) throw new Error('fixture has a curve');
    c.fit.y = [1, null, 1e12, -1e12, 3];
    const text = mermaidChart(model(c)) ?? '';
    expect(text).toContain('band 1 to 3 (clipped)');
    expect(text).toContain('  line [1, 5, 5, -1, 3]');
  });

  it('draws the sweep when there is no curve, and the coefficient bars with the limit otherwise (golden)', () => {
    const c = oneInputCharts();
    c.fit = null;
    expect(mermaidChart(model(c))).toBe(
      [
        '```mermaid',
        'xychart-beta',
        `  title "a|b ‹c› & 'd' 'e' 🍎 'f' ＃g;: cross-validated RMSE over degree, chosen 3, suggested 2"`,
        '  x-axis "degree" ["1", "2", "3"]',
        '  y-axis "cross-validated RMSE"',
        '  line [2, 1, 1.5]',
        '```',
        '',
      ].join('\n'),
    );
    c.sweep = null;
    expect(mermaidChart(model(c))).toBe(
      [
        '```mermaid',
        'xychart-beta',
        `  title "a|b ‹c› & 'd' 'e' 🍎 'f' ＃g;: standardised coefficient sizes, fail limit 25"`,
        `  x-axis ["z(depth_m)", "a|b ‹c› & 'd' 'e' 🍎 'f' ＃g;"]`,
        '  y-axis "|standardised coefficient|"',
        '  bar [0.5, 30]',
        '  line [25, 25]',
        '```',
        '',
      ].join('\n'),
    );
  });

  it('gives null for a model without chart data', () => {
    expect(mermaidChart(awkwardResult().models[0])).toBeNull();
  });

  it('samples long curves evenly to at most maxValues, keeping both ends', () => {
    const c = oneInputCharts();
    if (!c.fit) throw new Error('fixture has a curve');
    c.fit.x = Array.from({ length: 101 }, (_, i) => i / 50);
    c.fit.y = c.fit.x.map((x) => 1 + x);
    const text = mermaidChart(model(c), { maxValues: 11 }) ?? '';
    const line = text.split('\n').find((l) => l.startsWith('  line ['));
    expect(line).toBe('  line [1, 1.2, 1.4, 1.6, 1.8, 2, 2.2, 2.4, 2.6, 2.8, 3]');
  });
});
