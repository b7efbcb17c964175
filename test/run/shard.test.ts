import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../src/core/errors.js';
import { mergeReports } from '../../src/result/merge.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { defaultSettings } from '../../src/run/settings.js';
import { formatShard, parseShard, selectShard, SHARD_ERROR } from '../../src/run/shard.js';
import { VERSION } from '../../src/core/version.js';
import { fleetFiles } from './fleet.js';

function inputError(fn: () => unknown): InputError {
  try {
    fn();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError, nothing was thrown');
}

describe('parseShard', () => {
  it('reads K/N with white space', () => {
    expect(parseShard('2/4')).toEqual({ index: 2, count: 4 });
    expect(parseShard(' 1 / 1 ')).toEqual({ index: 1, count: 1 });
    expect(formatShard(parseShard('3/7'))).toBe('3/7');
  });

  it.each(['', '2', '2/', '/4', 'a/b', '2/4/6', '-1/4', '1.5/4', '2 of 4'])('rejects %j as syntax', (text) => {
    const e = inputError(() => parseShard(text, 'shard'));
    expect(e.code).toBe(SHARD_ERROR.syntax);
    expect(e.location.key).toBe('shard');
    expect(e.message).toContain(JSON.stringify(text));
  });

  it.each(['0/4', '5/4', '1/0', '0/0', '1/10001'])('rejects %j as out of range', (text) => {
    expect(inputError(() => parseShard(text)).code).toBe(SHARD_ERROR.range);
  });
});

describe('selectShard', () => {
  const paths = ['models/b.model.yml', 'models/a.model.yml', 'z/c.model.yml', 'models/A.model.yml', 'models/a/x.model.yml'];

  it('takes every path without a shard, sorted by code units', () => {
    expect(selectShard(paths, null)).toEqual([
      'models/A.model.yml',
      'models/a.model.yml',
      'models/a/x.model.yml',
      'models/b.model.yml',
      'z/c.model.yml',
    ]);
    expect(selectShard([], null)).toEqual([]);
  });

  it('deals the sorted paths round-robin', () => {
    expect(selectShard(paths, { index: 1, count: 2 })).toEqual(['models/A.model.yml', 'models/a/x.model.yml', 'z/c.model.yml']);
    expect(selectShard(paths, { index: 2, count: 2 })).toEqual(['models/a.model.yml', 'models/b.model.yml']);
    expect(selectShard(paths, { index: 3, count: 9 })).toEqual(['models/a/x.model.yml']);
    expect(selectShard(paths, { index: 9, count: 9 })).toEqual([]);
  });

  it('puts every path in exactly one shard, sizes within one, whatever the input order', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.string({ minLength: 1, maxLength: 12 }), { maxLength: 60 }),
        fc.integer({ min: 1, max: 12 }),
        (list, count) => {
          const reversed = [...list].reverse();
          const shards = Array.from({ length: count }, (_, k) => selectShard(list, { index: k + 1, count }));
          const again = Array.from({ length: count }, (_, k) => selectShard(reversed, { index: k + 1, count }));
          expect(again, 'input order does not matter').toEqual(shards);
          const all = shards.flat();
          expect(all.length, `paths ${JSON.stringify(list)}, ${count} shards`).toBe(list.length);
          expect(new Set(all)).toEqual(new Set(list));
          const sizes = shards.map((s) => s.length);
          expect(Math.max(...sizes) - Math.min(...sizes), `sizes ${sizes.join(', ')}`).toBeLessThanOrEqual(1);
        },
      ),
    );
  });

  it('counts a repeated path once', () => {
    expect(selectShard(['a', 'a', 'b'], { index: 1, count: 2 })).toEqual(['a']);
  });
});

describe('sharded runs', () => {
  const files = fleetFiles(4);
  const settings = defaultSettings('/repo');
  const strip = (r: { notes: string[] }) => ({ ...r, notes: [] });

  it('check every model once across shards, and merge back to the whole run', async () => {
    const whole = await runPipeline(settings, createMemoryRepository(files));
    for (const count of [1, 2, 3, 5]) {
      const reports = [];
      for (let k = 1; k <= count; k++) {
        const result = await runPipeline(settings, createMemoryRepository(files), { shard: { index: k, count } });
        expect(
          result.notes.some((n) => n.startsWith(`shard ${k}/${count}:`)),
          `note of shard ${k}/${count}`,
        ).toBe(true);
        reports.push({ file: `shard-${k}.json`, text: JSON.stringify(result) });
      }
      const merged = mergeReports(reports, VERSION);
      expect(strip(merged), `${count} shards merged`).toEqual(strip(JSON.parse(JSON.stringify(whole))));
      expect(merged.notes.filter((n) => n.startsWith('shard ')).length).toBe(count);
    }
  });

  it('leaves an empty shard with no models and a pass verdict', async () => {
    const few = Object.fromEntries(Object.entries(files).filter(([f]) => !f.startsWith('models/generated/')));
    const models = Object.keys(few).filter((f) => f.endsWith('.model.yml')).length;
    const empty = await runPipeline(settings, createMemoryRepository(few), { shard: { index: models + 1, count: models + 1 } });
    expect(empty.models).toEqual([]);
    expect(empty.verdict).toBe('pass');
  });
});
