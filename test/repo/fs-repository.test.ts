import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { discoverDescriptors } from '../../src/config/discover.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { expectInputError } from '../config/helpers.js';

let base: string;
let root: string;

const descriptor = (train: string) =>
  `version: 1\nname: m\ndata:\n  train: ${train}\n  holdout: h.csv\n  target: y\nterms: [ { linear: [x] } ]\n`;

beforeAll(() => {
  base = mkdtempSync(join(tmpdir(), 'fitgate-fs-'));
  root = join(base, 'repo');
  mkdirSync(join(root, 'models', 'deep'), { recursive: true });
  mkdirSync(join(root, 'node_modules', 'pkg'), { recursive: true });
  mkdirSync(join(base, 'outside'), { recursive: true });
  writeFileSync(join(base, 'outside', 'secret.csv'), 'x,y\n1,2\n');
  writeFileSync(join(base, 'outside', 'evil.model.yml'), descriptor('h.csv'));
  writeFileSync(join(root, 'models', 'h.csv'), 'x,y\n1,2\n');
  writeFileSync(join(root, 'models', 't.csv'), 'x,y\n3,4\n');
  writeFileSync(join(root, 'models', 'ok.model.yml'), descriptor('t.csv'));
  writeFileSync(join(root, 'models', 'deep', 'b.model.yml'), descriptor('../t.csv'));
  writeFileSync(join(root, 'node_modules', 'pkg', 'n.model.yml'), descriptor('t.csv'));
  // Links: one to a file inside, one to a file outside, one to a folder outside, one dangling.
  symlinkSync(join(root, 'models', 't.csv'), join(root, 'models', 'inside-link.csv'));
  symlinkSync(join(base, 'outside', 'secret.csv'), join(root, 'models', 'out-link.csv'));
  symlinkSync(join(base, 'outside'), join(root, 'models', 'out-dir'));
  symlinkSync(join(base, 'outside', 'nothing.csv'), join(root, 'models', 'dangling.csv'));
  symlinkSync(join(root, 'models', 'deep'), join(root, 'models', 'in-dir'));
  execFileSync('mkfifo', [join(root, 'models', 'pipe.csv')]);
  mkdirSync(join(root, '.git'), { recursive: true });
  writeFileSync(join(root, '.git', 'g.model.yml'), descriptor('t.csv'));
  writeFileSync(join(root, 'models', 'via-link.model.yml'), descriptor('out-link.csv'));
  writeFileSync(join(root, 'models', 'via-dir.model.yml'), descriptor('out-dir/secret.csv'));
  writeFileSync(join(root, 'models', 'via-inside.model.yml'), descriptor('inside-link.csv'));
});

afterAll(() => {
  rmSync(base, { recursive: true, force: true });
});

