// No array is spread into a call anywhere in src/: `push(...xs)`, `Math.max(...xs)`,
// `String.fromCharCode(...xs)` pass every element as an argument and throw a RangeError
// ("Maximum call stack size exceeded") once an array outgrows the engine's argument limit, which
// a pull request's data reaches easily (an `rbf` term with a centre at each of 300,000 rows did).
// Found with the TypeScript parser, so a spread in an array or object literal (harmless) is not
// confused with one in a call.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));

function sources(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) sources(p, out);
    else if (name.endsWith('.ts')) out.push(p);
  }
  return out;
}

/** `file:line: call` for every spread argument of a call or `new` in one source text. */
function spreadArguments(file: string, text: string): string[] {
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
  const found: string[] = [];
  const visit = (node: ts.Node): void => {
    if (ts.isSpreadElement(node) && (ts.isCallExpression(node.parent) || ts.isNewExpression(node.parent))) {
      const { line } = source.getLineAndCharacterOfPosition(node.getStart(source));
      found.push(`${file}:${line + 1}: ${node.parent.getText(source).slice(0, 80)}`);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

describe('spread arguments', () => {
  it('are found in calls and new, not in array or object literals', () => {
    const text =
      'a.push(...xs);\nMath.max(1, ...ys);\nnew Set(...zs);\nconst b = [...xs, 1];\nconst c = { ...o };\nfunction f(...rest: number[]) { return rest; }\n';
    expect(spreadArguments('t.ts', text)).toEqual(['t.ts:1: a.push(...xs)', 't.ts:2: Math.max(1, ...ys)', 't.ts:3: new Set(...zs)']);
  });

  it('appear nowhere in src/', () => {
    const found = sources(SRC).flatMap((file) => spreadArguments(path.relative(SRC, file), readFileSync(file, 'utf8')));
    expect(found, 'spread into a call: use a loop, or maxOf / minOf of core/extremes.ts').toEqual([]);
  });
});
