import { describe, it, expect } from 'vitest';
import { parseArgs } from '../../src/entries/args.js';
import { InputError } from '../../src/core/errors.js';
import { jsonErrorOffset, MERGE_ERROR, mergeReports, type ReportInput } from '../../src/result/merge.js';
import { exitStatus, summarise, type ModelResult, type Verdict } from '../../src/result/result.js';

function model(name: string, verdict: Verdict, descriptor = `models/${name}.model.yml`): ModelResult {
  return {
    name,
    descriptor,
    verdict,
    rows: { train: 10, holdout: 4 },
    parameters: 2,
    columns: ['(intercept)', 'x'],
    metrics: verdict === 'error' ? null : { train_rmse: 1, holdout_rmse: 'Infinity', gap_ratio: 'Infinity', train_mae: 1, holdout_mae: 1, train_r2: 0.5, holdout_r2: 'NaN', params_per_sample: 0.2, max_std_coefficient: 0.5, max_std_coefficient_column: 'x', max_abs_coefficient: 2, rank: 2, condition_number: 3 },
    coefficients: verdict === 'error' ? [] : [1, 'NaN'],
    shipped: null,
    checks: verdict === 'error' ? [] : [{ id: 'generalisation-gap', code: `generalisation-gap/${verdict}`, status: verdict === 'fail' ? 'fail' : 'pass', value: 'Infinity', limitKey: 'gap_ratio', limit: 1.5, warn: null, line: 3, message: 'm', advice: '' }],
    error: verdict === 'error' ? { message: 'bad cell', file: 'data/x.csv', line: 4, code: 'csv-cell' } : null,
  };
}

function report(file: string, models: ModelResult[], notes: string[] = []): ReportInput {
  return { file, text: JSON.stringify(summarise(models, '0.0.1', notes), null, 2) };
}

