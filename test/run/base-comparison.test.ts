import { describe, expect, it } from 'vitest';
import { compareWithBase, dataKey, matchBase } from '../../src/run/base-comparison.js';
import type { Descriptor } from '../../src/config/types.js';
import type { ModelResult } from '../../src/result/result.js';
import { model } from '../action/result-fixture.js';
import { descriptor } from '../checks/context.js';

/** A head descriptor named `name` at `file`, reading `train` (hold-out h.csv, target y). */
function head(name: string, file: string, train = `${name}.csv`): Descriptor {
  const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y' });
  return { ...d, name, file, data: { ...d.data, train, holdout: 'h.csv', target: 'y' } };
}

/** A base outcome and its data key, as the base run gives them. */
function base(name: string, file: string, train = `${name}.csv`): { result: ModelResult; key: [string, string] } {
  return {
    result: model({ name, verdict: 'pass', descriptor: file }),
    key: [name, dataKey({ data: { train, holdout: 'h.csv', target: 'y', lines: { train: 1, holdout: 1, target: 1 } } })],
  };
}

function match(heads: Descriptor[], bases: ReturnType<typeof base>[]): { by: Record<string, string>; unmatched: string[] } {
  const m = matchBase(
    heads,
    bases.map((b) => b.result),
    new Map(bases.map((b) => b.key)),
  );
  return {
    by: Object.fromEntries([...m.matches].map(([file, x]) => [file, `${x.model.name} by ${x.by}`])),
    unmatched: m.unmatched.map((x) => x.name),
  };
}

describe('matching head models with base models', () => {
  it('by name first, wherever the descriptor moved', () => {
    expect(match([head('kiln', 'models/new-place.model.yml')], [base('kiln', 'models/kiln.model.yml')])).toEqual({
      by: { 'models/new-place.model.yml': 'kiln by name' },
      unmatched: [],
    });
  });

  it('a model renamed in its file: by the descriptor path', () => {
    expect(match([head('kiln-v2', 'models/kiln.model.yml')], [base('kiln', 'models/kiln.model.yml')])).toEqual({
      by: { 'models/kiln.model.yml': 'kiln by descriptor' },
      unmatched: [],
    });
  });

  it('a model renamed and moved: by its data files, when they single it out', () => {
    expect(match([head('kiln-v2', 'models/elsewhere.model.yml', 'kiln.csv')], [base('kiln', 'models/kiln.model.yml')])).toEqual({
      by: { 'models/elsewhere.model.yml': 'kiln by data' },
      unmatched: [],
    });
  });

  it('no guess when the data files do not single out one pair, and a base model left over is reported', () => {
    // Two base models on the same data, one new head model on it: ambiguous, so new.
    const bases = [base('a', 'models/a.model.yml', 'shared.csv'), base('b', 'models/b.model.yml', 'shared.csv')];
    expect(match([head('c', 'models/c.model.yml', 'shared.csv')], bases)).toEqual({ by: {}, unmatched: ['a', 'b'] });
    // A new model on new data matches nothing, and the removed model is left over.
    expect(match([head('d', 'models/d.model.yml', 'd.csv')], [base('a', 'models/a.model.yml')])).toEqual({ by: {}, unmatched: ['a'] });
  });

  it('uses each base model once: a swap of names pairs by name, a taken path is not reused', () => {
    const bases = [base('a', 'models/1.model.yml'), base('b', 'models/2.model.yml')];
    expect(match([head('b', 'models/1.model.yml'), head('a', 'models/2.model.yml')], bases).by).toEqual({
      'models/1.model.yml': 'b by name',
      'models/2.model.yml': 'a by name',
    });
    // `a` kept its name but moved; `z` took a's old path: a by name, z new (a is taken).
    expect(
      match([head('a', 'models/9.model.yml', 'x.csv'), head('z', 'models/1.model.yml', 'y.csv')], [base('a', 'models/1.model.yml')]).by,
    ).toEqual({ 'models/9.model.yml': 'a by name' });
  });
});

describe('compareWithBase', () => {
  const metrics = { ...model({ name: 'x', verdict: 'pass' }).metrics!, holdout_rmse: 3, gap_ratio: 2 };
  const baseModel = model({
    name: 'kiln',
    verdict: 'pass',
    descriptor: 'models/kiln.model.yml',
    metrics: { ...metrics, holdout_rmse: 2, gap_ratio: 1.5 },
  });

  it('reports a model matched under another name as renamed, with the base name and path, and compares the figures', () => {
    expect(compareWithBase(metrics, { model: baseModel, by: 'descriptor' }, 'c0ffee')).toEqual({
      status: 'renamed',
      commit: 'c0ffee',
      previous: { name: 'kiln', descriptor: 'models/kiln.model.yml', matched_by: 'descriptor' },
      holdout_rmse: 2,
      gap_ratio: 1.5,
      holdout_rmse_change: 0.5,
      gap_ratio_change: 0.5,
    });
    expect(compareWithBase(metrics, { model: baseModel, by: 'data' }, 'c0ffee').previous?.matched_by).toBe('data');
  });

  it('keeps `compared` for a match by name and `new` for none', () => {
    const same = compareWithBase(metrics, { model: baseModel, by: 'name' }, 'c0ffee');
    expect(same.status).toBe('compared');
    expect(same).not.toHaveProperty('previous');
    expect(compareWithBase(metrics, null, 'c0ffee').status).toBe('new');
  });

  it('does not call a base descriptor that could not be read a rename (its name is its path)', () => {
    const unreadable = model({
      name: 'models/kiln.model.yml',
      descriptor: 'models/kiln.model.yml',
      verdict: 'error',
      metrics: null,
      error: { message: 'bad', file: 'models/kiln.model.yml', line: 1, code: 'schema' },
    });
    const c = compareWithBase(metrics, { model: unreadable, by: 'descriptor' }, 'c0ffee');
    expect(c.status).toBe('compared');
    expect(c.holdout_rmse).toBeNull();
  });
});
