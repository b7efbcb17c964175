// A classifier end to end through the pipeline (memory repository): the published worked example,
// labels (0/1, true/false, text with data.positive) and their errors, separation on constructed
// cases (complete, quasi-complete, none) with the rows reported, and the checks that apply.
import { describe, expect, it } from 'vitest';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { fromJsonNumber, type JsonNumber, type ModelResult } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

// Wikipedia, "Logistic regression", section "Example: Probability of passing an exam versus hours
// of study" (20 students): hours studied and pass (1) / fail (0); the maximum-likelihood fit is
// published as beta0 = -4.0777, beta1 = 1.5046 (also quoted with the same data at
// https://mlforbeginners.com/logistic-regression-example/).
const HOURS = [0.5, 0.75, 1.0, 1.25, 1.5, 1.75, 1.75, 2.0, 2.25, 2.5, 2.75, 3.0, 3.25, 3.5, 4.0, 4.25, 4.5, 4.75, 5.0, 5.5];
const PASS = [0, 0, 0, 0, 0, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 1, 1, 1, 1, 1];

function csv(x: number[], y: (number | string)[], name = 'y'): string {
  return `x,${name}\n${x.map((v, i) => `${v},${y[i]}`).join('\n')}\n`;
}

function descriptor(extra = '', target = 'y'): string {
  return `version: 1\nname: m\ntask: classification\ndata:\n  train: train.csv\n  holdout: holdout.csv\n  target: ${target}\n${extra}terms:\n  - linear: [x]\nfit:\n  folds: 4\n  fold_order: blocks\n`;
}

async function run(files: Record<string, string>): Promise<ModelResult> {
  const repo = createMemoryRepository({ 'fitgate.yml': 'version: 1\nmodels:\n  - "*.model.yml"\n', ...files });
  const result = await runPipeline(defaultSettings('.'), repo, { jobs: 1 });
  return result.models[0];
}

const metric = (m: ModelResult, key: string): number => fromJsonNumber(m.metrics?.[key] as JsonNumber);
const check = (m: ModelResult, id: string) => m.checks.find((c) => c.id === id);

describe('classifier: published worked example (Wikipedia, exam pass vs hours studied)', () => {
  it('gives the published coefficients -4.0777 and 1.5046 to their 5 digits, and the classifier figures', async () => {
    const m = await run({ 'm.model.yml': descriptor(), 'train.csv': csv(HOURS, PASS), 'holdout.csv': csv(HOURS, PASS) });
    expect(m.error).toBeNull();
    expect(fromJsonNumber(m.coefficients[0])).toBeCloseTo(-4.0777, 4);
    expect(fromJsonNumber(m.coefficients[1])).toBeCloseTo(1.5046, 4);
    expect(metric(m, 'fit_converged')).toBe(1);
    expect(metric(m, 'train_positives')).toBe(10);
    expect(metric(m, 'train_negatives')).toBe(10);
    // The same rows as hold-out: the gap is 1 and the recalibration is the identity (slope 1, intercept 0).
    expect(metric(m, 'gap_ratio')).toBeCloseTo(1, 12);
    expect(metric(m, 'calibration_slope')).toBeCloseTo(1, 8);
    expect(metric(m, 'calibration_intercept')).toBeCloseTo(0, 8);
    expect(check(m, 'separation')?.status).toBe('pass');
    expect(check(m, 'events-per-parameter')?.value).toBe(5); // 10 of each class / 2 parameters
    expect(check(m, 'events-per-parameter')?.status).toBe('fail'); // a floor of 10
    expect(check(m, 'events-per-parameter')?.floor).toEqual({ warn: null, fail: 10 });
    expect(check(m, 'swing')?.code).toBe('swing/not-for-classification');
    expect(check(m, 'parameter-ratio')?.status).toBe('skipped');
  });
});

describe('classifier: labels', () => {
  const text = PASS.map((v) => (v ? 'passed' : 'failed'));
  it('reads two text labels with data.positive and gives the same fit as 0/1', async () => {
    const m = await run({
      'm.model.yml': descriptor().replace('  target: y\n', '  target: y\n  positive: passed\n'),
      'train.csv': csv(HOURS, text),
      'holdout.csv': csv(HOURS, text),
    });
    expect(m.error).toBeNull();
    expect(fromJsonNumber(m.coefficients[1])).toBeCloseTo(1.5046, 4);
    expect(m.metrics?.positive_label).toBe('passed');
  });
  it('reads true/false without data.positive (true positive)', async () => {
    const tf = PASS.map((v) => (v ? 'True' : 'false'));
    const m = await run({ 'm.model.yml': descriptor(), 'train.csv': csv(HOURS, tf), 'holdout.csv': csv(HOURS, tf) });
    expect(m.error).toBeNull();
    expect(fromJsonNumber(m.coefficients[1])).toBeCloseTo(1.5046, 4);
  });
  it('asks for data.positive when the labels are text', async () => {
    const m = await run({ 'm.model.yml': descriptor(), 'train.csv': csv(HOURS, text), 'holdout.csv': csv(HOURS, text) });
    expect(m.verdict).toBe('error');
    expect(m.error?.code).toBe('positive-label');
    expect(m.error?.message).toMatch(/"failed", "passed"|'failed', 'passed'|failed.*passed/);
    expect(m.error?.line).toBe(7);
  });
  it('names the labels found when there are more than two, or one', async () => {
    const three = text.map((l, i) => (i === 3 ? 'unsure' : l));
    const m = await run({
      'm.model.yml': descriptor().replace('  target: y\n', '  target: y\n  positive: passed\n'),
      'train.csv': csv(HOURS, three),
      'holdout.csv': csv(HOURS, text),
    });
    expect(m.error?.code).toBe('target-classes');
    expect(m.error?.message).toMatch(/hold 3 \("failed", "unsure", "passed"\)/);
    const one = await run({
      'm.model.yml': descriptor(),
      'train.csv': csv(
        HOURS,
        HOURS.map(() => 1),
      ),
      'holdout.csv': csv(HOURS, PASS),
    });
    expect(one.error?.code).toBe('target-classes');
    expect(one.error?.message).toMatch(/hold 1 \("1"\)/);
  });
  it('rejects a hold-out label the training rows do not hold, naming its line', async () => {
    const m = await run({
      'm.model.yml': descriptor(),
      'train.csv': csv(HOURS, PASS),
      'holdout.csv': csv(
        HOURS,
        PASS.map((v, i) => (i === 4 ? 2 : v)),
      ),
    });
    expect(m.error?.code).toBe('target-classes');
    expect(m.error?.message).toMatch(/is "?2"? on line 6 of holdout.csv/);
  });
});

