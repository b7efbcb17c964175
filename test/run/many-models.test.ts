import { describe, it, expect } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import type { Descriptor } from '../../src/config/types.js';
import { defaultSettings as defaultSettingsFile } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import {
  chartShare,
  CURVE_POINTS,
  FULL_CHART_SHARE,
  MAX_SERIES_NUMBERS,
  MIN_CURVE_POINTS,
  MIN_SERIES_NUMBERS,
  CHARTED_MODELS,
  MODEL_CHART_NUMBERS,
  RUN_CHART_NUMBERS,
} from '../../src/result/chart-types.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { htmlReport } from '../../src/report/html.js';
import { summarise } from '../../src/result/result.js';
import { mergeReports } from '../../src/result/merge.js';
import { formatJson } from '../../src/report/json.js';
import {
  dataBytes,
  guessColumns,
  guessWork,
  largestFirst,
  MODEL_FIXED_OPERATIONS,
  MODEL_TRANSFER_OPERATIONS,
  POOL_PAY_RATIO,
  WORKER_OPERATIONS,
  WORKER_START_OPERATIONS,
  guessedWall,
  workersThatPay,
} from '../../src/run/work-guess.js';

function csv(rows: number): string {
  const lines = ['x,y'];
  for (let i = 0; i < rows; i++) {
    const x = (50 * ((i * 0.6180339887) % 1)).toFixed(6);
    lines.push(`${x},${(2 * Math.sin(Number(x) / 8) + 0.3 * Math.cos(17 * i)).toFixed(6)}`);
  }
  return `${lines.join('\n')}\n`;
}

const files = {
  'fitgate.yml': 'version: 1\nmodels: ["m/*.model.yml"]\n',
  'm/a.model.yml':
    'version: 1\nname: a\ndata:\n  train: ../d/train.csv\n  holdout: ../d/holdout.csv\n  target: y\nterms:\n  - polynomial: { of: x, degree: 3 }\nfit:\n  ridge: 0.1\n',
  'd/train.csv': csv(1200),
  'd/holdout.csv': csv(300),
};

describe('chartShare: a run-wide bound on chart data', () => {
  it('gives the full share up to 50 models and scales it down beyond, to the floors', () => {
    expect(RUN_CHART_NUMBERS / MODEL_CHART_NUMBERS).toBe(50);
    expect(chartShare(1)).toBe(FULL_CHART_SHARE);
    expect(chartShare(50)).toBe(FULL_CHART_SHARE);
    const s100 = chartShare(100);
    expect(s100.fraction).toBe(0.5);
    expect(s100.seriesNumbers).toBe(MAX_SERIES_NUMBERS / 2);
    expect(s100.curvePoints).toBe(Math.floor(CURVE_POINTS / 2));
    const s500 = chartShare(500);
    expect(s500.seriesNumbers).toBe(500);
    expect(s500.curvePoints).toBe(MIN_CURVE_POINTS);
    const s1000 = chartShare(1000, 999);
    expect(s1000.seriesNumbers).toBe(MIN_SERIES_NUMBERS);
    expect(s1000.curvePoints).toBe(MIN_CURVE_POINTS);
    expect(s1000.noPoints).toBeUndefined();
    const huge = chartShare(1_000_000);
    expect(huge.seriesNumbers).toBe(MIN_SERIES_NUMBERS);
    expect(huge.curvePoints).toBe(MIN_CURVE_POINTS);
  });

  it('is a fixed total: past CHARTED_MODELS models, the models after the first CHARTED_MODELS draw no points and say why', () => {
    expect(CHARTED_MODELS).toBe(1000);
    expect(chartShare(5000, CHARTED_MODELS - 1).noPoints).toBeUndefined();
    expect(chartShare(5000, CHARTED_MODELS).noPoints).toBe(
      "no points drawn: the run's chart data (about 750,000 numbers) went to its first 1,000 of 5,000 models",
    );
    for (const models of [50, 100, 200, 500, 1000, 2000, 100_000]) {
      // Two point series with their lines (6 numbers a row of one input), one curve of x and y, per charted model.
      let numbers = 0;
      for (let i = 0; i < Math.min(models, CHARTED_MODELS + 1); i++) {
        const share = chartShare(models, i);
        if (share.noPoints === undefined) numbers += 2 * Math.floor(share.seriesNumbers / 5) * 6 + 2 * share.curvePoints;
      }
      expect(numbers, `${models} models`).toBeLessThanOrEqual(RUN_CHART_NUMBERS);
    }
  });

  it("shrinks a model's series, fitted curve and swing curve under a share below 1", async () => {
    const repo = createMemoryRepository(files);
    const settings = defaultSettingsFile();
    const d = await loadDescriptor(repo, 'm/a.model.yml', settings);
    const full = await evaluateModel(repo, d, settings);
    const small = await evaluateModel(repo, d, settings, undefined, undefined, chartShare(500));
    expect(full.charts?.train.shown).toBe(1000);
    expect(small.charts?.train.shown).toBe(100);
    expect(small.charts?.train.thinning).toBe('100 of 1200 rows, evenly spaced through the file');
    const curve = (r: typeof full): number => {
      const curves = r.checks.find((c) => c.id === 'swing')?.detail?.curves as { x: number[] }[] | undefined;
      if (curves === undefined) throw new Error('no swing curve');
      return curves[0].x.length;
    };
    // Thinning keeps each curve's extremes, so a curve holds up to its maximum (400; 40 at a tenth).
    expect(curve(full)).toBeGreaterThan(300);
    expect(curve(full)).toBeLessThanOrEqual(400);
    expect(curve(small)).toBeGreaterThanOrEqual(25);
    expect(curve(small)).toBeLessThanOrEqual(40);
    expect(small.charts?.fit?.x.length).toBeLessThan((full.charts?.fit?.x.length ?? 0) / 4);
    // Everything but the chart data and the swing curve is the same.
    const strip = (r: typeof full) =>
      JSON.stringify({ ...r, charts: null, checks: r.checks.map((c) => (c.id === 'swing' ? { ...c, detail: null } : c)) });
    expect(strip(small)).toBe(strip(full));
    const size = (r: typeof full) => JSON.stringify(r).length;
    expect(size(small)).toBeLessThan(size(full) / 3);
  });
});

