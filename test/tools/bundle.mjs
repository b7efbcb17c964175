// Builds dist/: one ncc bundle per entry, the JSON Schemas for editors, and dist/package.json
// marking ESM. Run: npm run bundle (or `node test/tools/bundle.mjs --out DIR`). CI rebuilds and fails when the committed dist/ differs.
//
// - dist/index.js (+ chunks): the action, src/main.ts.
// - dist/cli/index.js (+ chunks): the `fitgate` command, src/cli.ts (the package's `bin`).
// - dist/schema/*.json: the settings and descriptor schemas, for editors.
import { execFileSync } from 'node:child_process';
import { chmodSync, copyFileSync, existsSync, mkdirSync, readdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = fileURLToPath(new URL('../..', import.meta.url));
// `--out DIR` builds the same bundles into DIR instead of dist/ (tests that need a fresh bundle,
// e.g. the package test, build into a temporary folder) and leaves the generated sources as they
// are (their own tests keep them current), so that the source tree is not written.
const outAt = process.argv.indexOf('--out');
const outDir = outAt >= 0 ? process.argv[outAt + 1] : undefined;
if (outAt >= 0 && !outDir) throw new Error('--out needs a folder');
const dist = outDir ? path.resolve(outDir) : path.join(root, 'dist');
const ncc = path.join(root, 'node_modules', '@vercel', 'ncc', 'dist', 'ncc', 'cli.js');

/** ncc's bundle of `src` in `out`, as out/index.js (ncc names ESM output index.mjs or index.js). */
function build(src, out) {
  execFileSync(process.execPath, [ncc, 'build', src, '-o', out, '--target', 'es2022', '--quiet', '--no-source-map-register'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (existsSync(path.join(out, 'index.mjs'))) renameSync(path.join(out, 'index.mjs'), path.join(out, 'index.js'));
  return path.join(out, 'index.js');
}

// Generated sources first: the precompiled schema validators and the row kernels' WebAssembly.
if (!outDir) {
  execFileSync(process.execPath, [path.join(root, 'test', 'tools', 'gen-validators.mjs')], { cwd: root, stdio: 'inherit' });
  execFileSync(process.execPath, [path.join(root, 'test', 'tools', 'gen-wasm.mjs')], { cwd: root, stdio: 'inherit' });
}
rmSync(dist, { recursive: true, force: true });

// `--cli-only` (with `--out`): only the command's bundle, for the package test (the bin).
if (!(outDir && process.argv.includes('--cli-only'))) build('src/main.ts', dist);
chmodSync(build('src/cli.ts', path.join(dist, 'cli')), 0o755);
writeFileSync(path.join(dist, 'package.json'), `${JSON.stringify({ type: 'module' }, null, 2)}\n`);

const schemaSrc = path.join(root, 'src', 'config', 'schema');
mkdirSync(path.join(dist, 'schema'), { recursive: true });
for (const f of readdirSync(schemaSrc)) if (f.endsWith('.json')) copyFileSync(path.join(schemaSrc, f), path.join(dist, 'schema', f));
