// The base commit's curve on the fit-curve and partial-curve charts: a dashed path under the
// model's own curve, a legend entry "base commit", a sentence in the description; none without it.
import { describe, expect, it } from 'vitest';
import type { ChartData } from '../../../src/result/chart-types.js';
import { formatHtml } from '../../../src/report/html.js';
import { fitCurveChart } from '../../../src/report/svg/fit-curve.js';
import { partialCurveChart } from '../../../src/report/svg/partial-curve.js';
import { summarise } from '../../../src/result/result.js';
import { model } from '../../action/result-fixture.js';
import { oneInputCharts } from '../fixture.js';

const COMMIT = 'c0ffee1234567890c0ffee1234567890c0ffee12';

/** One-input chart data whose base commit's curve is a straight line over a wider range. */
function withBase(): ChartData {
  const c = oneInputCharts();
  c.fit = { ...c.fit!, base: { commit: COMMIT, x: [-1, 0, 1, 2, 3], y: [0, 1, 2, 3, 4] } };
  return c;
}

/** The legend labels of a chart, in order. */
function legend(svg: string): string[] {
  const g = /<g class="legend">(.*?)<\/g><\/svg>$/.exec(svg)?.[1] ?? '';
  return [...g.matchAll(/<text [^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);
}

describe('the base commit curve', () => {
  it('is drawn dashed under the fitted curve, in the legend and the description', () => {
    const c = withBase();
    const svg = fitCurveChart(c, c.fit!, { id: 'm1-fit' });
    const base =
      /<path class="base-curve" data-commit="c0ffee1" d="([^"]+)" fill="none" stroke="#6e6e6e" stroke-width="1.8" stroke-dasharray="5 4" stroke-linejoin="round"\/>/.exec(
        svg,
      );
    expect(base, svg).not.toBeNull();
    // Five points, one move and four lines; under (before) the model's own curve.
    expect(base![1].match(/[ML]/g)).toEqual(['M', 'L', 'L', 'L', 'L']);
    expect(svg.indexOf('class="base-curve"')).toBeLessThan(svg.indexOf('class="curve"'));
    expect(legend(svg)).toEqual(['training', 'hold-out', 'fitted', 'observed band', 'leaves band', 'base commit']);
    expect(svg).toContain('The dashed grey line is the same model fitted on the base commit c0ffee1.');
    // The x axis reaches the base curve's wider range.
    expect(svg).toMatch(/<text x="[\d.]+" y="[\d.]+" text-anchor="middle">-1<\/text>/);
  });

  it('keeps a long legend inside the picture', () => {
    const c = withBase();
    const svg = fitCurveChart(c, c.fit!, { id: 'm1-fit' });
    const first = /<g class="legend"><g transform="translate\(([\d.]+) 9\)">/.exec(svg);
    const labels = legend(svg);
    const natural = labels.reduce((w, l) => w + 28 + l.length * 6.1, 0);
    expect(Number(first![1]) + natural).toBeLessThanOrEqual(560 - 18 + 0.5);
    // A short legend still starts at the plot area's left edge.
    expect(fitCurveChart(oneInputCharts(), oneInputCharts().fit!, { id: 'x' })).toContain(
      '<g class="legend"><g transform="translate(68.0 9)">',
    );
  });

  it('is drawn on a partial curve, and absent from charts without one', () => {
    const c = oneInputCharts();
    const curve = { input: 'depth_m', others: { salinity: 35 }, range: [0, 2] as [number, number], x: [0, 1, 2], y: [1, 2, 3] };
    const plain = partialCurveChart(c, curve, { id: 'p' });
    expect(plain).not.toContain('base-curve');
    expect(legend(plain)).toEqual(['predicted, others at medians', 'training values']);
    const svg = partialCurveChart(c, { ...curve, base: { commit: COMMIT, x: [0, 1, 2], y: [1, 1, 1] } }, { id: 'p' });
    expect(svg).toContain('<path class="base-curve" data-commit="c0ffee1" d="M');
    expect(legend(svg)).toEqual(['predicted, others at medians', 'training values', 'base commit']);
    expect(fitCurveChart(c, c.fit!, { id: 'f' })).not.toContain('base commit');
  });

  it('appears in the HTML report only on the model that has it', () => {
    const html = formatHtml(
      summarise(
        [
          model({ name: 'changed', verdict: 'pass', charts: withBase() }),
          model({ name: 'same', verdict: 'pass', charts: oneInputCharts() }),
        ],
        '0.1.0',
        [],
      ),
    );
    const sections = html.split('<section class="model"').slice(1);
    expect(sections.length).toBe(2);
    expect((sections[0].match(/class="base-curve"/g) ?? []).length).toBe(1);
    expect(sections[1]).not.toContain('base-curve');
  });
});
