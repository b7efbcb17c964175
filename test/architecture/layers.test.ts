// The source tree's shape: one folder per pipeline stage, imports only downward, no cycles.
// The order below is the one DEVELOPERS.md describes; a new folder must be placed in it.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));

/** Stages from the bottom up; a file may import from its own stage or one listed before it. */
const STAGES: readonly (readonly string[])[] = [
  ['core'],
  ['kernels', 'repo'],
  ['config'],
  ['data'],
  ['design'],
  ['fit'],
  ['diagnostics'],
  ['result'],
  ['checks'],
  ['run'],
  ['report'],
  ['entries', 'action', '.'],
];

function rank(file: string): number {
  const rel = path.relative(SRC, file);
  const top = rel.includes(path.sep) ? rel.split(path.sep)[0] : '.';
  const at = STAGES.findIndex((s) => s.includes(top));
  if (at < 0) throw new Error(`src/${rel}: folder ${top} is in no stage of test/architecture/layers.test.ts`);
  return at;
}

function sources(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) sources(p, out);
    else if (name.endsWith('.ts')) out.push(p);
  }
  return out;
}

const IMPORT =
  /(?:import|export)\s[^'"]*?from\s+['"](\.[^'"]+)['"]|import\(\s*(?:\/\*[^*]*\*\/\s*)?['"](\.[^'"]+)['"]|^import\s+['"](\.[^'"]+)['"]/gms;

/** Relative imports of each source file, resolved to source files. */
function graph(): Map<string, string[]> {
  const files = sources(SRC);
  const known = new Set(files);
  const edges = new Map<string, string[]>();
  for (const file of files) {
    const text = readFileSync(file, 'utf8');
    const targets: string[] = [];
    for (const m of text.matchAll(IMPORT)) {
      const spec = m[1] ?? m[2] ?? m[3];
      const base = path.resolve(path.dirname(file), spec);
      const ts = [base.replace(/\.js$/, '.ts'), `${base}.ts`, path.join(base, 'index.ts')].find((c) => known.has(c));
      if (ts !== undefined) targets.push(ts);
    }
    edges.set(file, targets);
  }
  return edges;
}

/** Strongly connected components with more than one file (Tarjan 1972), as relative paths. */
function cycles(edges: Map<string, string[]>): string[][] {
  let counter = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string): void => {
    index.set(v, counter);
    low.set(v, counter);
    counter += 1;
    stack.push(v);
    onStack.add(v);
    for (const w of edges.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(path.relative(SRC, w));
      } while (w !== v);
      if (component.length > 1 || (edges.get(v) ?? []).includes(v)) found.push(component.sort());
    }
  };
  for (const v of edges.keys()) if (!index.has(v)) visit(v);
  return found;
}

describe('source layout', () => {
  const edges = graph();

  it('every import points to the same stage or one below it', () => {
    const upward: string[] = [];
    for (const [file, targets] of edges) {
      for (const t of targets)
        if (rank(t) > rank(file)) upward.push(`src/${path.relative(SRC, file)} imports src/${path.relative(SRC, t)}`);
    }
    expect(upward).toEqual([]);
  });

  it('has no import cycle', () => {
    expect(cycles(edges)).toEqual([]);
  });

  it('the checker finds an upward import and a cycle when there is one', () => {
    const fake = new Map<string, string[]>([
      [path.join(SRC, 'a.ts'), [path.join(SRC, 'b.ts')]],
      [path.join(SRC, 'b.ts'), [path.join(SRC, 'a.ts')]],
    ]);
    expect(cycles(fake)).toEqual([['a.ts', 'b.ts']]);
    expect(rank(path.join(SRC, 'fit', 'x.ts'))).toBeGreaterThan(rank(path.join(SRC, 'design', 'x.ts')));
  });
});
