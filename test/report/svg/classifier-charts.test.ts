// The classifier charts (report/svg/roc-curve.ts, calibration-diagram.ts, probability-curve.ts)
// from hand-made chart data: what they draw, how many marks, what they say, and awkward labels.
import { describe, expect, it } from 'vitest';
import type { ClassifierChartData } from '../../../src/result/classifier-chart-types.js';
import { calibrationDiagramChart } from '../../../src/report/svg/calibration-diagram.js';
import { CLASS_LABEL_CHARS, classLabel } from '../../../src/report/svg/class-label.js';
import { probabilityCurveChart } from '../../../src/report/svg/probability-curve.js';
import { rocCurveChart } from '../../../src/report/svg/roc-curve.js';

function bins(counts: number[], observed: (number | null)[]) {
  return counts.map((count, b) => ({
    from: b / counts.length,
    to: (b + 1) / counts.length,
    count,
    predicted: count > 0 ? (b + 0.5) / counts.length : null,
    observed: count > 0 ? observed[b] : null,
  }));
}

/** An invented classifier of two inputs: dent depth and wax weight, label `reject <&>`. */
function chart(): ClassifierChartData {
  return {
    target: 'grade',
    positive: 'reject <&>',
    negative: 'keep',
    threshold: 0.5,
    inputs: ['dent_mm', 'wax_g'],
    roc: {
      train: {
        rows: 5,
        positives: 3,
        negatives: 2,
        points: 6,
        thinned: false,
        fpr: [0, 0, 0.5, 0.5, 0.5, 1],
        tpr: [0, 1 / 3, 1 / 3, 2 / 3, 1, 1],
        threshold: [null, 0.9, 0.8, 0.7, 0.6, 0.2],
        hull: [0, 1, 4, 5],
      },
      holdout: {
        rows: 4,
        positives: 2,
        negatives: 2,
        points: 3,
        thinned: false,
        fpr: [0, 0.5, 1],
        tpr: [0, 0.5, 1],
        threshold: [null, 0.6, 0.3],
        hull: [0, 2],
      },
    },
    calibration: { train: bins([2, 0, 3], [0, null, 1]), holdout: bins([1, 2, 1], [0, 0.5, 1]) },
    train: {
      rows: 5,
      shown: 5,
      thinned: false,
      thinning: '',
      lines: [2, 3, 4, 5, 6],
      x: [
        [1, 2, 3, null, 5],
        [10, 11, 12, 13, 14],
      ],
      label: [0, 0, 1, 1, 1],
      probability: [0.1, 0.3, 0.6, 0.7, 0.9],
    },
    holdout: {
      rows: 4,
      shown: 4,
      thinned: false,
      thinning: '',
      lines: [2, 3, 4, 5],
      x: [
        [1.5, 2.5, 3.5, 4.5],
        [10, 11, 12, 13],
      ],
      label: [0, 1, 0, 1],
      probability: [0.2, 0.4, 0.6, 0.8],
    },
    curves: [{ input: 'dent_mm', others: { wax_g: 12 }, range: [1, 5], x: [0.6, 3, 5.4], p: [0.05, 0.5, 0.95] }],
  };
}

const marksIn = (svg: string, series: string): number => {
  const m = svg.match(new RegExp(`<g data-series="${series}" data-count="(\\d+)"[^>]*>(.*?)</g>`));
  if (!m) throw new Error(`no ${series} marks`);
  const n = (m[2].match(/class="pt"/g) ?? []).length;
  expect(n).toBe(Number(m[1]));
  return n;
};

describe('ROC chart', () => {
  it('draws both curves with their points, the diagonal, and states the areas', () => {
    const svg = rocCurveChart(chart(), { id: 'r' });
    expect(svg).toContain('data-chart="roc-curve"');
    expect(svg).toContain('<path class="roc" data-series="train" data-count="6"');
    expect(svg).toContain('<path class="roc" data-series="holdout" data-count="3"');
    expect(svg).toContain('class="diagonal"');
    // Training area 4/6 (trapezoids of the kept points), hold-out 0.5.
    expect(svg).toContain('data-train-area="0.666667"');
    expect(svg).toContain('data-holdout-area="0.5"');
    expect(svg).toContain('3 positive and 2 negative rows, 6 points, area under the drawn curve 0.6667.');
    // The label is escaped wherever it appears, never raw.
    expect(svg).toContain('reject &lt;&amp;&gt;');
    expect(svg).not.toContain('reject <&>');
  });

  it('says when a curve was thinned, and when a file has one class only', () => {
    const c = chart();
    c.roc.train = { ...c.roc.train, thinned: true, points: 90000 };
    c.roc.holdout = {
      rows: 3,
      positives: 3,
      negatives: 0,
      points: 2,
      thinned: false,
      fpr: [0, 1],
      tpr: [0, 1],
      threshold: [null, null],
      hull: [0, 1],
    };
    const svg = rocCurveChart(c, { id: 'r' });
    expect(svg).toContain('6 of its 90000 points drawn, every convex hull vertex kept');
    expect(svg).toContain('one class only (3 rows), no curve.');
  });
});

describe('calibration diagram', () => {
  it('draws one mark per non-empty bin with its count, both files', () => {
    const svg = calibrationDiagramChart(chart(), { id: 'c' });
    expect(svg).toContain('data-chart="calibration-diagram"');
    expect(marksIn(svg, 'train')).toBe(2);
    expect(marksIn(svg, 'holdout')).toBe(3);
    expect(svg).toContain('data-train-bins="2" data-holdout-bins="3" data-bins="3"');
    const counts = (series: string) =>
      [...(svg.match(new RegExp(`<g class="counts" data-series="${series}"[^>]*>(.*?)</g>`))?.[1] ?? '').matchAll(/>(\d+)</g)].map((m) =>
        Number(m[1]),
      );
    expect(counts('train')).toEqual([2, 3]);
    expect(counts('holdout')).toEqual([1, 2, 1]);
    expect(svg).toContain('2 rows at 0.17 predicted, 0.00 observed; 3 rows at 0.83 predicted, 1.00 observed.');
  });
});

describe('probability curve', () => {
  it('draws the curve and each kept row at its label, leaving out rows without an input value', () => {
    const c = chart();
    const svg = probabilityCurveChart(c, c.curves[0], { id: 'p' });
    expect(svg).toContain('data-chart="probability-curve"');
    expect(marksIn(svg, 'train')).toBe(4);
    expect(marksIn(svg, 'holdout')).toBe(4);
    expect(svg).toContain('data-train-rows="5" data-train-shown="5" data-train-points="4" data-train-omitted="1"');
    expect(svg).toContain('<path class="curve" d="M');
    expect(svg).toContain('class="threshold"');
    expect(svg).toContain('the other inputs at their training medians (wax_g = 12)');
    expect(svg).toContain('dent_mm (mm)');
    // Positive rows sit near the top (small y in px), negative rows near the bottom.
    const ys = [...(svg.match(/<g data-series="train"[^>]*>(.*?)<\/g>/)?.[1] ?? '').matchAll(/cy="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect(ys[0]).toBeGreaterThan(250);
    expect(ys[2]).toBeLessThan(80);
  });
});

describe('class labels in charts', () => {
  it('are cut to a bounded length', () => {
    expect(classLabel('keep')).toBe('keep');
    const long = 'x'.repeat(500);
    expect(Array.from(classLabel(long)).length).toBe(CLASS_LABEL_CHARS);
    const c = chart();
    c.positive = `${'::error::'.repeat(50)}`;
    const svg = rocCurveChart(c, { id: 'r' });
    expect(svg).not.toContain('::error::'.repeat(6));
  });
});
