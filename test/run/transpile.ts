// Test helper: worker threads cannot load TypeScript, so the tests that start real workers run a
// plain-JavaScript copy of src/ (each file transpiled alone with TypeScript's transpileModule,
// JSON files copied, node_modules linked) in a temporary folder.
import { cpSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

/** The repository root. */
export const repoRoot = fileURLToPath(new URL('../..', import.meta.url));

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)],
  );
}

/**
 * Transpiles src/ into a new temporary folder.
 * @returns the folder (holding `cli.js`, `run/pool.js`, ...) and a function that removes it
 */
export function transpileSources(): { dir: string; remove: () => void } {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-js-'));
  const src = path.join(repoRoot, 'src');
  for (const file of walk(src)) {
    const rel = path.relative(src, file);
    const out = path.join(dir, rel);
    mkdirSync(path.dirname(out), { recursive: true });
    if (file.endsWith('.ts')) {
      const { outputText } = ts.transpileModule(readFileSync(file, 'utf8'), {
        compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2022, verbatimModuleSyntax: false },
        fileName: file,
      });
      writeFileSync(out.replace(/\.ts$/, '.js'), outputText);
    } else {
      cpSync(file, out);
    }
  }
  writeFileSync(path.join(dir, 'package.json'), '{ "type": "module" }\n');
  symlinkSync(path.join(repoRoot, 'node_modules'), path.join(dir, 'node_modules'), 'dir');
  return { dir, remove: () => rmSync(dir, { recursive: true, force: true }) };
}
