import { describe, expect, it } from 'vitest';
import { bandRegions, chartNumber, MAX_CHART_POINTS, thinRows } from '../../src/run/chart-data.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { defaultSettings } from '../../src/run/settings.js';

describe('chartNumber', () => {
  it('keeps 7 significant digits and turns NaN and infinities into null', () => {
    // biome-ignore lint/suspicious/noApproximativeNumericConstant: the expected value is pi cut to 7 significant digits
    expect(chartNumber(Math.PI)).toBe(3.141593);
    expect(chartNumber(-1.23456789e-12)).toBe(-1.234568e-12);
    expect(chartNumber(Number.NaN)).toBeNull();
    expect(chartNumber(Infinity)).toBeNull();
    expect(chartNumber(-Infinity)).toBeNull();
  });

  it('equals Number(x.toPrecision(7)) everywhere: random magnitudes, decimal ties, neighbours of powers of ten, extremes', () => {
    const slow = (x: number): number => Number(x.toPrecision(7));
    // A seeded generator (xorshift32), so that a failure can be replayed.
    let state = 0x9e3779b9;
    const next = (): number => {
      state ^= state << 13;
      state ^= state >>> 17;
      state ^= state << 5;
      return (state >>> 0) / 2 ** 32;
    };
    const values: number[] = [0, -0, Number.MIN_VALUE, -Number.MIN_VALUE, Number.MAX_VALUE, -Number.MAX_VALUE, 1, -1];
    for (let i = 0; i < 200_000; i++) {
      const x = (next() < 0.5 ? -1 : 1) * next() * 10 ** Math.floor(next() * 80 - 40);
      values.push(x);
    }
    for (let e = -30; e <= 30; e++) {
      const p = 10 ** e;
      values.push(p, p * (1 + Number.EPSILON), p * (1 - Number.EPSILON), p * 0.99999995, p * 0.9999999, p * 9.9999995);
      // Decimal ties at the 8th digit and their double neighbours.
      for (const m of [1.2345675, 1.0000005, 9.9999995, 5.5555555, 2.5000005]) {
        const t = m * p;
        values.push(t, t * (1 + Number.EPSILON), t * (1 - Number.EPSILON));
      }
    }
    // Short decimals as a CSV gives them (already 7 digits or fewer).
    for (let i = 0; i < 20_000; i++) values.push(Number((next() * 1000 - 500).toFixed(3)), Number((next() * 1e-4).toPrecision(6)));
    let differing = 0;
    for (const x of values) if (!Object.is(chartNumber(x), x === 0 ? 0 : slow(x))) differing++;
    expect(differing).toBe(0);
  });
});

describe('thinRows', () => {
  it('keeps every row up to the maximum', () => {
    expect(Array.from(thinRows(0))).toEqual([]);
    expect(Array.from(thinRows(3, 3))).toEqual([0, 1, 2]);
  });
  it('keeps exactly max evenly spaced rows, ascending, first row included, the same every time', () => {
    const a = thinRows(10_001, 2000);
    expect(a.length).toBe(2000);
    expect(a[0]).toBe(0);
    for (let i = 1; i < a.length; i++) expect(a[i] - a[i - 1], `gap at ${i}`).toBeGreaterThanOrEqual(5);
    expect(Array.from(thinRows(10_001, 2000))).toEqual(Array.from(a));
    expect(Array.from(thinRows(10, 4))).toEqual([0, 2, 5, 7]);
  });
});

describe('bandRegions', () => {
  it('finds stretches above and below the band with edges at the straight-line crossings', () => {
    // y = 0, 2, 0, -2, 0 at x = 0..4 against band [-1, 1]: above from 0.5 to 1.5, below from 2.5 to 3.5.
    expect(bandRegions([0, 1, 2, 3, 4], [0, 2, 0, -2, 0], -1, 1)).toEqual([
      { from: 0.5, to: 1.5, side: 'above' },
      { from: 2.5, to: 3.5, side: 'below' },
    ]);
  });
  it('opens at the first point and closes at the last when the curve starts or ends outside', () => {
    // y = 5, 0, 5 against [-1, 1]: the line from 5 to 0 crosses 1 at x = 0.8, from 0 to 5 at x = 1.2.
    expect(bandRegions([0, 1, 2], [5, 0, 5], -1, 1)).toEqual([
      { from: 0, to: 0.8, side: 'above' },
      { from: 1.2, to: 2, side: 'above' },
    ]);
  });
  it('counts a missing prediction as outside and gives nothing for a curve inside the band or an empty curve', () => {
    expect(bandRegions([0, 1, 2], [0, null, 0], -1, 1)).toEqual([{ from: 1, to: 2, side: 'above' }]);
    expect(bandRegions([0, 1], [0, 0.5], -1, 1)).toEqual([]);
    expect(bandRegions([], [], -1, 1)).toEqual([]);
  });
});

