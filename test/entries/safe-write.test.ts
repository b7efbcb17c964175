// Writing report files (src/safe-write.ts): never through a link, never out of the boundary
// through a folder link, and atomically (a failed or killed write leaves the previous file).
import { spawn } from 'node:child_process';
import {
  existsSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  realpathSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
  writeSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { closeSync, fstatSync } from 'node:fs';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { OUTPUT_FAILED, OUTPUT_REFUSED, openTempBeside, writeFileSafely, type WritePlace } from '../../src/entries/safe-write.js';
import { transpileSources } from '../run/transpile.js';

const top = realpathSync(mkdtempSync(path.join(tmpdir(), 'fitgate-safe-write-')));
afterAll(() => rmSync(top, { recursive: true, force: true }));

let n = 0;
/** A fresh case: `ws/` (the boundary) and `outside/` holding `secret.txt`. */
function fresh(): { ws: string; outside: string; secret: string } {
  const base = path.join(top, `case-${++n}`);
  const ws = path.join(base, 'ws');
  const outside = path.join(base, 'outside');
  mkdirSync(ws, { recursive: true });
  mkdirSync(outside);
  const secret = path.join(outside, 'secret.txt');
  writeFileSync(secret, 'outside, unchanged\n');
  return { ws, outside, secret };
}

/** The InputError a call throws (a failure when it throws nothing or something else). */
function thrown(f: () => unknown): InputError {
  try {
    f();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError, nothing was thrown');
}

/** Files in a folder whose names say they are fitgate's temporary files. */
function temps(dir: string): string[] {
  return readdirSync(dir).filter((f) => f.endsWith('.tmp'));
}

let c: ReturnType<typeof fresh>;
let inside: WritePlace;
beforeEach(() => {
  c = fresh();
  inside = { option: '--out', within: [c.ws] };
});

describe('writeFileSafely writes', () => {
  it('a new file, making the missing folders, and leaves no temporary file', () => {
    const written = writeFileSafely(path.join(c.ws, 'a/b/report.txt'), 'hello\n', inside);
    expect(written).toBe(path.join(c.ws, 'a/b/report.txt'));
    expect(readFileSync(written, 'utf8')).toBe('hello\n');
    expect(temps(path.join(c.ws, 'a/b'))).toEqual([]);
  });

  it('over an existing file by rename: a new file takes the name (another name for the old file keeps the old bytes)', () => {
    const file = path.join(c.ws, 'report.txt');
    writeFileSync(file, 'old\n');
    const before = statSync(file).ino;
    writeFileSafely(file, 'new\n', inside);
    expect(readFileSync(file, 'utf8')).toBe('new\n');
    expect(statSync(file).ino).not.toBe(before);
  });

  it('through a folder link that stays inside the boundary, into the real folder', () => {
    mkdirSync(path.join(c.ws, 'real'));
    symlinkSync('real', path.join(c.ws, 'alias'));
    expect(writeFileSafely(path.join(c.ws, 'alias', 'r.txt'), 'x', inside)).toBe(path.join(c.ws, 'real', 'r.txt'));
    expect(readFileSync(path.join(c.ws, 'real', 'r.txt'), 'utf8')).toBe('x');
  });

  it('pieces through one reused buffer: the same bytes as the joined text, multi-byte and lone surrogates, small and large pieces', () => {
    const file = path.join(c.ws, 'pieces.txt');
    // Pieces that fill the 1 MiB buffer unevenly, a piece that needs a buffer of its own, characters
    // of 2, 3 and 4 UTF-8 bytes and a lone surrogate (written as U+FFFD, as Buffer.from writes it).
    const pieces = ['a', 'é'.repeat(200_000), '€'.repeat(349_525), '😀x', 'b'.repeat(400_000), '\ud800', '€'.repeat(350_000), 'end'];
    const writes: number[] = [];
    writeFileSafely(file, pieces, inside, {
      write: (fd, bytes, offset, length) => {
        writes.push(length);
        return writeSync(fd, bytes, offset, length);
      },
    });
    expect(readFileSync(file).equals(Buffer.from(pieces.join(''), 'utf8'))).toBe(true);
    expect(writes.length).toBeGreaterThan(2);
    expect(Math.max(...writes)).toBeGreaterThan(1 << 20);
    expect(temps(c.ws)).toEqual([]);
  });

  it('pieces of bytes among strings as they are: a buffer reused for the next piece, a character split across pieces, a piece larger than the buffer', () => {
    const file = path.join(c.ws, 'bytes.txt');
    const text = `{"name": "m€😀"}${'z'.repeat(50)}`;
    const bytes = Buffer.from(text, 'utf8');
    const big = Buffer.from('€'.repeat(400_000), 'utf8');
    // The source fills one buffer again for each piece, as the model spool does.
    const shared = Buffer.alloc(bytes.length);
    function* pieces(): Generator<string | Uint8Array> {
      yield 'head ';
      for (const [from, to] of [
        [0, 11],
        [11, 13],
        [13, bytes.length],
      ]) {
        shared.fill(0);
        bytes.copy(shared, 0, from, to);
        yield shared.subarray(0, to - from);
      }
      yield big;
      yield ' tail';
    }
    writeFileSafely(file, pieces(), inside);
    expect(readFileSync(file, 'utf8')).toBe(`head ${text}${'€'.repeat(400_000)} tail`);
  });
  it('a path named outside every boundary as named (the CLI user named it), through links too', () => {
    symlinkSync(c.outside, path.join(top, `out-link-${n}`));
    const written = writeFileSafely(path.join(top, `out-link-${n}`, 'r.txt'), 'x', inside);
    expect(written).toBe(path.join(c.outside, 'r.txt'));
  });
});

describe('writeFileSafely refuses, naming the option, and writes nothing', () => {
  it('a target that is a symbolic link to a file outside', () => {
    const target = path.join(c.ws, 'report.txt');
    symlinkSync(c.secret, target);
    const error = thrown(() => writeFileSafely(target, 'forged', inside));
    expect(error.code).toBe(OUTPUT_REFUSED);
    expect(error.describe()).toBe(
      `\`--out\`: ${target} is a symbolic link; fitgate never writes through a link (remove it, or name another file)`,
    );
    expect(readFileSync(c.secret, 'utf8')).toBe('outside, unchanged\n');
    expect(lstatSync(target).isSymbolicLink()).toBe(true);
    expect(temps(c.ws)).toEqual([]);
  });

  it('a target that is a link leading nowhere (it would create a file outside)', () => {
    const target = path.join(c.ws, 'report.txt');
    symlinkSync(path.join(c.outside, 'new.txt'), target);
    expect(thrown(() => writeFileSafely(target, 'x', inside)).code).toBe(OUTPUT_REFUSED);
    expect(existsSync(path.join(c.outside, 'new.txt'))).toBe(false);
  });

  it('a folder that is a link leading out of the boundary, before making any folder', () => {
    symlinkSync(c.outside, path.join(c.ws, 'site'));
    const error = thrown(() =>
      writeFileSafely(path.join(c.ws, 'site', 'deep', 'index.html'), 'x', { option: 'html', within: [c.ws], insideOnly: true }),
    );
    expect(error.code).toBe(OUTPUT_REFUSED);
    expect(error.location.key).toBe('html');
    expect(error.message).toContain('leads out of');
    expect(readdirSync(c.outside)).toEqual(['secret.txt']);
  });

  it("a path through a link to the boundary's parent", () => {
    symlinkSync('..', path.join(c.ws, 'up'));
    const error = thrown(() => writeFileSafely(path.join(c.ws, 'up', 'outside', 'x.txt'), 'x', inside));
    expect(error.message).toContain('leads out of');
    expect(existsSync(path.join(c.outside, 'x.txt'))).toBe(false);
  });

  it('a path outside the boundary when only inside is allowed (the action)', () => {
    const error = thrown(() => writeFileSafely(path.join(c.outside, 'x.txt'), 'x', { option: 'sarif', within: [c.ws], insideOnly: true }));
    expect(error.code).toBe(OUTPUT_REFUSED);
    expect(error.location.key).toBe('sarif');
  });

  it('a target that is a folder, and a path that names no file', () => {
    mkdirSync(path.join(c.ws, 'dir'));
    expect(thrown(() => writeFileSafely(path.join(c.ws, 'dir'), 'x', inside)).message).toContain('is not a regular file');
    expect(thrown(() => writeFileSafely('', 'x', inside)).code).toBe(OUTPUT_REFUSED);
    expect(thrown(() => writeFileSafely('a\0b', 'x', inside)).code).toBe(OUTPUT_REFUSED);
  });
});

describe('openTempBeside', () => {
  it('creates a new file in the real folder of the target, open for reading and writing', () => {
    mkdirSync(path.join(c.ws, 'real'));
    symlinkSync('real', path.join(c.ws, 'alias'));
    const temp = openTempBeside(path.join(c.ws, 'alias', 'deep', 'report.json'), inside, 'spool');
    try {
      expect(path.dirname(temp.path)).toBe(path.join(c.ws, 'real', 'deep'));
      expect(path.basename(temp.path)).toMatch(/^\.report\.json\.\d+\.[0-9a-z]+\.spool$/);
      expect(lstatSync(temp.path).isFile()).toBe(true);
      expect(fstatSync(temp.fd).size).toBe(0);
      expect(writeSync(temp.fd, 'abc', 0)).toBe(3);
    } finally {
      closeSync(temp.fd);
      rmSync(temp.path);
    }
  });

  it('refuses what writeFileSafely refuses: a target that is a link, a folder leading out of the boundary', () => {
    symlinkSync(c.secret, path.join(c.ws, 'report.json'));
    expect(thrown(() => openTempBeside(path.join(c.ws, 'report.json'), inside, 'spool')).code).toBe(OUTPUT_REFUSED);
    symlinkSync(c.outside, path.join(c.ws, 'site'));
    expect(thrown(() => openTempBeside(path.join(c.ws, 'site', 'report.json'), inside, 'spool')).message).toContain('leads out of');
    expect(readdirSync(c.outside)).toEqual(['secret.txt']);
    expect(readdirSync(c.ws).sort()).toEqual(['report.json', 'site']);
  });
});

describe('writeFileSafely is atomic', () => {
  it('a write that fails half-way (a full disk) leaves the previous file intact and removes its temporary file', () => {
    const file = path.join(c.ws, 'report.txt');
    writeFileSync(file, 'previous complete report\n');
    let calls = 0;
    const failing = (fd: number, bytes: Uint8Array, offset: number, length: number): number => {
      calls += 1;
      if (calls > 1) throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
      return writeSync(fd, bytes, offset, Math.min(length, 1000));
    };
    const error = thrown(() => writeFileSafely(file, 'n'.repeat(5000), inside, { write: failing }));
    expect(error.code).toBe(OUTPUT_FAILED);
    expect(error.describe()).toBe(`\`--out\`: could not write ${file} (ENOSPC); the previous file, if any, is unchanged`);
    expect(calls).toBe(2);
    expect(readFileSync(file, 'utf8')).toBe('previous complete report\n');
    expect(temps(c.ws)).toEqual([]);
  });

  it('a write that makes no progress stops with an error instead of looping', () => {
    const file = path.join(c.ws, 'report.txt');
    writeFileSync(file, 'previous\n');
    expect(thrown(() => writeFileSafely(file, 'abc', inside, { write: () => 0 })).code).toBe(OUTPUT_FAILED);
    expect(readFileSync(file, 'utf8')).toBe('previous\n');
  });

  it('a process killed in the middle of a write leaves the previous complete file', async () => {
    const file = path.join(c.ws, 'report.txt');
    writeFileSync(file, 'previous complete report\n');
    const js = transpileSources();
    try {
      // The child writes 4 MiB in 64 KiB pieces and, after the first MiB, says so and waits to be killed.
      const script = `
        import { writeSync } from 'node:fs';
        import { writeFileSafely } from ${JSON.stringify(path.join(js.dir, 'entries', 'safe-write.js'))};
        const hold = new Int32Array(new SharedArrayBuffer(4));
        writeFileSafely(${JSON.stringify(file)}, 'z'.repeat(4 << 20), { option: '--out', within: [] }, {
          write(fd, bytes, offset, length) {
            if (offset >= 1 << 20) { process.stdout.write('mid-write\\n'); Atomics.wait(hold, 0, 0, 60000); }
            return writeSync(fd, bytes, offset, Math.min(length, 65536));
          },
        });`;
      const child = spawn(process.execPath, ['--input-type=module', '-e', script], { stdio: ['ignore', 'pipe', 'pipe'] });
      let err = '';
      child.stderr.on('data', (d: Buffer) => (err += d.toString()));
      await new Promise<void>((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error(`the child never reached the middle of its write: ${err}`)), 30_000);
        child.stdout.on('data', (d: Buffer) => {
          if (d.toString().includes('mid-write')) {
            clearTimeout(timer);
            resolve();
          }
        });
      });
      const left = temps(c.ws);
      expect(left).toHaveLength(1);
      expect(statSync(path.join(c.ws, left[0])).size).toBeGreaterThanOrEqual(1 << 20);
      child.kill('SIGKILL');
      await new Promise((resolve) => child.on('exit', resolve));
      expect(readFileSync(file, 'utf8')).toBe('previous complete report\n');
    } finally {
      js.remove();
    }
  });
});
