/**
 * Files that exist but that the system will not let fitgate read (permissions, I/O errors) are
 * that model's error, `file-unreadable`, never the end of the run and never a fault in fitgate.
 * Tests run as root here, where a mode of 000 does not stop a read, so the file system's answer is
 * made up: `node:fs` is replaced by the real module with `readFileSync` and `openSync` failing
 * with EACCES (as the system call does for a file without read permission) for paths holding
 * `locked`.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { defaultSettings } from '../../src/run/settings.js';
import { descriptor, HOLDOUT, TRAIN } from '../hostile/corpus/repo.js';

vi.mock('node:fs', async (importOriginal) => {
  const actual = await importOriginal<typeof import('node:fs')>();
  const refuse = (path: unknown): void => {
    if (String(path).includes('locked'))
      throw Object.assign(new Error(`EACCES: permission denied, open '${String(path)}'`), { code: 'EACCES', errno: -13, syscall: 'open' });
  };
  const readFileSync = ((path: Parameters<typeof actual.readFileSync>[0], ...rest: unknown[]) => {
    refuse(path);
    return (actual.readFileSync as (...args: unknown[]) => unknown)(path, ...rest);
  }) as typeof actual.readFileSync;
  const openSync = ((path: Parameters<typeof actual.openSync>[0], ...rest: unknown[]) => {
    refuse(path);
    return (actual.openSync as (...args: unknown[]) => number)(path, ...rest);
  }) as typeof actual.openSync;
  return { ...actual, default: { ...actual, readFileSync, openSync }, readFileSync, openSync };
});

const base = mkdtempSync(join(tmpdir(), 'fitgate-unreadable-'));
afterAll(() => rmSync(base, { recursive: true, force: true }));

function write(files: Record<string, string>): string {
  const root = mkdtempSync(join(base, 'repo-'));
  for (const [rel, text] of Object.entries(files)) {
    mkdirSync(dirname(join(root, rel)), { recursive: true });
    writeFileSync(join(root, rel), text);
  }
  return root;
}

describe('an unreadable file is that model error (file-unreadable)', () => {
  it('an unreadable descriptor and an unreadable data file each fail their own model; the others are checked', async () => {
    const root = write({
      'fitgate.yml': 'version: 1\nmodels: ["models/*.model.yml"]\n',
      'models/a.model.yml': descriptor({ name: 'a' }),
      'models/b-locked.model.yml': descriptor({ name: 'b' }),
      'models/c.model.yml': descriptor({ name: 'c', train: '../data/locked-train.csv' }),
      'data/train.csv': TRAIN,
      'data/locked-train.csv': TRAIN,
      'data/holdout.csv': HOLDOUT,
    });
    const result = await runPipeline(defaultSettings(root), createFsRepository(root));
    const byName = Object.fromEntries(result.models.map((m) => [m.name, m]));
    expect(result.models.map((m) => [m.name, m.verdict])).toEqual([
      ['a', 'pass'],
      ['models/b-locked.model.yml', 'error'],
      ['c', 'error'],
    ]);
    expect(byName['models/b-locked.model.yml'].error).toMatchObject({ code: 'file-unreadable', file: 'models/b-locked.model.yml' });
    expect(byName.c.error).toMatchObject({ code: 'file-unreadable', file: 'data/locked-train.csv' });
    expect(byName.c.error?.message).toContain('EACCES');
    expect(JSON.stringify(result)).not.toContain('fault in fitgate');
  });

  it('an unreadable settings file ends the run with an InputError naming it', async () => {
    const root = write({ 'locked.yml': 'version: 1\n', 'models/a.model.yml': descriptor({ name: 'a' }) });
    await expect(
      runPipeline({ ...defaultSettings(root), config: 'locked.yml', configExplicit: true }, createFsRepository(root)),
    ).rejects.toMatchObject({
      name: 'InputError',
      code: 'file-unreadable',
      location: { file: 'locked.yml' },
    });
  });
});
