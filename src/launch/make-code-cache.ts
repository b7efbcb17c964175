/**
 * Build step (run by test/tools/bundle.mjs, not shipped): turns ncc's CLI module into the core
 * script and makes its code cache (see code-cache.ts).
 *
 *     node make-code-cache.js MODULE OUT_DIR TRAINING_ROOT [PREVIOUS_CACHE]
 *
 * - MODULE: ncc's ES module bundle of src/cli.ts; OUT_DIR/core.js is written from it (core-script.ts),
 *   named by the SHA-256 of its own text (with an empty name). The launcher (OUT_DIR/index.js) and the chunks
 *   (OUT_DIR/chunks/) must be in place: the training runs load chunks as any run does.
 * - The cache holds the functions that two checks of TRAINING_ROOT (the example repository, JSON
 *   and text output, one thread) compile; a run that needs others compiles them as usual.
 * - PREVIOUS_CACHE (the committed OUT_DIR/core.cache, saved before the build) is kept unchanged
 *   when it was made for the same core.js, whatever Node.js made it: V8's data differs from one
 *   making to the next (string hashes are seeded at random), so rebuilding an unchanged source
 *   must not rewrite it, or the committed dist/ would never match a fresh build.
 *
 * Prints one line on stderr: the cache kept or made, and for which V8.
 */
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import v8 from 'node:v8';
import vm from 'node:vm';
import { encodeCodeCache, readCodeCache, runCore, withCacheChecksums } from './code-cache.js';
import { coreId, toCoreScript } from './core-script.js';

/** Lower-case hex SHA-256 of a text's UTF-8 bytes: the core script's identity. */
function sha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** The runs whose compiled functions go into the cache. */
function trainingRuns(root: string): string[][] {
  const common = ['check', '--root', root, '--jobs', '1'];
  return [
    [...common, '--format', 'json'],
    [...common, '--format', 'text'],
  ];
}

async function make(moduleFile: string, outDir: string, trainingRoot: string, previousCache: string | undefined): Promise<string> {
  const coreFile = path.join(outDir, 'core.js');
  const cacheFile = path.join(outDir, 'core.cache');
  const source = Buffer.from(toCoreScript(readFileSync(moduleFile, 'utf8'), sha256), 'utf8');
  const id = coreId(source);
  if (id === null) throw new Error('the core script names no build');
  writeFileSync(coreFile, source);

  if (previousCache !== undefined && existsSync(previousCache)) {
    const previous = readFileSync(previousCache);
    const lookup = readCodeCache(previous, source, null);
    if (lookup.data !== null) {
      writeFileSync(cacheFile, previous);
      return `code cache kept (same core.js; made for V8 ${lookup.runtime.v8} on ${lookup.runtime.arch})`;
    }
  }

  const script = new vm.Script(source.toString('utf8'), { filename: coreFile });
  const write = process.stdout.write;
  const argv = process.argv;
  process.stdout.write = () => true;
  try {
    for (const run of trainingRuns(trainingRoot)) {
      process.argv = [argv[0], path.join(outDir, 'index.js'), ...run];
      await runCore(script, path.join(outDir, 'index.js'), path.join(outDir, 'chunks'));
      if (process.exitCode !== 0 && process.exitCode !== 1) throw new Error(`the training run ${run.join(' ')} ended with status ${process.exitCode}`);
    }
  } finally {
    process.stdout.write = write;
    process.argv = argv;
    process.exitCode = 0;
  }
  // The command turns V8's optimising compiler off and on (optimising-compiler.ts); V8 binds its
  // data to the flags in force, so they go back to Node's defaults, those of a run's start.
  v8.setFlagsFromString('--turbofan');
  writeFileSync(cacheFile, encodeCodeCache(id, withCacheChecksums(() => script.createCachedData())));
  return `code cache made for V8 ${process.versions.v8} on ${process.arch}`;
}

const [moduleFile, outDir, trainingRoot, previousCache] = process.argv.slice(2);
if (!moduleFile || !outDir || !trainingRoot) {
  process.stderr.write('usage: make-code-cache MODULE OUT_DIR TRAINING_ROOT [PREVIOUS_CACHE]\n');
  process.exitCode = 2;
} else {
  make(path.resolve(moduleFile), path.resolve(outDir), path.resolve(trainingRoot), previousCache).then(
    (done) => process.stderr.write(`${done}\n`),
    (error: unknown) => {
      process.stderr.write(`make-code-cache: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
      process.exitCode = 1;
    },
  );
}