describe("a model past the run's chart data", () => {
  it('keeps its counts, sweep and coefficients, draws no points or curves, and its HTML says why', async () => {
    const repo = createMemoryRepository(files);
    const settings = defaultSettingsFile();
    const d = await loadDescriptor(repo, 'm/a.model.yml', settings);
    const drawn = await evaluateModel(repo, d, settings, undefined, undefined, chartShare(2000, CHARTED_MODELS - 1));
    const left = await evaluateModel(repo, d, settings, undefined, undefined, chartShare(2000, CHARTED_MODELS));
    const charts = left.charts;
    if (charts === undefined || drawn.charts === undefined) throw new Error('no chart data');
    expect(charts.no_points).toMatch(/^no points drawn: the run's chart data .* first 1,000 of 2,000 models$/);
    expect(charts.train).toMatchObject({ rows: 1200, shown: 0, thinned: true, thinning: charts.no_points, lines: [], x: [[]], actual: [] });
    expect(charts.holdout).toMatchObject({ rows: 300, shown: 0, fitted: [], residual: [] });
    expect(charts.fit).toBeNull();
    expect(charts.partials).toEqual([]);
    expect(charts.sweep).toEqual(drawn.charts.sweep);
    expect(charts.coefficients).toEqual(drawn.charts.coefficients);
    // Checks and figures are those of a drawn model at the same share.
    expect(JSON.stringify({ ...left, charts: null })).toBe(JSON.stringify({ ...drawn, charts: null }));
    const html = [...htmlReport(summarise([drawn, left], '0.0.0', []))].join('');
    const sections = html.split('<section class="model"').slice(1);
    expect(sections).toHaveLength(2);
    expect(sections[0]).not.toContain('data-no-points');
    expect(sections[0]).toContain('data-chart="fit-curve"');
    expect(sections[0]).toContain('data-chart="residuals"');
    expect(sections[1]).toContain('data-no-points');
    expect(sections[1]).toContain('Rows and curves: no points drawn: the run&#39;s chart data');
    expect(sections[1]).not.toContain('data-chart="fit-curve"');
    expect(sections[1]).not.toContain('data-chart="residuals"');
    expect(sections[1]).not.toContain('data-chart="predicted-actual"');
    expect(sections[1]).toContain('data-chart="cv-curve"');
    expect(sections[1]).toContain('data-chart="coefficients"');
    // The report schema (strict) takes the field, and `merge` gives it back.
    const merged = mergeReports(
      [{ file: 'a.json', text: formatJson(summarise([drawn, { ...left, name: 'b', descriptor: 'm/b.model.yml' }], '0.0.0', [])) }],
      '0.0.0',
    );
    expect(merged.models.map((m) => m.charts?.no_points)).toEqual([undefined, charts.no_points]);
  });
});

describe('the pool sizes itself by guessed work', () => {
  it('guesses columns from the descriptor and work from the data bytes', async () => {
    const repo = createMemoryRepository(files);
    const settings = defaultSettingsFile();
    const d = await loadDescriptor(repo, 'm/a.model.yml', settings);
    expect(guessColumns(d)).toBe(4);
    const bytes = await dataBytes(repo, d);
    expect(bytes).toBe(files['d/train.csv'].length + files['d/holdout.csv'].length);
    expect(guessWork(d, 0)).toBe(MODEL_FIXED_OPERATIONS);
    expect(guessWork(d, 2 * bytes) - guessWork(d, bytes)).toBeCloseTo(guessWork(d, bytes) - guessWork(d, 0), 6);
  });

  it('starts no worker for small work, one per WORKER_OPERATIONS of work, never more than jobs - 1 or models - 1', () => {
    expect(workersThatPay([1e6, 1e6, 1e6], 2)).toBe(0);
    expect(workersThatPay(Array(1000).fill(WORKER_OPERATIONS / 20), 2), 'the main thread and one worker').toBe(1);
    expect(workersThatPay(Array(1000).fill(WORKER_OPERATIONS / 20), 8)).toBe(7);
    expect(workersThatPay(Array(1000).fill(WORKER_OPERATIONS / 20), 1), 'jobs 1: the main thread alone').toBe(0);
    expect(workersThatPay([WORKER_OPERATIONS * 10], 4), 'one model runs on the main thread').toBe(0);
    expect(workersThatPay([WORKER_OPERATIONS * 10, WORKER_OPERATIONS * 10], 4)).toBe(1);
    expect(workersThatPay(Array(4).fill(WORKER_OPERATIONS), 8), 'one worker per WORKER_OPERATIONS of the total').toBe(3);
  });

  it('starts workers for many small models once the main thread alone would take longer than the start, the transfer and the margin', () => {
    const cubic = { fit: { intercept: true }, terms: [{ kind: 'polynomial', degree: 3 }] } as unknown as Descriptor;
    // 1,000 models of 1,250 rows (MONO1000, 35 kB of CSV each) and 200 of 2,500 rows (MONO200, 66 kB each): the
    // main thread alone on 2 cores (one worker beside it was measured no faster there), three workers beside it on 4.
    expect(workersThatPay(Array(1000).fill(guessWork(cubic, 35_000)), 2)).toBe(0);
    expect(workersThatPay(Array(200).fill(guessWork(cubic, 66_000)), 2)).toBe(0);
    expect(workersThatPay(Array(1000).fill(guessWork(cubic, 35_000)), 4)).toBe(3);
    // One worker pays for n models of w each when start + (n w - start + n/2 x transfer) / 2 <= ratio x n w.
    const n = 1000;
    const even = (WORKER_START_OPERATIONS / 2 + (n * MODEL_TRANSFER_OPERATIONS) / 4) / ((POOL_PAY_RATIO - 0.5) * n);
    expect(guessedWall(n * even, even, n, 1)).toBeCloseTo(POOL_PAY_RATIO * n * even, 0);
    expect(workersThatPay(Array(n).fill(even * 1.01), 2)).toBe(1);
    expect(workersThatPay(Array(n).fill(even * 0.99), 2)).toBe(0);
    // Work that ends before a worker could start: the main thread alone.
    expect(guessedWall(WORKER_START_OPERATIONS, 1, 100, 1)).toBe(WORKER_START_OPERATIONS);
  });

  it('still starts workers for a few large models (workload L: 139 MB, 25 columns, each), not for one large among small ones', () => {
    const wide = { fit: { intercept: true }, terms: [{ kind: 'linear', columns: Array(24).fill('x') }] } as unknown as Descriptor;
    const large = guessWork(wide, 139e6);
    expect(workersThatPay([large, large], 2)).toBe(1);
    expect(workersThatPay([large, large, large, large], 4)).toBe(3);
    // One large model and many small ones: the large one bounds the run's time whatever the threads.
    expect(workersThatPay([large, ...Array(10).fill(1e7)], 2)).toBe(0);
  });

  it('hands out the largest guessed work first, ties in descriptor order', () => {
    expect(largestFirst([3, 9, 3, 1, 9])).toEqual([1, 4, 0, 2, 3]);
    expect(largestFirst([])).toEqual([]);
  });
});