function mergeError(inputs: ReportInput[]): InputError {
  try {
    mergeReports(inputs, '9.9.9');
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('mergeReports', () => {
  it('joins models of every report, sorted, with the verdict and counts recomputed', () => {
    const merged = mergeReports(
      [report('a.json', [model('zeta', 'pass'), model('alpha', 'warn')], ['shard 1/2: 2 models']), report('b.json', [model('mid', 'fail')], ['shard 2/2: 1 model', 'shard 1/2: 2 models'])],
      '9.9.9',
    );
    expect(merged.models.map((m) => m.name)).toEqual(['alpha', 'mid', 'zeta']);
    expect(merged.verdict).toBe('fail');
    expect(merged.counts).toEqual({ models: 3, pass: 1, warn: 1, fail: 1, error: 0 });
    expect(merged.tool).toEqual({ name: 'fitgate', version: '9.9.9' });
    expect(merged.notes).toEqual(['shard 1/2: 2 models', 'shard 2/2: 1 model']);
    expect(exitStatus(merged)).toBe(1);
  });

  it('keeps error models and their exit status', () => {
    const merged = mergeReports([report('a.json', [model('a', 'pass')]), report('b.json', [model('b', 'error')])], '1');
    expect(merged.verdict).toBe('error');
    expect(exitStatus(merged)).toBe(2);
    expect(merged.models[1].error).toEqual({ message: 'bad cell', file: 'data/x.csv', line: 4, code: 'csv-cell' });
  });

  it('gives an empty pass for empty shard reports', () => {
    const merged = mergeReports([report('a.json', []), report('b.json', [])], '1');
    expect(merged.verdict).toBe('pass');
    expect(merged.counts.models).toBe(0);
  });

  it('round-trips non-finite numbers as the report writes them', () => {
    const merged = mergeReports([report('a.json', [model('a', 'pass')])], '1');
    expect(merged.models[0].metrics?.holdout_rmse).toBe('Infinity');
    expect(merged.models[0].coefficients).toEqual([1, 'NaN']);
  });

  it('needs at least one report', () => {
    expect(mergeError([]).code).toBe(MERGE_ERROR.none);
  });

  it('names file, line and column of JSON that does not parse', () => {
    const e = mergeError([report('a.json', []), { file: 'shards/b.json', text: '{\n  "verdict": "pass",\n  "models": [,]\n}' }]);
    expect(e.code).toBe(MERGE_ERROR.json);
    expect(e.location.file).toBe('shards/b.json');
    expect(e.location.line, e.message).toBe(3);
    expect(e.location.column, e.message).toBe(14);
  });

  it.each([
    ['not an object', '[]', '(top level)'],
    ['another tool', '{"tool":{"name":"other"},"verdict":"pass","models":[]}', 'tool.name'],
    ['bad verdict', '{"tool":{"name":"fitgate"},"verdict":"fine","models":[]}', 'verdict'],
    ['models not an array', '{"tool":{"name":"fitgate"},"verdict":"pass","models":{}}', 'models'],
  ])('rejects a report with %s, naming the key', (_, text, key) => {
    const e = mergeError([{ file: 'x.json', text }]);
    expect(e.code).toBe(MERGE_ERROR.shape);
    expect(e.location).toEqual({ file: 'x.json', key });
  });

  it.each([
    ['name', (m: Record<string, unknown>) => (m.name = 3), 'models[1].name'],
    ['verdict', (m: Record<string, unknown>) => (m.verdict = 'ok'), 'models[1].verdict'],
    ['rows', (m: Record<string, unknown>) => (m.rows = { train: -1, holdout: 2 }), 'models[1].rows.train'],
    ['coefficient', (m: Record<string, unknown>) => (m.coefficients = [1, 'big']), 'models[1].coefficients[1]'],
    ['check status', (m: Record<string, unknown>) => ((m.checks as Record<string, unknown>[])[0].status = 'bad'), 'models[1].checks[0].status'],
    ['error of an error model', (m: Record<string, unknown>) => ((m.verdict = 'error'), (m.error = null)), 'models[1].error'],
  ])('rejects a model with a bad %s, naming the key path', (_, spoil, key) => {
    const models = [model('a', 'pass'), model('b', 'pass')] as unknown as Record<string, unknown>[];
    spoil(models[1]);
    const e = mergeError([{ file: 'r.json', text: JSON.stringify({ tool: { name: 'fitgate', version: '1' }, verdict: 'pass', models }) }]);
    expect(e.code, e.message).toBe(MERGE_ERROR.shape);
    expect(e.location).toEqual({ file: 'r.json', key });
  });

  it('rejects a model name found in two reports, naming both', () => {
    const e = mergeError([report('a.json', [model('x', 'pass')]), report('b.json', [model('y', 'pass'), model('x', 'pass', 'other/x.model.yml')])]);
    expect(e.code).toBe(MERGE_ERROR.duplicate);
    expect(e.location).toEqual({ file: 'b.json', key: 'models[1].name' });
    expect(e.message).toContain('a.json');
  });

  it('rejects the same report given twice', () => {
    const r = report('a.json', [model('x', 'pass')]);
    expect(mergeError([r, { ...r, file: 'a-again.json' }]).code).toBe(MERGE_ERROR.duplicate);
  });
});

describe('merge and scale arguments', () => {
  it('parses merge with format, output and fail-on', () => {
    const parsed = parseArgs(['merge', 'a.json', 'dir/b.json', '--format', 'markdown', '--out', 'all.md', '--fail-on', 'warn'], '/work');
    expect(parsed).toEqual({ kind: 'merge', reports: ['/work/a.json', '/work/dir/b.json'], format: 'markdown', out: 'all.md', color: null, failOn: 'warn', debug: false, verbose: false, html: null, sarif: null, junit: null });
  });

  it('parses the file reports of merge', () => {
    const parsed = parseArgs(['merge', 'a.json', '--html', 'site', '--sarif', 'all.sarif', '--junit', 'all.xml'], '/work');
    expect(parsed).toMatchObject({ kind: 'merge', html: 'site', sarif: 'all.sarif', junit: 'all.xml' });
  });

  it('needs at least one report for merge', () => {
    const parsed = parseArgs(['merge'], '/work');
    expect(parsed.kind).toBe('print');
    if (parsed.kind === 'print') expect(parsed.status).toBe(2);
  });

  it('parses --shard and --jobs for check', () => {
    const parsed = parseArgs(['check', '--shard', '2/3', '--jobs', '4'], '/work');
    expect(parsed.kind).toBe('check');
    if (parsed.kind === 'check') {
      expect(parsed.shard).toEqual({ index: 2, count: 3 });
      expect(parsed.jobs).toBe(4);
    }
    const plain = parseArgs(['check'], '/work');
    if (plain.kind === 'check') expect([plain.shard, plain.jobs]).toEqual([null, null]);
  });

  it.each([['--shard', '4/3'], ['--shard', 'x'], ['--jobs', '0'], ['--jobs', 'many']])('rejects %s %s with an InputError', (flag, value) => {
    expect(() => parseArgs(['check', flag, value], '/work')).toThrow(InputError);
  });
});

describe('jsonErrorOffset', () => {
  it('agrees with JSON.parse on valid and invalid text', () => {
    const valid = ['{}', '[]', ' {"a": [1, -2.5e3, true, false, null, "x\\"\\u00e9"]} ', '0', '"s"'];
    for (const t of valid) {
      expect(() => JSON.parse(t)).not.toThrow();
      expect(jsonErrorOffset(t), t).toBe(-1);
    }
    const invalid: [string, number][] = [['', 0], ['{', 1], ['[1,]', 3], ['{"a" 1}', 5], ['01', 1], ['[1] x', 4], ['"\u0001"', 1], ['[tru]', 1], ['{"a":1,}', 7]];
    for (const [t, at] of invalid) {
      expect(() => JSON.parse(t), t).toThrow();
      expect(jsonErrorOffset(t), JSON.stringify(t)).toBe(at);
    }
  });
});