function csv(header: string, rows: number, row: (i: number) => number[]): string {
  const lines = [header];
  for (let i = 0; i < rows; i++) lines.push(row(i).join(','));
  return `${lines.join('\n')}\n`;
}

describe('buildChartData through the pipeline', () => {
  const line = (x: number): number => 2 + 0.5 * x + 0.1 * Math.sin(37 * x);
  const files = {
    'fitgate.yml': 'version: 1\nmodels: ["m/*.model.yml"]\n',
    'm/one.model.yml':
      'version: 1\nname: one\ndata:\n  train: ../d/train.csv\n  holdout: ../d/holdout.csv\n  target: y_kg\nterms:\n  - polynomial: { of: x_m, degree: 2 }\n',
    'm/two.model.yml':
      'version: 1\nname: two\ndata:\n  train: ../d/train2.csv\n  holdout: ../d/holdout2.csv\n  target: y\nterms:\n  - linear: [a, b]\n',
    'd/train.csv': csv('x_m,y_kg', 2500, (i) => [i / 250, line(i / 250)]),
    'd/holdout.csv': csv('x_m,y_kg', 30, (i) => [i / 3 + 0.01, line(i / 3 + 0.01)]),
    'd/train2.csv': csv('a,b,y', 40, (i) => [i, (i * 7) % 11, i + 2 * ((i * 7) % 11) + 0.1 * Math.cos(i)]),
    'd/holdout2.csv': csv('a,b,y', 10, (i) => [i + 0.5, (i * 3) % 5, i + 0.5 + 2 * ((i * 3) % 5)]),
  };

  it('thins a large file to the maximum, records it, and keeps a small one whole', async () => {
    const result = await runPipeline(defaultSettings('/'), createMemoryRepository(files), { jobs: 1 });
    const one = result.models.find((m) => m.name === 'one');
    const charts = one?.charts;
    if (!charts) throw new Error(`no chart data: ${JSON.stringify(one?.error)}`);
    expect(charts.train).toMatchObject({ rows: 2500, shown: MAX_CHART_POINTS, thinned: true });
    expect(charts.train.thinning).toBe('1000 of 2500 rows, evenly spaced through the file');
    expect(charts.train.actual.length).toBe(MAX_CHART_POINTS);
    expect(charts.train.x[0].length).toBe(MAX_CHART_POINTS);
    expect(charts.train.lines[0]).toBe(2);
    expect(charts.holdout).toMatchObject({ rows: 30, shown: 30, thinned: false, thinning: '' });
    // Residual = actual - fitted, row by row (within the 7-digit rounding).
    charts.holdout.residual.forEach((r, i) => {
      const expected = (charts.holdout.actual[i] as number) - (charts.holdout.fitted[i] as number);
      expect(Math.abs((r as number) - expected), `row ${i}: residual ${r}, expected ${expected}`).toBeLessThan(1e-5);
    });
    expect(charts.fit?.input).toBe('x_m');
    const ys = Array.from({ length: 2500 }, (_, i) => line(i / 250));
    expect(charts.fit?.band).toEqual([chartNumber(Math.min(...ys)), chartNumber(Math.max(...ys))]);
    expect(charts.partials).toEqual([]);
    expect(charts.coefficients.columns).toEqual(one?.columns.slice(1));
    // Serialisable as it is.
    expect(JSON.parse(JSON.stringify(charts))).toEqual(charts);
  });

  it('gives one partial curve per input, others at their training medians, for several inputs', async () => {
    const result = await runPipeline(defaultSettings('/'), createMemoryRepository(files), { jobs: 1 });
    const charts = result.models.find((m) => m.name === 'two')?.charts;
    if (!charts) throw new Error('no chart data');
    expect(charts.fit).toBeNull();
    expect(charts.partials.map((p) => p.input)).toEqual(['a', 'b']);
    // Median of b over the training rows (i*7 mod 11 for i = 0..39), computed here by sorting.
    const b = Array.from({ length: 40 }, (_, i) => (i * 7) % 11).sort((x, y) => x - y);
    expect(charts.partials[0].others).toEqual({ b: (b[19] + b[20]) / 2 });
    expect(charts.partials[1].others).toEqual({ a: 19.5 });
    // A linear model: the partial curve along a rises by the coefficient of a (about 1) per unit.
    const p = charts.partials[0];
    const slope = ((p.y[p.y.length - 1] as number) - (p.y[0] as number)) / (p.x[p.x.length - 1] - p.x[0]);
    expect(Math.abs(slope - 1), `slope ${slope}, expected about 1`).toBeLessThan(0.05);
  });
});
