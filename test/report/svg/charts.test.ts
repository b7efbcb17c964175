import { describe, expect, it } from 'vitest';
import { coefficientBarsChart, MAX_BARS } from '../../../src/report/svg/coefficient-bars.js';
import { cvCurveChart } from '../../../src/report/svg/cv-curve.js';
import { fitCurveChart } from '../../../src/report/svg/fit-curve.js';
import { predictedActualChart } from '../../../src/report/svg/predicted-actual.js';
import { residualsChart } from '../../../src/report/svg/residuals.js';
import { oneInputCharts } from '../fixture.js';

function count(svg: string, series: string): number {
  const m = svg.match(new RegExp(`<g data-series="${series}" data-count="(\\d+)"[^>]*>(.*?)</g>`));
  if (!m) throw new Error(`no ${series} series in ${svg.slice(0, 200)}`);
  const marks = (m[2].match(/class="pt"/g) ?? []).length;
  expect(marks, `${series}: marks vs data-count`).toBe(Number(m[1]));
  return marks;
}

describe('point charts', () => {
  it('draw one mark per kept row, and skip rows without a finite value, saying so', () => {
    const c = oneInputCharts();
    c.holdout.fitted = [null, 2.5];
    c.holdout.residual = [null, 0.2];
    for (const svg of [
      fitCurveChart(c, c.fit ?? (undefined as never), { id: 'a' }),
      predictedActualChart(c, { id: 'b' }),
      residualsChart(c, { id: 'c' }),
    ]) {
      expect(count(svg, 'train')).toBe(3);
      expect(svg).toContain('data-train-rows="3" data-train-shown="3" data-train-points="3" data-train-omitted="0"');
    }
    expect(count(fitCurveChart(c, c.fit ?? (undefined as never), { id: 'a' }), 'holdout')).toBe(2);
    const pa = predictedActualChart(c, { id: 'b' });
    expect(count(pa, 'holdout')).toBe(1);
    expect(pa).toContain('data-holdout-points="1" data-holdout-omitted="1"');
    expect(pa).toContain('1 rows with values that are not finite are not drawn.');
  });

  it('hatches the regions where the curve leaves the band and names them in the description', () => {
    const c = oneInputCharts();
    const svg = fitCurveChart(c, c.fit ?? (undefined as never), { id: 'f' });
    expect(svg).toContain('<g class="regions" data-count="1"><rect class="region" data-side="above"');
    expect(svg).toContain('The curve leaves the band above it from 1.25 to 1.75.');
    expect(svg).toContain('fill="url(#f-hatch)"');
    expect(svg).toContain('<title id="f-title">Fitted curve: temp_c against depth_m</title>');
  });
});

describe('cvCurveChart', () => {
  it('marks the chosen and the suggested settings', () => {
    const sweep = oneInputCharts().sweep;
    if (!sweep) throw new Error('fixture has a sweep');
    const svg = cvCurveChart(sweep, { id: 'cv' });
    expect(svg).toContain('data-marker="chosen"');
    expect(svg).toContain('data-marker="suggested"');
    expect(svg).toContain('lowest 1 at 2; the descriptor&#39;s setting is 3; suggested 2.');
  });
  it('puts a ridge of 0 one decade left of the smallest positive setting on a log axis, labelled 0', () => {
    const svg = cvCurveChart(
      { parameter: 'ridge', log: true, settings: [0, 0.01, 1, 100], cv: [1, 1, 2, 5], train: null, chosen: 0, suggested: 1 },
      { id: 'r' },
    );
    expect(svg).toContain('>0</text>');
    expect(svg).toContain('ridge (log scale)');
  });
});

describe('coefficientBarsChart', () => {
  it('draws one bar per column with the limit, and the largest MAX_BARS of many', () => {
    const c = oneInputCharts().coefficients;
    const svg = coefficientBarsChart(c, { id: 'k' }) ?? '';
    expect((svg.match(/class="bar"/g) ?? []).length).toBe(2);
    expect(svg).toContain('class="limit"');
    expect(svg).toContain('data-over="1"');
    const many = {
      columns: Array.from({ length: 100 }, (_, j) => `c${j}`),
      values: Array.from({ length: 100 }, (_, j) => j),
      limit: 25,
      warn: 10,
    };
    const big = coefficientBarsChart(many, { id: 'm' }) ?? '';
    expect((big.match(/class="bar"/g) ?? []).length).toBe(MAX_BARS);
    expect(big).toContain('data-column="c99"');
    expect(big).not.toContain('data-column="c0"');
    expect(big).toContain('class="warn"');
  });
  it('gives null without columns', () => {
    expect(coefficientBarsChart({ columns: [], values: [], limit: null, warn: null }, { id: 'z' })).toBeNull();
  });
});
