// Models trained elsewhere (`predictions`), run in-process on small invented repositories in
// memory (a bakery's proofing times and a courier's late parcels; all figures made up). Every
// figure is recomputed here from the rows the test writes, independently of fitgate's code.
import { describe, expect, it } from 'vitest';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { collectAnnotations } from '../../src/report/annotations.js';
import { formatHtml } from '../../src/report/html.js';
import { formatJunit } from '../../src/report/junit.js';
import { formatMarkdown } from '../../src/report/markdown.js';
import { formatSarif } from '../../src/report/sarif.js';
import { formatText } from '../../src/report/text.js';
import { fromJsonNumber, type JsonNumber, type ModelResult, type Result } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

/** Training rows: dough temperature t, proofing minutes y, and the other tool's prediction. */
const TRAIN: [number, number, number][] = Array.from({ length: 30 }, (_, i) => {
  const t = 20 + i * 0.5;
  const y = 120 - 2.5 * t + 3 * Math.sin(i * 1.3);
  return [t, Number(y.toFixed(3)), Number((y - 0.4 * Math.cos(i)).toFixed(3))];
});
/** Hold-out rows: the predictions miss by more. */
const HOLDOUT: [number, number, number][] = Array.from({ length: 10 }, (_, i) => {
  const t = 20.25 + i * 1.4;
  const y = 120 - 2.5 * t + 3 * Math.sin(i * 2.1 + 0.5);
  return [t, Number(y.toFixed(3)), Number((120 - 2.5 * t + 1.5 * Math.cos(i * 0.7)).toFixed(3))];
});

function csv(header: string, rows: (string | number)[][]): string {
  return `${header}\n${rows.map((r) => r.join(',')).join('\n')}\n`;
}

/** The descriptor of the proofing model with extra lines appended. */
function proofing(predictions: string, extra = ''): string {
  return [
    '# Proofing minutes predicted by a model trained in another tool.',
    'version: 1',
    'name: proofing-minutes',
    'data:',
    '  train: ../data/train.csv',
    '  holdout: ../data/holdout.csv',
    '  target: minutes',
    predictions,
    extra,
  ].join('\n');
}

const COLUMN_PREDICTIONS = ['predictions:', '  train: { column: pred }', '  holdout: { column: pred }'].join('\n');

async function run(files: Record<string, string>): Promise<Result> {
  return runPipeline(defaultSettings('.'), createMemoryRepository(files), { jobs: 1 });
}

function onlyModel(result: Result): ModelResult {
  expect(result.models).toHaveLength(1);
  return result.models[0];
}

function metric(m: ModelResult, key: string): number {
  return fromJsonNumber(m.metrics?.[key] as JsonNumber);
}

