// Loads the check registry (src/checks/index.ts) in plain Node: src/ is transpiled file by file
// with TypeScript's transpileModule into a temporary folder, whose checks/index.js is imported.
import { cpSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import ts from 'typescript';

function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)],
  );
}

/**
 * The registry's checks and limit keys.
 * @param root the repository root
 * @returns `{ checks, limitKeys }` as src/checks/index.ts exports them (CHECKS, registryLimitKeys())
 */
export async function loadRegistry(root) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-registry-'));
  try {
    const src = path.join(root, 'src');
    for (const file of walk(src)) {
      const out = path.join(dir, path.relative(src, file));
      mkdirSync(path.dirname(out), { recursive: true });
      if (file.endsWith('.ts')) {
        const { outputText } = ts.transpileModule(readFileSync(file, 'utf8'), {
          compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2022 },
          fileName: file,
        });
        writeFileSync(out.replace(/\.ts$/, '.js'), outputText);
      } else cpSync(file, out);
    }
    writeFileSync(path.join(dir, 'package.json'), '{ "type": "module" }\n');
    symlinkSync(path.join(root, 'node_modules'), path.join(dir, 'node_modules'), 'dir');
    const registry = await import(pathToFileURL(path.join(dir, 'checks', 'index.js')).href);
    return { checks: registry.CHECKS, limitKeys: registry.registryLimitKeys() };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
