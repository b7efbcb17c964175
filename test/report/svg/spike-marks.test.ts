// The in-band spikes in the charts: narrow radial bumps (as in the issue, with 51 centres 2 apart, width 1,
// 26 training rows over 0..100) fail `swing-spikes`; the chart data then marks the intervals between
// neighbouring training values where the curve goes up and down, and the HTML fit-curve chart draws
// them as bars with a legend entry and a sentence in its text alternative. A smooth fit of the same
// rows, and a steep but monotone curve, mark nothing.
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../../src/config/descriptor.js';
import { defaultSettings } from '../../../src/config/settings-file.js';
import { createDesign } from '../../../src/design/design-matrix.js';
import { createTerm } from '../../../src/design/terms/index.js';
import { spikeIntervals } from '../../../src/diagnostics/spikes.js';
import { createMemoryRepository } from '../../../src/repo/memory-repository.js';
import { formatHtml } from '../../../src/report/html.js';
import { summarise } from '../../../src/result/result.js';
import { evaluateModel } from '../../../src/run/evaluate.js';

const xs = Array.from({ length: 26 }, (_, i) => i * 4);
const ys = xs.map((v, i) => 20 + 0.1 * v + 2 * Math.sin(v / 15) + ((i * 7) % 5) * 0.1);
const holdoutXs = xs.slice(0, 25).map((v) => v + 2);

async function model(term: string) {
  const rows = (x: number[]) => x.map((v) => `${v},${(20 + 0.1 * v + 2 * Math.sin(v / 15)).toPrecision(8)}`).join('\n');
  const r = createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: bumps\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - ${term}\nlimits:\n  complexity: off\n`,
    'data/train.csv': `x,y\n${xs.map((v, i) => `${v},${ys[i]}`).join('\n')}\n`,
    'data/holdout.csv': `x,y\n${rows(holdoutXs)}\n`,
  });
  const settings = defaultSettings();
  return evaluateModel(r, await loadDescriptor(r, 'models/m.model.yml', settings), settings);
}

describe('spike marks in the charts', () => {
  it('narrow bumps: the failing swing-spikes check marks the intervals between the samples, and the chart draws them', async () => {
    const m = await model('rbf: { of: x, centers: { from: 0, to: 100, step: 2 }, width: 1 }');
    const check = m.checks.find((c) => c.id === 'swing-spikes');
    expect(check?.status, check?.message).toBe('fail');
    const spikes = m.charts?.fit?.spikes;
    expect(spikes?.limit).toBe(1.5);
    const intervals = spikes?.intervals ?? [];
    // Many of the 25 gaps between neighbouring samples hold a bump that falls back between them.
    expect(intervals.length).toBeGreaterThanOrEqual(10);
    for (const s of intervals) {
      expect(xs).toContain(s.from);
      expect(s.to - s.from).toBe(4);
      expect(s.variation as number).toBeGreaterThan(1.5 * (s.allowed as number));
    }
    const html = formatHtml(summarise([m], '0.0.0'));
    const group = html.match(/<g class="spikes" data-count="(\d+)"[^>]*>(.*?)<\/g>/);
    expect(group?.[1]).toBe(String(intervals.length));
    expect(group?.[2].match(/<rect class="spike" /g)?.length).toBe(intervals.length);
    expect(html).toContain('spikes (&gt; 1.5x)');
    expect(html).toContain(`Bars along the top mark ${intervals.length} intervals between neighbouring training values`);
    expect(html).toMatch(/data-chart="fit-curve"[^>]*data-spikes="\d+"/);
  });

  it('a smooth fit of the same rows marks nothing and draws no bars', async () => {
    const m = await model('spline: { of: x, knots: { count: 3 }, natural: true }');
    expect(m.checks.find((c) => c.id === 'swing-spikes')?.status).toBe('pass');
    expect(m.charts?.fit?.spikes).toBeUndefined();
    expect(formatHtml(summarise([m], '0.0.0'))).not.toContain('class="spikes"');
  });

  it('a steep monotone curve between sparse samples is not a spike; bumps are', () => {
    const x = Float64Array.from([0, 1, 2, 10, 11]);
    const y = Float64Array.from([0, 1, 2, 10, 11]);
    const columns = new Map([['x', x]]);
    const cubic = createDesign(
      [createTerm({ kind: 'polynomial', of: 'x', degree: 3, shift: 0, scale: 1, line: 1 }, columns, 'm.model.yml')],
      true,
    );
    // f(x) = x^3 / 100: steep over [2, 10], but only rising.
    expect(spikeIntervals(cubic, { inputs: [x], y, rows: 5 }, [0, 0, 0, 0.01], 0, 1.5)).toEqual([]);
    // f(x) = x + 5 sin(pi x): through every sample (sin(pi k) = 0), up and down between them.
    const wave = createDesign([createTerm({ kind: 'fourier', of: 'x', period: 2, harmonics: 1, line: 1 }, columns, 'm.model.yml')], false);
    const marked = spikeIntervals(wave, { inputs: [x], y, rows: 5 }, [5, 0], 0, 1.5);
    // Every interval: [2, 10] holds four periods of the wave.
    expect(marked.map((s) => [s.from, s.to])).toEqual([
      [0, 1],
      [1, 2],
      [2, 10],
      [10, 11],
    ]);
    expect(spikeIntervals(wave, { inputs: [x], y, rows: 5 }, [0.2, 0], 0, 1.5)).toEqual([]);
  });
});
