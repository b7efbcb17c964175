// Builds dist/: one ncc bundle per entry, the JSON Schemas for editors, and dist/package.json
// marking ESM. Run: npm run bundle. CI rebuilds and fails when the committed dist/ differs.
//
// - dist/index.js (+ chunks): the action, src/main.ts.
// - dist/cli/: the `fitgate` command. index.js is the launcher (src/launch/launcher.ts, CommonJS);
//   core.js is src/cli.ts's bundle made a classic script, core.cache its V8 code cache,
//   chunks/N.index.js the parts it loads on demand (src/launch/ says how and why). The cache is
//   made with this machine's Node.js from checks of examples/, and kept as it is while core.js
//   does not change.
import { execFileSync, spawnSync } from 'node:child_process';
import { chmodSync, copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = fileURLToPath(new URL('../..', import.meta.url));
const dist = path.join(root, 'dist');
const cli = path.join(dist, 'cli');
const ncc = path.join(root, 'node_modules', '@vercel', 'ncc', 'dist', 'ncc', 'cli.js');
const work = mkdtempSync(path.join(tmpdir(), 'fitgate-bundle-'));

/** ncc's bundle of `src` in `out`, as out/index.js (ncc names ESM output index.mjs or index.js). */
function build(src, out) {
  execFileSync(process.execPath, [ncc, 'build', src, '-o', out, '--target', 'es2022', '--quiet', '--no-source-map-register'], { cwd: root, stdio: 'inherit' });
  if (existsSync(path.join(out, 'index.mjs'))) renameSync(path.join(out, 'index.mjs'), path.join(out, 'index.js'));
  return path.join(out, 'index.js');
}

try {
  // Precompiled schema validators first (src/config/generated/validators.ts).
  execFileSync(process.execPath, [path.join(root, 'test', 'tools', 'gen-validators.mjs')], { cwd: root, stdio: 'inherit' });
  // The row kernels' WebAssembly module (src/fit/generated/kernels-wasm.ts).
  execFileSync(process.execPath, [path.join(root, 'test', 'tools', 'gen-wasm.mjs')], { cwd: root, stdio: 'inherit' });
  const previousCache = path.join(work, 'previous.cache');
  if (existsSync(path.join(cli, 'core.cache'))) copyFileSync(path.join(cli, 'core.cache'), previousCache);
  rmSync(dist, { recursive: true, force: true });

  build('src/main.ts', dist);
  // The CLI: ncc's module becomes core.js (made by the maker below), its chunks move to chunks/
  // (ES modules), and the launcher, CommonJS, takes its place as index.js.
  const cliModule = path.join(work, 'cli-module.js');
  renameSync(build('src/cli.ts', cli), cliModule);
  mkdirSync(path.join(cli, 'chunks'));
  for (const f of readdirSync(cli)) if (/^\d+\.index\.js$/.test(f)) renameSync(path.join(cli, f), path.join(cli, 'chunks', f));
  writeFileSync(path.join(cli, 'chunks', 'package.json'), `${JSON.stringify({ type: 'module' }, null, 2)}\n`);
  writeFileSync(path.join(cli, 'package.json'), `${JSON.stringify({ type: 'commonjs' }, null, 2)}\n`);
  copyFileSync(build('src/launch/launcher.ts', path.join(work, 'launcher')), path.join(cli, 'index.js'));
  chmodSync(path.join(cli, 'index.js'), 0o755);
  writeFileSync(path.join(dist, 'package.json'), `${JSON.stringify({ type: 'module' }, null, 2)}\n`);
  // V8 binds its cache to the flags in force: the cache is made, and checked, without any that
  // NODE_OPTIONS might add (a plain `node` run has none).
  const plainEnv = { ...process.env };
  delete plainEnv.NODE_OPTIONS;
  const maker = build('src/launch/make-code-cache.ts', path.join(work, 'maker'));
  execFileSync(process.execPath, [maker, cliModule, cli, path.join(root, 'examples'), previousCache], { cwd: root, env: plainEnv, stdio: ['ignore', 'ignore', 'inherit'] });

  // A cache made for this Node.js must be one V8 takes; one kept from another is only reported.
  const probe = spawnSync(process.execPath, [path.join(cli, 'index.js'), '--version'], { cwd: root, env: { ...plainEnv, NODE_DEBUG: 'fitgate' }, encoding: 'utf8' });
  const outcome = /code cache: (.*)/.exec(probe.stderr)?.[1] ?? `no outcome reported (status ${probe.status}): ${probe.stderr}`;
  if (outcome.startsWith('made for V8 ')) process.stderr.write(`note: the code cache is not this Node.js's: ${outcome}\n`);
  else if (outcome !== 'accepted' || probe.status !== 0) throw new Error(`the CLI's code cache is not used: ${outcome}`);

  const schemaSrc = path.join(root, 'src', 'config', 'schema');
  if (existsSync(schemaSrc)) {
    mkdirSync(path.join(dist, 'schema'), { recursive: true });
    for (const f of readdirSync(schemaSrc)) if (f.endsWith('.json')) copyFileSync(path.join(schemaSrc, f), path.join(dist, 'schema', f));
  }
} finally {
  rmSync(work, { recursive: true, force: true });
}
