import { describe, expect, it } from 'vitest';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { expectInputError } from '../config/helpers.js';

describe('createMemoryRepository', () => {
  const repo = createMemoryRepository(
    { 'a/b.csv': 'x\n1\n', './c.yml': new Uint8Array([1, 2, 3, 4, 5]), 'node_modules/p/q.yml': '' },
    'base commit abc1234',
  );

  it('reads strings as UTF-8 and bytes as given, under normalised paths', async () => {
    expect(repo.label).toBe('base commit abc1234');
    expect(new TextDecoder().decode(await repo.read('a/b.csv'))).toBe('x\n1\n');
    expect(Array.from(await repo.read('c.yml'))).toEqual([1, 2, 3, 4, 5]);
    expect(await repo.size('./a//b.csv')).toBe(4);
    expect(await repo.isFile('a')).toBe(false);
    expect(await repo.isFile('a/b.csv')).toBe(true);
  });

  it('streams in chunks and handles empty files', async () => {
    const sizes: number[] = [];
    for await (const chunk of repo.stream('c.yml', 2)) sizes.push(chunk.byteLength);
    expect(sizes).toEqual([2, 2, 1]);
    const empty: Uint8Array[] = [];
    for await (const chunk of repo.stream('node_modules/p/q.yml')) empty.push(chunk);
    expect(empty).toEqual([]);
  });

  it('refuses missing files, absolute paths and .. escapes', async () => {
    await expectInputError(() => repo.read('nope.csv'), { code: 'file-missing', file: 'nope.csv' });
    await expectInputError(() => repo.read('/a/b.csv'), { code: 'path-outside', file: '/a/b.csv' });
    await expectInputError(() => repo.isFile('a/../../b.csv'), { code: 'path-outside', file: 'a/../../b.csv' });
    await expectInputError(() => repo.read('C:\\x.csv'), { code: 'path-outside', file: 'C:\\x.csv' });
  });

  it('resolves relative to the naming file', async () => {
    expect(await repo.resolve('a/m.model.yml', 'b.csv', {})).toBe('a/b.csv');
    expect(await repo.resolve('a/m.model.yml', '..\\c.yml', {})).toBe('c.yml');
    await expectInputError(() => repo.resolve('a/m.model.yml', '../../c.yml', { line: 3, key: 'data.train' }), {
      code: 'path-outside',
      file: 'a/m.model.yml',
      line: 3,
      key: 'data.train',
    });
  });

  it('globs, skipping node_modules unless a pattern names it', async () => {
    expect(await repo.glob(['**/*.yml', '**/*.csv'])).toEqual({ paths: ['a/b.csv', 'c.yml'], notEntered: [] });
    expect((await repo.glob(['node_modules/**/*.yml'])).paths).toEqual(['node_modules/p/q.yml']);
    await expectInputError(() => repo.glob(['../*.yml']), { code: 'path-outside' });
  });

  it('tells folders from missing files', async () => {
    expect(await repo.entryKind('a')).toBe('folder');
    expect(await repo.entryKind('a/b.csv')).toBe('file');
    expect(await repo.entryKind('a/none.csv')).toBe('missing');
    await expectInputError(() => repo.read('a'), { code: 'not-a-file', file: 'a' });
  });
});