describe('createFsRepository: reading', () => {
  it('reads, sizes and streams files inside the root', async () => {
    const repo = createFsRepository(root);
    expect(new TextDecoder().decode(await repo.read('models/h.csv'))).toBe('x,y\n1,2\n');
    expect(await repo.size('models/h.csv')).toBe(8);
    expect(await repo.isFile('models/h.csv')).toBe(true);
    expect(await repo.isFile('models')).toBe(false);
    expect(await repo.isFile('models/none.csv')).toBe(false);
    const chunks: Uint8Array[] = [];
    for await (const chunk of repo.stream('models/h.csv', 3)) chunks.push(chunk);
    expect(chunks.map((c) => c.byteLength)).toEqual([3, 3, 2]);
    expect(new TextDecoder().decode(await repo.read('models/inside-link.csv')), 'a link inside the root is followed').toBe('x,y\n3,4\n');
  });

  it('resolves a name under a folder it found before one name at a time, and still follows or refuses the links there', async () => {
    const repo = createFsRepository(root);
    // `models` is now known as a plain folder; the names below it are links of every kind.
    expect(await repo.size('models/h.csv')).toBe(8);
    await expectInputError(() => repo.read('models/out-link.csv'), { code: 'path-outside', file: 'models/out-link.csv' });
    await expectInputError(() => repo.read('models/out-dir/secret.csv'), { code: 'path-outside', file: 'models/out-dir/secret.csv' });
    expect(new TextDecoder().decode(await repo.read('models/inside-link.csv'))).toBe('x,y\n3,4\n');
    expect(await repo.isFile('models/in-dir/b.model.yml')).toBe(true);
    expect(await repo.entryKind('models/dangling.csv')).toBe('broken-link');
    expect(await repo.entryKind('models/h.csv/x')).toBe('missing');
    // Asked again, the answers are the same.
    await expectInputError(() => repo.read('models/out-link.csv'), { code: 'path-outside', file: 'models/out-link.csv' });
    expect(await repo.isFile('models/in-dir/b.model.yml')).toBe(true);
  });

  it('streams a big file in fresh pieces of the size asked for, and an empty file as nothing', async () => {
    const bytes = new Uint8Array(200_000);
    for (let i = 0; i < bytes.length; i++) bytes[i] = (i * 7919) % 251;
    writeFileSync(join(root, 'models', 'big.bin'), bytes);
    writeFileSync(join(root, 'models', 'empty.csv'), '');
    const repo = createFsRepository(root);
    const pieces: Uint8Array[] = [];
    for await (const piece of repo.stream('models/big.bin', 65_536)) pieces.push(piece);
    expect(pieces.map((c) => c.byteLength)).toEqual([65_536, 65_536, 65_536, 3_392]);
    // Kept pieces are not overwritten by later reads.
    expect(Buffer.concat(pieces).equals(Buffer.from(bytes))).toBe(true);
    const whole: Uint8Array[] = [];
    for await (const piece of repo.stream('models/big.bin')) whole.push(piece);
    expect(whole.map((c) => c.byteLength)).toEqual([200_000]);
    const empty: Uint8Array[] = [];
    for await (const piece of repo.stream('models/empty.csv')) empty.push(piece);
    expect(empty).toEqual([]);
  });

  it('gives file-missing for missing files, not-a-file for folders, links to nothing and FIFOs', async () => {
    const repo = createFsRepository(root);
    await expectInputError(() => repo.read('models/none.csv'), { code: 'file-missing', file: 'models/none.csv' });
    await expectInputError(() => repo.size('models'), { code: 'not-a-file', file: 'models', message: /is a folder/ });
    await expectInputError(() => repo.read('models/dangling.csv'), {
      code: 'not-a-file',
      file: 'models/dangling.csv',
      message: /symbolic link that leads to nothing/,
    });
    await expectInputError(() => repo.read('models/pipe.csv'), { code: 'not-a-file', file: 'models/pipe.csv', message: /FIFO/ });
    expect(
      await Promise.all(
        ['models/h.csv', 'models/none.csv', 'models', 'models/dangling.csv', 'models/pipe.csv', 'models/inside-link.csv'].map((p) =>
          repo.entryKind(p),
        ),
      ),
    ).toEqual(['file', 'missing', 'folder', 'broken-link', 'special', 'file']);
  });

  it('keeps only real paths found inside: a missing path is looked up again, a refused one refused again', async () => {
    const repo = createFsRepository(root);
    expect(await repo.entryKind('later.csv')).toBe('missing');
    writeFileSync(join(root, 'later.csv'), 'x,y\n5,6\n');
    try {
      expect(await repo.entryKind('later.csv')).toBe('file');
      expect(await repo.size('later.csv')).toBe(8);
    } finally {
      rmSync(join(root, 'later.csv'));
    }
    // The same path through a link, resolved twice and read twice: the same file each time.
    for (let k = 0; k < 2; k++) {
      expect(await repo.resolve('models/ok.model.yml', 'inside-link.csv', { line: 4 })).toBe('models/inside-link.csv');
      expect(new TextDecoder().decode(await repo.read('models/inside-link.csv'))).toBe('x,y\n3,4\n');
      await expectInputError(() => repo.read('models/out-link.csv'), { code: 'path-outside' });
    }
  });

  it('refuses absolute paths, .. escapes and links that lead outside, for every method', async () => {
    const repo = createFsRepository(root);
    const bad = [
      join(base, 'outside', 'secret.csv'),
      '../outside/secret.csv',
      'models/../../outside/secret.csv',
      'models/out-link.csv',
      'models/out-dir/secret.csv',
      'models/out-dir/none.csv',
    ];
    for (const path of bad) {
      await expectInputError(() => repo.read(path), { code: 'path-outside', file: path });
      await expectInputError(() => repo.isFile(path), { code: 'path-outside', file: path });
      await expectInputError(() => repo.size(path), { code: 'path-outside', file: path });
      await expectInputError(
        async () => {
          for await (const chunk of repo.stream(path)) void chunk;
        },
        { code: 'path-outside', file: path },
      );
    }
  });

  it('resolves relative to the naming file and refuses escapes with the caller location', async () => {
    const repo = createFsRepository(root);
    const where = { line: 4, column: 10, key: 'data.train' };
    expect(await repo.resolve('models/deep/b.model.yml', '../t.csv', where)).toBe('models/t.csv');
    expect(await repo.resolve('models/ok.model.yml', './sub/../h.csv', where)).toBe('models/h.csv');
    await expectInputError(() => repo.resolve('models/ok.model.yml', '../../x.csv', where), {
      code: 'path-outside',
      file: 'models/ok.model.yml',
      line: 4,
      column: 10,
      key: 'data.train',
    });
    await expectInputError(() => repo.resolve('models/ok.model.yml', '/etc/passwd', where), {
      code: 'path-outside',
      file: 'models/ok.model.yml',
      line: 4,
      key: 'data.train',
    });
    await expectInputError(() => repo.resolve('models/ok.model.yml', 'out-link.csv', where), {
      code: 'path-outside',
      file: 'models/ok.model.yml',
      line: 4,
      key: 'data.train',
    });
  });

  it('refuses a missing root', async () => {
    await expectInputError(() => createFsRepository(join(base, 'no-such-repo')).read('a'), { code: 'file-missing' });
  });
});