describe('classifier: fit.refit', () => {
  // A classifier is always refitted: `refit: false` used to be ignored (the refit judged, the
  // shipped coefficients failing reproducibility), so it is a descriptor error at its line.
  it('refit: false is an error at its line', async () => {
    const m = await run({
      'm.model.yml': `${descriptor()}  refit: false\ncoefficients: [-4, 1.5]\n`,
      'train.csv': csv(HOURS, PASS),
      'holdout.csv': csv(HOURS, PASS),
    });
    expect(m.error).toMatchObject({ code: 'predictions-form', file: 'm.model.yml', line: 13 });
    expect(m.error?.message).toContain('expected no `refit: false` on a classifier');
  });
});

describe('classifier: row weights', () => {
  // The logistic fit takes no row weights: a weight or sigma column would change nothing, so it
  // is a descriptor error at its line rather than a setting silently ignored.
  for (const key of ['weight', 'sigma']) {
    it(`data.${key} is an error at its line`, async () => {
      const weighted = `x,y,w\n${HOURS.map((v, i) => `${v},${PASS[i]},${1 + (i % 3)}`).join('\n')}\n`;
      const m = await run({
        'm.model.yml': descriptor(`  ${key}: w\n`),
        'train.csv': weighted,
        'holdout.csv': weighted,
      });
      expect(m.error).toMatchObject({ code: 'weight-and-sigma', file: 'm.model.yml', line: 8 });
      expect(m.error?.message).toContain(`\`data.${key}\` only with \`task: regression\``);
    });
  }
});

describe('classifier: separation (exact, constructed cases)', () => {
  it('complete: every row separated, the check fails and lists the rows', async () => {
    const x = [1, 2, 3, 4, 5, 6, 7, 8];
    const y = [0, 0, 0, 0, 1, 1, 1, 1];
    const m = await run({ 'm.model.yml': descriptor(), 'train.csv': csv(x, y), 'holdout.csv': csv(x, y) });
    const c = check(m, 'separation');
    expect(c?.status).toBe('fail');
    expect(c?.value).toBe(2);
    expect(c?.detail?.kind).toBe('complete');
    expect(c?.detail?.separated_rows).toBe(8);
    expect(c?.detail?.lines).toEqual([2, 3, 4, 5, 6, 7, 8, 9]);
    expect(c?.detail?.columns).toEqual(['(intercept)', 'x']);
    expect(m.verdict).toBe('fail');
  });
  it('quasi-complete: the tied rows at x = 4 are not separated, the others are; the check warns', async () => {
    const x = [1, 2, 3, 4, 4, 5, 6, 7];
    const y = [0, 0, 0, 0, 1, 1, 1, 1];
    const m = await run({ 'm.model.yml': descriptor(), 'train.csv': csv(x, y), 'holdout.csv': csv(x, y) });
    const c = check(m, 'separation');
    expect(c?.status).toBe('warn');
    expect(c?.value).toBe(1);
    expect(c?.detail?.kind).toBe('quasi-complete');
    expect(c?.detail?.separated_rows).toBe(6);
    expect(c?.detail?.lines).toEqual([2, 3, 4, 7, 8, 9]);
  });
  it('none: overlapping classes pass', async () => {
    const m = await run({ 'm.model.yml': descriptor(), 'train.csv': csv(HOURS, PASS), 'holdout.csv': csv(HOURS, PASS) });
    expect(check(m, 'separation')?.detail?.kind).toBe('none');
  });
  it('complete separation with ridge > 0 is a warning (the penalised fit exists)', async () => {
    const x = [1, 2, 3, 4, 5, 6, 7, 8];
    const y = [0, 0, 0, 0, 1, 1, 1, 1];
    const m = await run({
      'm.model.yml': descriptor().replace('  folds: 4\n', '  folds: 4\n  ridge: 1\n'),
      'train.csv': csv(x, y),
      'holdout.csv': csv(x, y),
    });
    const c = check(m, 'separation');
    expect(c?.detail?.kind).toBe('complete');
    expect(c?.status).toBe('warn');
    expect(Number.isFinite(fromJsonNumber(m.coefficients[1]))).toBe(true);
  });
});
