// Builds dist/: one ncc bundle per entry (the action's dist/index.js and the CLI's
// dist/cli/index.js), the JSON Schemas for editors, and dist/package.json marking ESM.
// Run: npm run bundle. CI rebuilds and fails when the committed dist/ differs.
import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, readdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = fileURLToPath(new URL('../..', import.meta.url));
const dist = path.join(root, 'dist');
const ncc = path.join(root, 'node_modules', '@vercel', 'ncc', 'dist', 'ncc', 'cli.js');

// Precompiled schema validators first (src/config/generated/validators.ts).
execFileSync(process.execPath, [path.join(root, 'test', 'tools', 'gen-validators.mjs')], { cwd: root, stdio: 'inherit' });
rmSync(dist, { recursive: true, force: true });
const entries = [
  { src: 'src/main.ts', out: dist },
  { src: 'src/cli.ts', out: path.join(dist, 'cli') },
];
for (const { src, out } of entries) {
  if (!existsSync(path.join(root, src))) continue;
  execFileSync(process.execPath, [ncc, 'build', src, '-o', out, '--target', 'es2022', '--quiet', '--no-source-map-register'], {
    cwd: root,
    stdio: 'inherit',
  });
  // ncc names ESM output index.mjs or index.js depending on the input; keep index.js.
  if (existsSync(path.join(out, 'index.mjs'))) renameSync(path.join(out, 'index.mjs'), path.join(out, 'index.js'));
}
writeFileSync(path.join(dist, 'package.json'), `${JSON.stringify({ type: 'module' }, null, 2)}\n`);
const schemaSrc = path.join(root, 'src', 'config', 'schema');
if (existsSync(schemaSrc)) {
  mkdirSync(path.join(dist, 'schema'), { recursive: true });
  for (const f of readdirSync(schemaSrc)) if (f.endsWith('.json')) copyFileSync(path.join(schemaSrc, f), path.join(dist, 'schema', f));
}
