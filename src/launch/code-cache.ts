/**
 * The CLI's V8 code cache: the bytecode of the functions a typical run compiles, made at build time
 * (make-code-cache.ts) and shipped beside the core script (dist/cli/core.js and core.cache). A run
 * that starts from it skips parsing and compiling those functions, about 40 ms of a 0.2 s check of
 * a small model on the development machine. V8 takes a cache only from its own version, run with
 * the same flags; any other Node.js compiles the script as usual and computes the same results.
 *
 * The file is one header line, then V8's data:
 *
 *     fitgate-code-cache 1 <V8 version> <arch> <core.js's identity> <bytes of data>\n
 *
 * V8 itself checks its version, its flags and only the length of the source, so the header binds
 * the data to one build of core.js (core-script.ts writes the identity on its first line), and V8
 * checks the data's checksum (`--verify-snapshot-checksum`, set while the script compiles and while
 * the cache is made): a cache left over from another build, cut short or damaged on the way, is
 * never run. Nothing here loads node:crypto (about 9 ms at start on the development machine).
 */
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { debuglog } from 'node:util';
import v8 from 'node:v8';
import vm from 'node:vm';
import { coreId, type CoreFunction } from './core-script.js';

/** First word of the header line. */
const MAGIC = 'fitgate-code-cache';

/** Version of the file layout above. */
const LAYOUT = '1';

/** Longest header line read (the six fields take about 120 bytes). */
const MAX_HEADER = 512;

/**
 * The V8 flag under which caches are made and read: V8 then writes a checksum of its data and
 * verifies it (by default only debug builds do).
 */
export const CHECKSUM_FLAG = '--verify-snapshot-checksum';

/** The runtime a cache is made for: V8's version (`process.versions.v8`) and the CPU architecture. */
export interface CacheRuntime {
  v8: string;
  arch: string;
}

/** The runtime of this process. */
export function currentRuntime(): CacheRuntime {
  return { v8: process.versions.v8, arch: process.arch };
}

/**
 * A cache file's bytes: the header line for the core script `id` and `runtime`, then `data`.
 * @param id the core script's identity ({@link coreId})
 * @param data V8's cached data (`vm.Script#createCachedData()`, made under {@link CHECKSUM_FLAG})
 * @param runtime default this process's
 */
export function encodeCodeCache(id: string, data: Uint8Array, runtime: CacheRuntime = currentRuntime()): Buffer {
  const header = `${MAGIC} ${LAYOUT} ${runtime.v8} ${runtime.arch} ${id} ${data.byteLength}\n`;
  return Buffer.concat([Buffer.from(header, 'latin1'), data]);
}

/** What a cache file holds for a given script: V8's data, or why there is none to use. */
export type CacheLookup = { data: Buffer; runtime: CacheRuntime } | { data: null; reason: string };

/**
 * Reads a cache file's header and checks it against the script and the runtime.
 * @param file the cache file's bytes
 * @param source the core script's bytes (its first line names its build)
 * @param runtime default this process's; `null` skips the runtime check (the build keeps a cache
 *   made by another Node.js as long as the script is the same)
 * @returns V8's data and the runtime it was made for, or the reason it does not fit
 */
export function readCodeCache(file: Uint8Array, source: Uint8Array, runtime: CacheRuntime | null = currentRuntime()): CacheLookup {
  const bytes = Buffer.from(file.buffer, file.byteOffset, file.byteLength);
  const end = bytes.subarray(0, MAX_HEADER).indexOf(0x0a);
  const fields = end < 0 ? [] : bytes.toString('latin1', 0, end).split(' ');
  if (fields.length !== 6 || fields[0] !== MAGIC) return { data: null, reason: 'not a fitgate code cache file' };
  const [, layout, v8Version, arch, id, length] = fields;
  if (layout !== LAYOUT) return { data: null, reason: `layout ${layout}, expected ${LAYOUT}` };
  if (runtime !== null && (v8Version !== runtime.v8 || arch !== runtime.arch)) {
    return { data: null, reason: `made for V8 ${v8Version} on ${arch}, this is V8 ${runtime.v8} on ${runtime.arch}` };
  }
  if (id !== coreId(source)) return { data: null, reason: 'made for another core.js' };
  const data = bytes.subarray(end + 1);
  if (String(data.byteLength) !== length) return { data: null, reason: `${data.byteLength} bytes of data, expected ${length}` };
  return { data, runtime: { v8: v8Version, arch } };
}

/** Runs `compile` with V8's code cache checksums on (see {@link CHECKSUM_FLAG}), then turns them off. */
export function withCacheChecksums<T>(compile: () => T): T {
  v8.setFlagsFromString(CHECKSUM_FLAG);
  try {
    return compile();
  } finally {
    v8.setFlagsFromString(CHECKSUM_FLAG.replace('--', '--no-'));
  }
}

/** The core script compiled, and what became of its cache. */
export interface CompiledCore {
  script: vm.Script;
  /** 'accepted', 'rejected by V8', or why no cache was offered. */
  cache: string;
}

/**
 * Compiles the core script, from its code cache when one fits (see {@link readCodeCache}). With
 * `NODE_DEBUG=fitgate` in the environment it prints `code cache: <outcome>` on stderr.
 * @param coreFile the script written by toCoreScript (dist/cli/core.js)
 * @param cacheFile its cache (dist/cli/core.cache); a missing file means no cache
 */
export function compileCore(coreFile: string, cacheFile: string): CompiledCore {
  const source = readFileSync(coreFile);
  let lookup: CacheLookup;
  try {
    lookup = readCodeCache(readFileSync(cacheFile), source);
  } catch {
    lookup = { data: null, reason: 'no code cache file' };
  }
  const text = source.toString('utf8');
  let cache: string;
  let script: vm.Script;
  if (lookup.data === null) {
    script = new vm.Script(text, { filename: coreFile });
    cache = lookup.reason;
  } else {
    const data = lookup.data;
    script = withCacheChecksums(() => new vm.Script(text, { filename: coreFile, cachedData: data }));
    cache = script.cachedDataRejected === true ? 'rejected by V8' : 'accepted';
  }
  debuglog('fitgate')(`code cache: ${cache}`);
  return { script, cache };
}

/**
 * Runs the compiled core as its entry module would run: `entry` is the file worker threads start
 * (the launcher), `chunks` the folder of the ES modules the core loads on demand.
 * @param script from {@link compileCore}
 * @param entry absolute path of the launcher
 * @param chunks absolute path of the chunks' folder
 * @returns the core's completion (the command sets `process.exitCode` itself)
 */
export function runCore(script: vm.Script, entry: string, chunks: string): Promise<void> {
  const core = script.runInThisContext() as CoreFunction;
  const base = pathToFileURL(`${chunks}${path.sep}`);
  // Node's own import(), not the bundler's (webpackIgnore keeps ncc from rewriting it).
  return core(createRequire, pathToFileURL(entry).href, (specifier) => import(/* webpackIgnore: true */ new URL(specifier, base).href));
}