describe('createFsRepository: glob', () => {
  it('lists matching files sorted, skipping node_modules, .git and dot folders', async () => {
    const repo = createFsRepository(root);
    const found = await repo.glob(['**/*.model.yml']);
    expect(found.paths).toEqual([
      'models/deep/b.model.yml',
      'models/ok.model.yml',
      'models/via-dir.model.yml',
      'models/via-inside.model.yml',
      'models/via-link.model.yml',
    ]);
  });

  it('enters node_modules and .git only for a pattern that names them', async () => {
    const repo = createFsRepository(root);
    expect((await repo.glob(['node_modules/**/*.model.yml'])).paths).toEqual(['node_modules/pkg/n.model.yml']);
    expect((await repo.glob(['.git/*.model.yml'])).paths).toEqual(['.git/g.model.yml']);
    expect((await repo.glob(['*/*/*.model.yml', '**/n.model.yml', '**/g.model.yml'])).paths).toEqual(['models/deep/b.model.yml']);
  });

  it('never follows a link into a folder (inside or outside), reports it, and lists links and FIFOs that match like files', async () => {
    const repo = createFsRepository(root);
    // models/out-dir leads outside, models/in-dir inside: neither is searched, both are reported
    // (links to files are not: they are matches like files).
    expect(await repo.glob(['models/*/*.model.yml'])).toEqual({
      paths: ['models/deep/b.model.yml'],
      notEntered: ['models/in-dir', 'models/out-dir'],
    });
    expect(await repo.glob(['models/out-dir/*.model.yml'])).toEqual({ paths: [], notEntered: ['models/out-dir'] });
    expect((await repo.glob(['models/*.csv'])).paths).toEqual([
      'models/dangling.csv',
      'models/empty.csv',
      'models/h.csv',
      'models/inside-link.csv',
      'models/out-link.csv',
      'models/pipe.csv',
      'models/t.csv',
    ]);
  });

  it('refuses absolute patterns and patterns starting with ..', async () => {
    const repo = createFsRepository(root);
    await expectInputError(() => repo.glob(['../outside/*.yml']), { code: 'path-outside' });
    await expectInputError(() => repo.glob([join(base, 'outside', '*.yml')]), { code: 'path-outside' });
  });
});

describe('descriptors on disk: data paths and explicit paths through links', () => {
  it('loads a descriptor whose data path is a link inside the root', async () => {
    const d = await loadDescriptor(createFsRepository(root), 'models/via-inside.model.yml', defaultSettings());
    expect(d.data.train).toBe('models/inside-link.csv');
  });

  it('refuses data paths through links to a file or a folder outside', async () => {
    const repo = createFsRepository(root);
    await expectInputError(() => loadDescriptor(repo, 'models/via-link.model.yml', defaultSettings()), {
      code: 'path-outside',
      file: 'models/via-link.model.yml',
      line: 4,
      key: 'data.train',
    });
    await expectInputError(() => loadDescriptor(repo, 'models/via-dir.model.yml', defaultSettings()), {
      code: 'path-outside',
      file: 'models/via-dir.model.yml',
      line: 4,
      key: 'data.train',
    });
  });

  it('refuses explicit descriptor paths through links, .. or absolute', async () => {
    const repo = createFsRepository(root);
    for (const path of ['models/out-dir/evil.model.yml', '../outside/evil.model.yml', join(base, 'outside', 'evil.model.yml')]) {
      await expectInputError(() => discoverDescriptors(repo, defaultSettings(), [path]), { code: 'path-outside', file: path });
    }
  });
});
