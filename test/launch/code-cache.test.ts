// The CLI's V8 code cache (src/launch/code-cache.ts): the header binds V8's data to one build of
// the core and one runtime, V8 verifies the data's checksum, and every other case compiles as usual.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import vm from 'node:vm';
import { afterAll, describe, expect, it } from 'vitest';
import { compileCore, currentRuntime, encodeCodeCache, readCodeCache, withCacheChecksums } from '../../src/launch/code-cache.js';

const work = mkdtempSync(path.join(tmpdir(), 'fitgate-code-cache-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** A core script with identity `id` whose function returns a sum computed by a nested function. */
function coreSource(id: string, n = 10): Buffer {
  return Buffer.from(`(async function () {"use strict"; // fitgate core ${id}\nfunction sum(k) { let s = 0; for (let i = 1; i <= k; i++) s += i; return s; }\nglobalThis.__coreSum = sum(${n});\n})`);
}

/** V8's cached data for `source` after one run, made as the build makes it. */
function cachedData(source: Buffer): Buffer {
  const script = new vm.Script(source.toString('utf8'), { filename: 'core.js' });
  void (script.runInThisContext() as () => Promise<void>)();
  return withCacheChecksums(() => script.createCachedData());
}

const runtime = currentRuntime();

describe('readCodeCache', () => {
  const source = coreSource('a1');
  const data = Buffer.from('not really V8 data, but bytes all the same');

  it('finds the data written for the same core and runtime', () => {
    const file = encodeCodeCache('a1', data);
    expect(file.toString('latin1', 0, file.indexOf(10))).toBe(`fitgate-code-cache 1 ${runtime.v8} ${runtime.arch} a1 ${data.length}`);
    const lookup = readCodeCache(file, source);
    expect(lookup.data?.equals(data)).toBe(true);
    expect(lookup).toMatchObject({ runtime });
  });

  it('says why it has nothing for another runtime, another core, a cut file or another file', () => {
    const other = { v8: '1.2.3', arch: 'arm64' };
    expect(readCodeCache(encodeCodeCache('a1', data, other), source)).toEqual({ data: null, reason: `made for V8 1.2.3 on arm64, this is V8 ${runtime.v8} on ${runtime.arch}` });
    expect(readCodeCache(encodeCodeCache('b2', data), source)).toEqual({ data: null, reason: 'made for another core.js' });
    expect(readCodeCache(encodeCodeCache('a1', data), coreSource('a1').subarray(0, 8))).toEqual({ data: null, reason: 'made for another core.js' });
    const file = encodeCodeCache('a1', data);
    expect(readCodeCache(file.subarray(0, file.length - 1), source)).toEqual({ data: null, reason: `${data.length - 1} bytes of data, expected ${data.length}` });
    expect(readCodeCache(Buffer.from('{"hello": 1}\n'), source)).toEqual({ data: null, reason: 'not a fitgate code cache file' });
    expect(readCodeCache(Buffer.alloc(4096, 0x61), source)).toEqual({ data: null, reason: 'not a fitgate code cache file' });
    expect(readCodeCache(Buffer.from(`fitgate-code-cache 2 ${runtime.v8} ${runtime.arch} a1 0\n`), source)).toEqual({ data: null, reason: 'layout 2, expected 1' });
  });

  it('skips the runtime check when asked (the build keeps a cache another Node.js made)', () => {
    const lookup = readCodeCache(encodeCodeCache('a1', data, { v8: '1.2.3', arch: 'arm64' }), source, null);
    expect(lookup).toMatchObject({ runtime: { v8: '1.2.3', arch: 'arm64' } });
    expect(lookup.data?.equals(data)).toBe(true);
  });
});

describe('compileCore', () => {
  const source = coreSource('c3', 100);
  const cacheFile = path.join(work, 'core.cache');
  const data = cachedData(source);
  let runs = 0;

  // Each run compiles from a file of its own: V8 keeps what it compiled for the same source and
  // file name, and would not look at the cache at all.
  async function run(): Promise<{ cache: string; sum: unknown }> {
    (globalThis as Record<string, unknown>).__coreSum = undefined;
    const coreFile = path.join(work, `core-${++runs}.js`);
    writeFileSync(coreFile, source);
    const { script, cache } = compileCore(coreFile, cacheFile);
    await (script.runInThisContext() as () => Promise<void>)();
    return { cache, sum: (globalThis as Record<string, unknown>).__coreSum };
  }

  it('starts from a cache V8 takes, and the script runs the same', async () => {
    writeFileSync(cacheFile, encodeCodeCache('c3', data));
    expect(await run()).toEqual({ cache: 'accepted', sum: 5050 });
  });

  it('compiles as usual when V8 finds the data damaged (its checksum, not the header, tells)', async () => {
    for (const at of [40, Math.floor(data.length / 2), data.length - 5]) {
      const damaged = Buffer.from(data);
      damaged[at] ^= 0x5a;
      writeFileSync(cacheFile, encodeCodeCache('c3', damaged));
      expect(await run()).toEqual({ cache: 'rejected by V8', sum: 5050 });
    }
  });

  it('compiles as usual without a cache file or with one for another core', async () => {
    rmSync(cacheFile, { force: true });
    expect(await run()).toEqual({ cache: 'no code cache file', sum: 5050 });
    writeFileSync(cacheFile, encodeCodeCache('other', data));
    expect(await run()).toEqual({ cache: 'made for another core.js', sum: 5050 });
  });

  it('leaves V8 checking checksums only while it compiles', () => {
    // A cache made without the flag is refused under it (V8 binds its data to the flags): so the
    // flag must be off again once compileCore returns, as it is for everything else Node.js runs.
    writeFileSync(cacheFile, encodeCodeCache('c3', data));
    writeFileSync(path.join(work, 'flags.js'), source);
    expect(compileCore(path.join(work, 'flags.js'), cacheFile).cache).toBe('accepted');
    const plain = new vm.Script(source.toString('utf8'), { filename: 'plain.js' });
    const again = new vm.Script(source.toString('utf8'), { filename: 'plain.js', cachedData: plain.createCachedData() });
    expect(again.cachedDataRejected).toBe(false);
  });
});
