// biome-ignore-all lint/suspicious/noExplicitAny: the spoilers below write any key into parsed JSON, hence `any` in their parameters.
import { tmpdir } from 'node:os';
import { fileURLToPath } from 'node:url';
import { describe, it, expect } from 'vitest';
import { parseArgs } from '../../src/entries/args.js';
import { InputError } from '../../src/core/errors.js';
import { jsonErrorOffset, MERGE_ERROR, mergeReports, type MergeOptions, type ReportInput } from '../../src/result/merge.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { formatJson } from '../../src/report/json.js';
import { exitStatus, summarise, type ModelResult, type Verdict } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';

function model(name: string, verdict: Verdict, descriptor = `models/${name}.model.yml`): ModelResult {
  return {
    name,
    descriptor,
    verdict,
    rows: { train: 10, holdout: 4 },
    parameters: 2,
    columns: ['(intercept)', 'x'],
    metrics:
      verdict === 'error'
        ? null
        : {
            train_rmse: 1,
            holdout_rmse: 'Infinity',
            gap_ratio: 'Infinity',
            train_mae: 1,
            holdout_mae: 1,
            train_r2: 0.5,
            holdout_r2: 'NaN',
            params_per_sample: 0.2,
            max_std_coefficient: 0.5,
            max_std_coefficient_column: 'x',
            max_abs_coefficient: 2,
            rank: 2,
            condition_number: 3,
          },
    coefficients: verdict === 'error' ? [] : [1, 'NaN'],
    shipped: null,
    // One check whose figure gives the model's verdict against its limits (warn 1.3, fail 1.5).
    checks:
      verdict === 'error'
        ? []
        : [
            {
              id: 'generalisation-gap',
              code: `generalisation-gap/${verdict}`,
              status: verdict,
              value: verdict === 'fail' ? 'Infinity' : verdict === 'warn' ? 1.4 : 1.1,
              limitKey: 'gap_ratio',
              limit: 1.5,
              warn: 1.3,
              line: 3,
              message: 'm',
              advice: '',
            },
          ],
    error: verdict === 'error' ? { message: 'bad cell', file: 'data/x.csv', line: 4, code: 'csv-cell' } : null,
  };
}

function report(file: string, models: ModelResult[], notes: string[] = []): ReportInput {
  return { file, text: JSON.stringify(summarise(models, '0.0.1', notes), null, 2) };
}