function check(m: ModelResult, id: string) {
  const c = m.checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id}`);
  return c;
}

const baseFiles = (descriptor: string, more: Record<string, string> = {}) => ({
  'data/train.csv': csv('temp_c,minutes,pred', TRAIN),
  'data/holdout.csv': csv('temp_c,minutes,pred', HOLDOUT),
  'models/proofing.model.yml': descriptor,
  ...more,
});

/** RMSE, MAE and R^2 (hold-out mean) of rows, straight from their definitions. */
function errors(rows: [number, number, number][]): { rmse: number; mae: number; r2: number } {
  const n = rows.length;
  const mean = rows.reduce((s, r) => s + r[1], 0) / n;
  const sse = rows.reduce((s, r) => s + (r[1] - r[2]) ** 2, 0);
  const sst = rows.reduce((s, r) => s + (r[1] - mean) ** 2, 0);
  return { rmse: Math.sqrt(sse / n), mae: rows.reduce((s, r) => s + Math.abs(r[1] - r[2]), 0) / n, r2: 1 - sse / sst };
}

describe('a regression model trained elsewhere (predictions in a column of the data files)', async () => {
  const result = await run(baseFiles(proofing(COLUMN_PREDICTIONS, 'parameters: 2\nlimits: { holdout_r2: 0.5 }')));
  const m = onlyModel(result);

  it('is checked as kind `predictions` with the stated parameters and no design', () => {
    expect(m.error).toBeNull();
    expect(m.kind).toBe('predictions');
    expect(m.parameters).toBe(2);
    expect(m.columns).toEqual([]);
    expect(m.coefficients).toEqual([]);
    expect(m.rows).toEqual({ train: 30, holdout: 10 });
  });

  it('scores the predictions: RMSE, MAE, R^2, gap ratio and parameter ratio as computed here', () => {
    const tr = errors(TRAIN);
    const ho = errors(HOLDOUT);
    expect(metric(m, 'train_rmse')).toBeCloseTo(tr.rmse, 12);
    expect(metric(m, 'holdout_rmse')).toBeCloseTo(ho.rmse, 12);
    expect(metric(m, 'holdout_mae')).toBeCloseTo(ho.mae, 12);
    expect(metric(m, 'holdout_r2')).toBeCloseTo(ho.r2, 12);
    expect(fromJsonNumber(check(m, 'generalisation-gap').value as JsonNumber)).toBeCloseTo(ho.rmse / tr.rmse, 12);
    expect(fromJsonNumber(check(m, 'parameter-ratio').value as JsonNumber)).toBeCloseTo(2 / 30, 15);
    expect(fromJsonNumber(check(m, 'holdout-r2').value as JsonNumber)).toBeCloseTo(ho.r2, 12);
    expect(check(m, 'holdout-r2').status).toBe(ho.r2 < 0.5 ? 'fail' : 'pass');
    expect(fromJsonNumber(check(m, 'holdout-rmse').value as JsonNumber)).toBeCloseTo(ho.rmse, 12);
  });

  it('judges swing on the observed rows: how far any prediction leaves the training target band', () => {
    const ys = TRAIN.map((r) => r[1]);
    const lo = Math.min(...ys);
    const hi = Math.max(...ys);
    const out = Math.max(0, ...[...TRAIN, ...HOLDOUT].map((r) => Math.max(r[2] - hi, lo - r[2])));
    const c = check(m, 'swing');
    expect(c.code).toBe('swing/observed-rows');
    expect(fromJsonNumber(c.value as JsonNumber)).toBeCloseTo(out / (hi - lo), 12);
  });

  it('skips the checks that need a refit or coefficients, with the reason', () => {
    for (const id of [
      'coefficient-size',
      'cross-validation',
      'swing-beyond',
      'swing-spikes',
      'reproducibility',
      'conditioning',
      'complexity',
    ]) {
      const c = check(m, id);
      expect(c.status, id).toBe('skipped');
      expect(c.code, id).toBe(`${id}/needs-refit`);
      expect(c.message, id).toContain('trained elsewhere');
      expect(c.line, id).toBe(8);
    }
    expect(check(m, 'leakage').code).toBe('leakage/no-inputs');
  });

  it('every report states the kind', () => {
    expect(formatText(result, { verbose: true })).toContain('proofing-minutes (predictions)');
    expect(formatText(result, { verbose: true })).toContain('kind: trained elsewhere, gated from its predictions (2 stated parameters)');
    expect(formatMarkdown(result)).toContain('| proofing-minutes (predictions) |');
    expect(formatHtml(result)).toContain('data-kind="predictions"');
    expect(formatJunit(result)).toContain('<property name="kind" value="predictions"/>');
    expect(JSON.parse(JSON.stringify(result)).models[0].kind).toBe('predictions');
    expect(formatSarif(result)).toContain('"kind": "predictions"');
    expect(m.verdict).toBe('fail');
    expect(collectAnnotations(result).map((a) => a.title)).toContain('fitgate generalisation-gap (proofing-minutes (predictions))');
  });
});

describe('parameters and inputs', () => {
  it('without `parameters` the parameter ratio is skipped as not stated', async () => {
    const m = onlyModel(await run(baseFiles(proofing(COLUMN_PREDICTIONS))));
    expect(check(m, 'parameter-ratio').code).toBe('parameter-ratio/not-stated');
    expect(m.parameters).toBe(0);
    expect(m.metrics?.params_per_sample).toBeUndefined();
    expect(formatHtml({ ...(await run(baseFiles(proofing(COLUMN_PREDICTIONS)))) })).toContain('parameters <b>not stated</b>');
  });

  it('with `predictions.inputs` leakage compares the rows: a hold-out row copied from training is found', async () => {
    const holdout = [...HOLDOUT.slice(0, 9), TRAIN[4]];
    const predictions = `${COLUMN_PREDICTIONS}\n  inputs: [temp_c]`;
    const m = onlyModel(await run({ ...baseFiles(proofing(predictions)), 'data/holdout.csv': csv('temp_c,minutes,pred', holdout) }));
    const c = check(m, 'leakage');
    expect(c.value).toBe(1);
    expect(c.status).toBe('fail');
    expect(c.message).toContain('data/holdout.csv lines 11');
    expect(c.message).toContain('data/train.csv lines 6');
  });

  it('a prediction column that is the target is refused', async () => {
    const m = onlyModel(await run(baseFiles(proofing('predictions:\n  train: { column: minutes }\n  holdout: { column: pred }'))));
    expect(m.error?.code).toBe('predictions-column');
    expect(m.error?.line).toBe(9);
  });
});

describe('a side file of predictions', () => {
  const ids = (rows: (string | number)[][], prefix: string): (string | number)[][] => rows.map((r, i) => [`${prefix}${i + 1}`, ...r]);
  const keyed = {
    'data/train.csv': csv(
      'id,temp_c,minutes',
      ids(
        TRAIN.map((r) => [r[0], r[1]]),
        'a',
      ),
    ),
    'data/holdout.csv': csv(
      'id,temp_c,minutes',
      ids(
        HOLDOUT.map((r) => [r[0], r[1]]),
        'b',
      ),
    ),
  };
  const sideDescriptor = proofing(
    [
      'predictions:',
      '  train: { file: ../preds/train.csv, key: id, column: p }',
      '  holdout: { file: ../preds/holdout.csv, key: id, column: p }',
    ].join('\n'),
  );
  // The side files list the rows in another order (reversed).
  const trainSide = ids(
    TRAIN.map((r) => [r[2]]),
    'a',
  ).reverse();
  const holdoutSide = ids(
    HOLDOUT.map((r) => [r[2]]),
    'b',
  ).reverse();
  const keyedFiles = (train = trainSide, holdout = holdoutSide) => ({
    ...keyed,
    'models/proofing.model.yml': sideDescriptor,
    'preds/train.csv': csv('id,p', train),
    'preds/holdout.csv': csv('id,p', holdout),
  });

  it('matched by key in any order gives the figures of the same predictions in a column', async () => {
    const m = onlyModel(await run(keyedFiles()));
    expect(m.error).toBeNull();
    expect(metric(m, 'train_rmse')).toBeCloseTo(errors(TRAIN).rmse, 12);
    expect(metric(m, 'holdout_rmse')).toBeCloseTo(errors(HOLDOUT).rmse, 12);
  });

  it('a data row whose key the side file lacks: the error names both files and the data line', async () => {
    const m = onlyModel(await run(keyedFiles(trainSide.filter((r) => r[0] !== 'a7'))));
    expect(m.error?.code).toBe('predictions-rows');
    expect(m.error?.file).toBe('data/train.csv');
    expect(m.error?.line).toBe(8);
    expect(m.error?.message).toContain('line 8 of data/train.csv has key "a7"');
    expect(m.error?.message).toContain('preds/train.csv');
  });

  it('a side row whose key no data row has: the error names both files and the side line', async () => {
    const m = onlyModel(await run(keyedFiles(trainSide, [...holdoutSide.slice(0, 3), ['zz9', 1], ...holdoutSide.slice(3)])));
    expect(m.error?.code).toBe('predictions-rows');
    expect(m.error?.file).toBe('preds/holdout.csv');
    expect(m.error?.line).toBe(5);
    expect(m.error?.message).toContain('line 5 of preds/holdout.csv has key "zz9"');
    expect(m.error?.message).toContain('data/holdout.csv');
  });

  it('a repeated key in the side file, or in the data file, or an empty key, is an error at its line', async () => {
    const dup = onlyModel(await run(keyedFiles([...trainSide.slice(0, 2), trainSide[0], ...trainSide.slice(2)])));
    expect(dup.error?.code).toBe('predictions-key');
    expect(dup.error?.file).toBe('preds/train.csv');
    expect(dup.error?.line).toBe(4);
    expect(dup.error?.message).toContain('repeats key "a30" of line 2');
    const dataDup = onlyModel(
      await run({
        ...keyedFiles(),
        'data/train.csv': csv('id,temp_c,minutes', [
          ...ids(
            TRAIN.map((r) => [r[0], r[1]]),
            'a',
          ),
          ['a3', 40, 20],
        ]),
      }),
    );
    expect(dataDup.error?.code).toBe('predictions-key');
    expect(dataDup.error?.file).toBe('data/train.csv');
    expect(dataDup.error?.line).toBe(32);
    const empty = onlyModel(await run(keyedFiles([...trainSide.slice(0, 5), ['', 3], ...trainSide.slice(5)])));
    expect(empty.error?.code).toBe('predictions-key');
    expect(empty.error?.line).toBe(7);
  });

  it('without a key the rows go in file order; a count mismatch names both files and the first bad line', async () => {
    const inOrder = (train: (string | number)[][]) => ({
      ...baseFiles(
        proofing('predictions:\n  train: { file: ../preds/train.csv, column: p }\n  holdout: { file: ../preds/holdout.csv, column: p }'),
      ),
      'preds/train.csv': csv('p', train),
      'preds/holdout.csv': csv(
        'p',
        HOLDOUT.map((r) => [r[2]]),
      ),
    });
    const ok = onlyModel(await run(inOrder(TRAIN.map((r) => [r[2]]))));
    expect(metric(ok, 'train_rmse')).toBeCloseTo(errors(TRAIN).rmse, 12);
    const short = onlyModel(await run(inOrder(TRAIN.slice(0, 27).map((r) => [r[2]]))));
    expect(short.error?.code).toBe('predictions-rows');
    expect(short.error?.file).toBe('data/train.csv');
    expect(short.error?.line).toBe(29);
    expect(short.error?.message).toContain('preds/train.csv has 27 prediction rows but data/train.csv has 30 data rows');
    const long = onlyModel(await run(inOrder([...TRAIN.map((r) => [r[2]]), [1], [2]])));
    expect(long.error?.file).toBe('preds/train.csv');
    expect(long.error?.line).toBe(32);
    expect(long.error?.message).toContain('line 32 of preds/train.csv (prediction row 31) has no data row');
  });

  it('a side file outside the repository is refused; one over the size cap too', async () => {
    const outside = onlyModel(
      await run(baseFiles(proofing('predictions:\n  train: { file: ../../../etc/passwd, column: p }\n  holdout: { column: pred }'))),
    );
    expect(outside.error?.code).toBe('path-outside');
    expect(outside.error?.line).toBe(9);
    const capped = await run({
      ...keyedFiles(),
      'fitgate.yml': 'version: 1\ncaps: { max_file_mb: 0.0005 }\n',
      'preds/train.csv': csv('id,p', [...trainSide, ...Array.from({ length: 40 }, (_, i) => [`x${i}`, i])]),
    });
    expect(onlyModel(capped).error?.code).toBe('file-too-large');
    expect(onlyModel(capped).error?.file).toBe('preds/train.csv');
  });
});

describe('with data.split (one file for both sides)', () => {
  const all = [...TRAIN.map((r) => ['fit', ...r]), ...HOLDOUT.map((r) => ['test', ...r])];
  const descriptor = (predictions: string) =>
    [
      'version: 1',
      'name: proofing-minutes',
      'data:',
      '  train: ../data/all.csv',
      '  target: minutes',
      '  split: { column: set, train: fit, holdout: test }',
      predictions,
    ].join('\n');

  it('a column reads each side from its own rows', async () => {
    const m = onlyModel(
      await run({ 'data/all.csv': csv('set,temp_c,minutes,pred', all), 'models/p.model.yml': descriptor(COLUMN_PREDICTIONS) }),
    );
    expect(m.error).toBeNull();
    expect(metric(m, 'train_rmse')).toBeCloseTo(errors(TRAIN).rmse, 12);
    expect(metric(m, 'holdout_rmse')).toBeCloseTo(errors(HOLDOUT).rmse, 12);
  });

  it('one keyed side file may hold the predictions of both sides', async () => {
    const keyedAll = all.map((r, i) => [`k${i}`, r[0], r[1], r[2]]);
    const side = all.map((r, i) => [`k${i}`, r[3]]).reverse();
    const m = onlyModel(
      await run({
        'data/all.csv': csv('id,set,temp_c,minutes', keyedAll),
        'data/preds.csv': csv('id,p', side),
        'models/p.model.yml': descriptor(
          'predictions:\n  train: { file: ../data/preds.csv, key: id, column: p }\n  holdout: { file: ../data/preds.csv, key: id, column: p }',
        ),
      }),
    );
    expect(m.error).toBeNull();
    expect(metric(m, 'train_rmse')).toBeCloseTo(errors(TRAIN).rmse, 12);
    expect(metric(m, 'holdout_rmse')).toBeCloseTo(errors(HOLDOUT).rmse, 12);
  });
});

describe('a classifier trained elsewhere', () => {
  /** Labels and probabilities, invented: the probabilities rank the labels well. */
  const rows = (n: number, shift: number): [number, number, number][] =>
    Array.from({ length: n }, (_, i) => {
      const x = (i * 7 + shift) % n;
      const p = Number((0.05 + (0.9 * x) / n).toFixed(3));
      const label = (i * 13 + shift) % 10 < p * 10 ? 1 : 0;
      return [x, label, p];
    });
  const train = rows(60, 1);
  const holdout = rows(25, 4);
  const files = (holdoutRows = holdout) => ({
    'data/train.csv': csv('size_kg,late,p_late', train),
    'data/holdout.csv': csv('size_kg,late,p_late', holdoutRows),
    'models/late.model.yml': [
      'version: 1',
      'name: late-parcels',
      'task: classification',
      'data:',
      '  train: ../data/train.csv',
      '  holdout: ../data/holdout.csv',
      '  target: late',
      'predictions:',
      '  train: { column: p_late }',
      '  holdout: { column: p_late }',
      'parameters: 3',
    ].join('\n'),
  });

  /** Mean log-loss, Brier score, accuracy at 0.5 and ROC AUC (pairs, ties half) from their definitions. */
  function figures(r: [number, number, number][]) {
    const n = r.length;
    const logLoss = -r.reduce((s, [, y, p]) => s + (y ? Math.log(p) : Math.log(1 - p)), 0) / n;
    const brier = r.reduce((s, [, y, p]) => s + (p - y) ** 2, 0) / n;
    const accuracy = r.filter(([, y, p]) => (p >= 0.5 ? 1 : 0) === y).length / n;
    const pos = r.filter((x) => x[1] === 1);
    const neg = r.filter((x) => x[1] === 0);
    let wins = 0;
    for (const a of pos) for (const b of neg) wins += a[2] > b[2] ? 1 : a[2] === b[2] ? 0.5 : 0;
    return { logLoss, brier, accuracy, auc: wins / (pos.length * neg.length), positives: pos.length, negatives: neg.length };
  }

  it('scores the probabilities: log-loss, Brier, accuracy, AUC, gap and events per parameter as computed here', async () => {
    const m = onlyModel(await run(files()));
    expect(m.error).toBeNull();
    const tr = figures(train);
    const ho = figures(holdout);
    expect(metric(m, 'train_log_loss')).toBeCloseTo(tr.logLoss, 12);
    expect(metric(m, 'holdout_log_loss')).toBeCloseTo(ho.logLoss, 12);
    expect(metric(m, 'holdout_brier')).toBeCloseTo(ho.brier, 12);
    expect(metric(m, 'holdout_accuracy')).toBeCloseTo(ho.accuracy, 12);
    expect(metric(m, 'holdout_auc')).toBeCloseTo(ho.auc, 12);
    expect(fromJsonNumber(check(m, 'generalisation-gap').value as JsonNumber)).toBeCloseTo(ho.logLoss / tr.logLoss, 12);
    expect(fromJsonNumber(check(m, 'events-per-parameter').value as JsonNumber)).toBeCloseTo(Math.min(tr.positives, tr.negatives) / 3, 12);
    // Logistic recalibration logit P(y = 1) = a + b logit(p) on the hold-out rows (Cox 1958), by
    // plain Newton steps here: b is the calibration slope.
    const e = holdout.map(([, , p]) => Math.log(p / (1 - p)));
    let a = 0;
    let b = 1;
    for (let step = 0; step < 50; step++) {
      let g0 = 0;
      let g1 = 0;
      let h00 = 0;
      let h01 = 0;
      let h11 = 0;
      holdout.forEach(([, y], i) => {
        const q = 1 / (1 + Math.exp(-(a + b * e[i])));
        g0 += y - q;
        g1 += (y - q) * e[i];
        h00 += q * (1 - q);
        h01 += q * (1 - q) * e[i];
        h11 += q * (1 - q) * e[i] * e[i];
      });
      const det = h00 * h11 - h01 * h01;
      a += (h11 * g0 - h01 * g1) / det;
      b += (h00 * g1 - h01 * g0) / det;
    }
    expect(fromJsonNumber(check(m, 'calibration-slope').value as JsonNumber)).toBeCloseTo(b, 6);
    expect(metric(m, 'calibration_intercept')).toBeCloseTo(a, 6);
    expect(check(m, 'separation').code).toBe('separation/needs-refit');
    expect(check(m, 'holdout-rmse').code).toBe('holdout-rmse/not-for-classification');
    expect(formatText({ ...(await run(files())) }, { verbose: true })).toContain('classifier: log-loss');
  });

  it('refuses a probability outside [0, 1], naming the file and line', async () => {
    const bad = holdout.map((r, i) => (i === 6 ? [r[0], r[1], 1.2] : r)) as [number, number, number][];
    const m = onlyModel(await run(files(bad)));
    expect(m.error?.code).toBe('predictions-value');
    expect(m.error?.file).toBe('data/holdout.csv');
    expect(m.error?.line).toBe(8);
    expect(m.error?.message).toContain('is not a probability');
  });
});