function mergeError(inputs: ReportInput[], options: MergeOptions = {}): InputError {
  try {
    mergeReports(inputs, '9.9.9', options);
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('mergeReports', () => {
  it('joins models of every report, sorted, with the verdict and counts recomputed', () => {
    const merged = mergeReports(
      [
        report('a.json', [model('zeta', 'pass'), model('alpha', 'warn')], ['shard 1/2: 2 models']),
        report('b.json', [model('mid', 'fail')], ['shard 2/2: 1 model', 'shard 1/2: 2 models']),
      ],
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
    [
      'another tool',
      '{"tool":{"name":"other","version":"1"},"verdict":"pass","counts":{"models":0,"pass":0,"warn":0,"fail":0,"error":0},"models":[],"notes":[]}',
      'tool.name',
    ],
    [
      'bad verdict',
      '{"tool":{"name":"fitgate","version":"1"},"verdict":"fine","counts":{"models":0,"pass":0,"warn":0,"fail":0,"error":0},"models":[],"notes":[]}',
      'verdict',
    ],
    [
      'models not an array',
      '{"tool":{"name":"fitgate","version":"1"},"verdict":"pass","counts":{"models":0,"pass":0,"warn":0,"fail":0,"error":0},"models":{},"notes":[]}',
      'models',
    ],
    ['no counts', '{"tool":{"name":"fitgate","version":"1"},"verdict":"pass","models":[],"notes":[]}', 'counts'],
    [
      'an unknown key',
      '{"tool":{"name":"fitgate","version":"1"},"verdict":"pass","counts":{"models":0,"pass":0,"warn":0,"fail":0,"error":0},"models":[],"notes":[],"verdikt":"pass"}',
      'verdikt',
    ],
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
    [
      'check status',
      (m: Record<string, unknown>) => ((m.checks as Record<string, unknown>[])[0].status = 'bad'),
      'models[1].checks[0].status',
    ],
  ])('rejects a model with a bad %s, naming the key path', (_, spoil, key) => {
    const models = [model('a', 'pass'), model('b', 'pass')] as unknown as Record<string, unknown>[];
    spoil(models[1]);
    const e = mergeError([
      {
        file: 'r.json',
        text: JSON.stringify({
          tool: { name: 'fitgate', version: '1' },
          verdict: 'pass',
          counts: { models: 2, pass: 2, warn: 0, fail: 0, error: 0 },
          models,
          notes: [],
        }),
      },
    ]);
    expect(e.code, e.message).toBe(MERGE_ERROR.shape);
    expect(e.location).toEqual({ file: 'r.json', key });
  });

  it('rejects a model name found in two reports, naming both', () => {
    const e = mergeError([
      report('a.json', [model('x', 'pass')]),
      report('b.json', [model('y', 'pass'), model('x', 'pass', 'other/x.model.yml')]),
    ]);
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
    expect(parsed).toEqual({
      kind: 'merge',
      reports: ['/work/a.json', '/work/dir/b.json'],
      format: 'markdown',
      out: 'all.md',
      color: null,
      failOn: 'warn',
      debug: false,
      verbose: false,
      html: null,
      sarif: null,
      junit: null,
      expect: null,
    });
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
    // check resolves --root (default the working directory) with realpath: a folder that exists.
    const parsed = parseArgs(['check', '--shard', '2/3', '--jobs', '4'], tmpdir());
    expect(parsed.kind).toBe('check');
    if (parsed.kind === 'check') {
      expect(parsed.shard).toEqual({ index: 2, count: 3 });
      expect(parsed.jobs).toBe(4);
    }
    const plain = parseArgs(['check'], tmpdir());
    if (plain.kind === 'check') expect([plain.shard, plain.jobs]).toEqual([null, null]);
  });

  it.each([
    ['--shard', '4/3'],
    ['--shard', 'x'],
    ['--jobs', '0'],
    ['--jobs', 'many'],
  ])('rejects %s %s with an InputError', (flag, value) => {
    expect(() => parseArgs(['check', flag, value], tmpdir())).toThrow(InputError);
  });
});

describe('jsonErrorOffset', () => {
  it('agrees with JSON.parse on valid and invalid text', () => {
    const valid = ['{}', '[]', ' {"a": [1, -2.5e3, true, false, null, "x\\"\\u00e9"]} ', '0', '"s"'];
    for (const t of valid) {
      expect(() => JSON.parse(t)).not.toThrow();
      expect(jsonErrorOffset(t), t).toBe(-1);
    }
    const invalid: [string, number][] = [
      ['', 0],
      ['{', 1],
      ['[1,]', 3],
      ['{"a" 1}', 5],
      ['01', 1],
      ['[1] x', 4],
      ['"\u0001"', 1],
      ['[tru]', 1],
      ['{"a":1,}', 7],
    ];
    for (const [t, at] of invalid) {
      expect(() => JSON.parse(t), t).toThrow();
      expect(jsonErrorOffset(t), JSON.stringify(t)).toBe(at);
    }
  });
});

describe('merge trusts nothing in a report', () => {
  const EXAMPLES = fileURLToPath(new URL('../../examples', import.meta.url));

  it('merges the real JSON reports of a sharded run of the example repository back into the whole run (the schema takes real output, charts and details included)', async () => {
    const settings = defaultSettings(EXAMPLES);
    const repo = createFsRepository(EXAMPLES);
    const whole = await runPipeline(settings, repo);
    const shards = [
      await runPipeline(settings, repo, { shard: { index: 1, count: 2 } }),
      await runPipeline(settings, repo, { shard: { index: 2, count: 2 } }),
    ];
    expect(shards.map((s) => s.shard)).toEqual([
      { index: 1, count: 2 },
      { index: 2, count: 2 },
    ]);
    const merged = mergeReports(
      shards.map((s, i) => ({ file: `shard-${i + 1}.json`, text: formatJson(s) })),
      whole.tool.version,
      { expect: 2 },
    );
    expect(JSON.parse(JSON.stringify(merged.models))).toEqual(JSON.parse(JSON.stringify(whole.models)));
    expect([merged.verdict, merged.counts]).toEqual([whole.verdict, whole.counts]);
    expect(merged.shard).toBeUndefined();
  }, 120_000);

  it('refuses nesting deeper than 64 levels before parsing, with line and column (no stack overflow)', () => {
    for (const deep of ['['.repeat(1_000_000), `{"a":\n${'['.repeat(65)}${']'.repeat(65)}}`]) {
      const e = mergeError([{ file: 'deep.json', text: deep }]);
      expect(e.code, e.message).toBe(MERGE_ERROR.tooDeep);
      expect(e.location.file).toBe('deep.json');
    }
    const e = mergeError([{ file: 'deep.json', text: `{"a":\n${'['.repeat(65)}${']'.repeat(65)}}` }]);
    expect([e.location.line, e.location.column]).toEqual([2, 64]); // the 65th level: `{` on line 1, then 64 `[`
    // Deep nesting where the schema lets anything through (a check's free-form detail) is refused too.
    const r = JSON.parse(report('a.json', [model('a', 'pass')]).text) as { models: { checks: { detail?: unknown }[] }[] };
    let nested: unknown = 1;
    for (let i = 0; i < 70; i++) nested = [nested];
    r.models[0].checks[0].detail = nested;
    expect(mergeError([{ file: 'a.json', text: JSON.stringify(r) }]).code).toBe(MERGE_ERROR.tooDeep);
  });

  it('refuses a number literal beyond the double range (1e999 parses to Infinity) with line and column', () => {
    const good = report('a.json', [model('a', 'pass')]).text;
    const bad = good.replace('"coefficients": [\n        1,', '"coefficients": [\n        1e999,');
    expect(bad).not.toBe(good);
    const e = mergeError([{ file: 'a.json', text: bad }]);
    expect(e.code).toBe(MERGE_ERROR.number);
    expect(e.message).toContain('1e999');
    expect(e.location.line).toBe(bad.slice(0, bad.indexOf('1e999')).split('\n').length);
  });

  it.each([
    [
      'a check status the figure does not give',
      (r: any) => {
        r.models[0].checks[0].status = 'pass';
      },
      'models[0].checks[0].status',
    ],
    [
      'a model verdict its checks do not give',
      (r: any) => {
        r.models[0].verdict = 'pass';
      },
      'models[0].verdict',
    ],
    [
      'an error verdict without an error',
      (r: any) => {
        r.models[0].verdict = 'error';
        r.models[0].checks = [];
      },
      'models[0].verdict',
    ],
    [
      'an error with a pass verdict',
      (r: any) => (r.models[0].error = { message: 'x', file: null, line: null, code: 'c' }),
      'models[0].verdict',
    ],
    [
      'a report verdict its models do not give',
      (r: any) => {
        r.verdict = 'pass';
      },
      'verdict',
    ],
    [
      'counts its models do not give',
      (r: any) => {
        r.counts.fail = 0;
      },
      'counts.fail',
    ],
  ])('recomputes statuses and verdicts: refuses %s', (_, spoil, key) => {
    const r = JSON.parse(report('a.json', [model('a', 'fail')]).text);
    spoil(r);
    const e = mergeError([{ file: 'a.json', text: JSON.stringify(r) }]);
    expect(e.code, e.message).toBe(MERGE_ERROR.inconsistent);
    expect(e.location).toEqual({ file: 'a.json', key });
  });

  it.each([
    [
      'a chart line 0',
      (m: any) => {
        m.charts = charts({ lines: [0] });
      },
      'models[0].charts.train.lines[0]',
    ],
    [
      'a chart value as a string',
      (m: any) => {
        m.charts = charts({ actual: ['NaN'] });
      },
      'models[0].charts.train.actual[0]',
    ],
    [
      'a check line 0',
      (m: any) => {
        m.checks[0].line = 0;
      },
      'models[0].checks[0].line',
    ],
    [
      'a fractional row count',
      (m: any) => {
        m.rows.train = 1.5;
      },
      'models[0].rows.train',
    ],
    [
      'a metric that is an object',
      (m: any) => {
        m.metrics.gap_ratio = { x: 1 };
      },
      'models[0].metrics.gap_ratio',
    ],
    [
      'an unknown base status',
      (m: any) =>
        (m.base = { status: 'old', commit: 'c', holdout_rmse: null, gap_ratio: null, holdout_rmse_change: null, gap_ratio_change: null }),
      'models[0].base.status',
    ],
    [
      'a __proto__ key on a model',
      (m: any) => Object.defineProperty(m, '__proto__', { value: { verdict: 'pass' }, enumerable: true }),
      'models[0].__proto__',
    ],
    [
      'a constructor key on a check',
      (m: any) => {
        m.checks[0].constructor = 'x';
      },
      'models[0].checks[0].constructor',
    ],
  ])('validates every field a reporter reads: refuses %s', (_, spoil, key) => {
    const m = JSON.parse(JSON.stringify(model('a', 'pass')));
    spoil(m);
    const e = mergeError([{ file: 'a.json', text: JSON.stringify(summarise([m], '1')) }]);
    expect(e.code, e.message).toBe(MERGE_ERROR.shape);
    expect(e.location).toEqual({ file: 'a.json', key });
  });

  it('treats __proto__, constructor and hasOwnProperty as plain model and column names', () => {
    const named = ['__proto__', 'constructor', 'hasOwnProperty'].map((n) => {
      const m = model(n, 'pass');
      m.charts = charts({});
      m.charts.partials = [{ input: 'x', others: JSON.parse('{"__proto__": 1.5, "constructor": 2}'), range: [0, 1], x: [0, 1], y: [1, 2] }];
      return m;
    });
    const merged = mergeReports([report('a.json', named.slice(0, 2)), report('b.json', named.slice(2))], '1');
    expect(merged.models.map((m) => m.name).sort()).toEqual(['__proto__', 'constructor', 'hasOwnProperty']);
    const others = merged.models[0].charts?.partials[0].others as Record<string, number>;
    expect(Object.getOwnPropertyNames(others)).toEqual(['__proto__', 'constructor']);
    expect(Object.getPrototypeOf(merged.models[0])).toBe(Object.prototype);
    expect(formatJson(merged)).toContain('"__proto__": 1.5');
    // The same name twice is still a duplicate.
    expect(
      mergeError([report('a.json', [model('__proto__', 'pass')]), report('b.json', [model('__proto__', 'pass', 'x.model.yml')])]).code,
    ).toBe(MERGE_ERROR.duplicate);
  });

  describe('a missing shard is an error', () => {
    const shard = (file: string, index: number, count: number, names: string[]): ReportInput => {
      const r = summarise(
        names.map((n) => model(n, 'pass')),
        '1',
        [`shard ${index}/${count}`],
      );
      r.shard = { index, count };
      return { file, text: JSON.stringify(r) };
    };

    it('with --expect N, there must be N reports', () => {
      const e = mergeError([report('a.json', [model('a', 'pass')]), report('b.json', [model('b', 'pass')])], { expect: 3 });
      expect(e.code).toBe(MERGE_ERROR.missingShard);
      expect(e.message).toContain('got 2');
      expect(
        mergeReports([report('a.json', [model('a', 'pass')]), report('b.json', [model('b', 'pass')])], '1', { expect: 2 }).counts.models,
      ).toBe(2);
    });

    it('reports that name their shard must cover 1..N once each, with or without --expect', () => {
      const e = mergeError([shard('a.json', 1, 3, ['a']), shard('c.json', 3, 3, ['c'])]);
      expect(e.code).toBe(MERGE_ERROR.missingShard);
      expect(e.message).toContain('shard 2/3 is missing');
      expect(mergeError([shard('a.json', 1, 2, ['a']), shard('b.json', 1, 2, ['b'])]).code).toBe(MERGE_ERROR.duplicate);
      expect(mergeError([shard('a.json', 1, 2, ['a']), shard('b.json', 2, 3, ['b'])]).code).toBe(MERGE_ERROR.missingShard);
      expect(mergeError([shard('a.json', 1, 2, ['a']), report('b.json', [model('b', 'pass')])]).location).toEqual({
        file: 'b.json',
        key: 'shard',
      });
      expect(mergeError([shard('a.json', 1, 2, ['a']), shard('b.json', 2, 2, ['b'])], { expect: 3 }).code).toBe(MERGE_ERROR.missingShard);
      expect(mergeReports([shard('b.json', 2, 2, ['b']), shard('a.json', 1, 2, ['a'])], '1').models.map((m) => m.name)).toEqual(['a', 'b']);
    });

    it('reads --expect from the command line', () => {
      expect(parseArgs(['merge', 'a.json', '--expect', '4'], '/work')).toMatchObject({ kind: 'merge', expect: 4 });
      for (const bad of ['0', 'x', '1.5', '10001'])
        expect(() => parseArgs(['merge', 'a.json', '--expect', bad], '/work'), bad).toThrow(InputError);
    });
  });
});

/** Minimal chart data of a model of one input, with some fields replaced. */
function charts(train: Record<string, unknown>): NonNullable<ModelResult['charts']> {
  const series = { rows: 1, shown: 1, thinned: false, thinning: '', lines: [2], x: [[1]], actual: [2], fitted: [2], residual: [0] };
  return {
    target: 'y',
    inputs: ['x'],
    train: { ...series, ...train } as never,
    holdout: series,
    fit: null,
    partials: [],
    sweep: null,
    coefficients: { columns: ['x'], values: [1], limit: 25, warn: null },
  };
}
