import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FAST_YAML_LIMITS, parseFastYaml, resolvePlain } from '../../src/config/yaml-fast.js';
import { parseYaml, parseYamlWithLibrary, type YamlDocument } from '../../src/config/yaml-source.js';
// @ts-expect-error the workload writer is a plain ES module without types
import { MONOREPO_WORKLOADS, monorepoDescriptor } from '../bench/monorepo.mjs';

const F = 'models/a.model.yml';
const ROOT = path.resolve(import.meta.dirname, '../..');

/** A value as text that keeps what deep equality must see: types, key order, -0, NaN, infinities. */
function canon(value: unknown): string {
  if (value === null) return 'null';
  if (typeof value === 'number') return Object.is(value, -0) ? 'n:-0' : `n:${String(value)}`;
  if (typeof value === 'string') return `s:${JSON.stringify(value)}`;
  if (typeof value === 'boolean') return `b:${value}`;
  if (Array.isArray(value)) return `[${value.map(canon).join(',')}]`;
  if (typeof value === 'object') {
    const proto = Object.getPrototypeOf(value) === Object.prototype ? '' : 'proto!';
    return `{${proto}${Object.keys(value as object)
      .map((k) => `${JSON.stringify(k)}:${canon((value as Record<string, unknown>)[k])}`)
      .join(',')}}`;
  }
  return `?${typeof value}`;
}

/** Every path of a plain value, plus absent ones beside them. */
function pathsOf(value: unknown): (string | number)[][] {
  const out: (string | number)[][] = [[], ['nope'], [0], ['0']];
  const walk = (v: unknown, p: (string | number)[], depth: number): void => {
    if (depth > 40) return;
    if (Array.isArray(v)) {
      out.push([...p, v.length], [...p, -1], [...p, '0'], [...p, 'x']);
      v.forEach((item, i) => {
        out.push([...p, i]);
        walk(item, [...p, i], depth + 1);
      });
    } else if (v !== null && typeof v === 'object') {
      out.push([...p, 'zz-absent'], [...p, 0], [...p, 1]);
      for (const k of Object.keys(v)) {
        out.push([...p, k]);
        if (/^\d+$/.test(k)) out.push([...p, Number(k)]);
        walk((v as Record<string, unknown>)[k], [...p, k], depth + 1);
      }
    } else {
      out.push([...p, 'below'], [...p, 0]);
    }
  };
  walk(value, [], 0);
  return out;
}

/** Expects the fast path's answer to equal the library's in value and every position. */
function expectSame(fast: YamlDocument, library: YamlDocument): void {
  expect(canon(fast.value)).toBe(canon(library.value));
  for (const p of pathsOf(library.value)) {
    expect({ p, at: fast.positionOf(p) }).toEqual({ p, at: library.positionOf(p) });
    expect({ p, at: fast.valuePositionOf(p) }).toEqual({ p, at: library.valuePositionOf(p) });
  }
}

/** The library's answer, or the error it throws. */
function library(text: string): { doc: YamlDocument } | { error: unknown } {
  try {
    return { doc: parseYamlWithLibrary(text, F) };
  } catch (error) {
    return { error };
  }
}

// --- A generator of descriptor-like YAML texts --------------------------------------------------

const SCALARS = [
  'yes',
  'no',
  'off',
  'on',
  'y',
  'n',
  '0x1F',
  '0x1f',
  '0o17',
  '0o18',
  '017',
  '1e3',
  '1E-3',
  '.5',
  '-.5',
  '+.5',
  '-.inf',
  '.inf',
  '+.Inf',
  '.NaN',
  '.nan',
  '.NAN',
  '~',
  'null',
  'Null',
  'NULL',
  'nULL',
  'true',
  'True',
  'TRUE',
  'tRUE',
  'false',
  'False',
  'FALSE',
  '1_000',
  '+1',
  '-0',
  '0',
  '0.',
  '1.',
  '1.0',
  '-1.50',
  '12345678901234567890',
  '2020-01-01',
  '12:30',
  'a: b',
  'a:b',
  'a #b',
  'a#b',
  '# c',
  'b, c',
  'x]',
  '[x',
  '{x',
  'x}',
  '- x',
  '-x',
  '-',
  '--',
  ':x',
  '?x',
  '? x',
  '@x',
  '`x',
  '%x',
  '&a x',
  '*a',
  '!!str x',
  '|',
  '>',
  "'single'",
  "'it''s'",
  "'a #b'",
  "''",
  '"double"',
  '""',
  '"a #b"',
  '"esc\\n"',
  '"a\\"b"',
  "'unclosed",
  '"unclosed',
  'plain text',
  'ünïcödé',
  '../data/m0001/train.csv',
  'models/**/*.model.yml',
  'x1',
  'blocks',
  'a  b',
  "a'b",
  'a"b',
  'a\\b',
  '<<',
  '=',
  'a,b',
  'x: ',
  'trailing:',
  '',
  '\t',
  'a\tb',
];
const KEYS = [
  'version',
  'name',
  'data',
  'train',
  'holdout',
  'target',
  'terms',
  'fit',
  'of',
  'degree',
  'ridge',
  'a',
  'b_c',
  'x1:x2',
  'x.y',
  'key-1',
  '1',
  '01',
  '1.0',
  'true',
  'True',
  'null',
  '~',
  '-0',
  '0x1F',
  '.nan',
  '.inf',
  'toString',
  '__proto__',
  'a b',
  '"q"',
  "'q'",
  '-k',
  '+k',
  'k:',
  'ü',
  '?',
  '&a k',
  '!t k',
  '*a',
  '<<',
  'c$',
  'f(x)',
  'x^2',
  'a/b',
];

type Tree =
  | { t: 'scalar'; s: string }
  | { t: 'map'; entries: [string, Tree][] }
  | { t: 'seq'; items: Tree[] }
  | { t: 'fmap'; entries: [string, string][] }
  | { t: 'fseq'; items: string[] };

/** Scalars the fast path accepts (with a resolution to get right); the rest of the pool mostly makes it decline. */
const COMMON = SCALARS.slice(0, SCALARS.indexOf('a: b')).concat(["'single'", "'it''s'", '"double"', 'plain text', 'x1', 'a#b', 'b, c', '']);
const plainArb = fc.oneof({ weight: 8, arbitrary: fc.constantFrom(...COMMON) }, { weight: 1, arbitrary: fc.constantFrom(...SCALARS) });
const scalarArb = fc.oneof(
  { weight: 8, arbitrary: plainArb },
  { weight: 1, arbitrary: fc.array(plainArb, { maxLength: 3 }).map((items) => `[${items.join(', ')}]`) },
  {
    weight: 1,
    arbitrary: fc
      .array(fc.tuple(fc.constantFrom(...KEYS.slice(0, 16)), plainArb), { maxLength: 2 })
      .map((e) => `{ ${e.map(([k, v]) => `${k}: ${v}`).join(', ')} }`),
  },
);
const keyArb = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...KEYS.slice(0, 16)) },
  { weight: 1, arbitrary: fc.constantFrom(...KEYS) },
);

const { tree } = fc.letrec<{ tree: Tree }>((tie) => ({
  tree: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    { weight: 4, arbitrary: scalarArb.map((s): Tree => ({ t: 'scalar', s })) },
    {
      weight: 2,
      arbitrary: fc.array(fc.tuple(keyArb, tie('tree')), { minLength: 1, maxLength: 4 }).map((entries): Tree => ({ t: 'map', entries })),
    },
    { weight: 2, arbitrary: fc.array(tie('tree'), { minLength: 1, maxLength: 3 }).map((items): Tree => ({ t: 'seq', items })) },
    { weight: 1, arbitrary: fc.array(fc.tuple(keyArb, scalarArb), { maxLength: 3 }).map((entries): Tree => ({ t: 'fmap', entries })) },
    { weight: 1, arbitrary: fc.array(scalarArb, { maxLength: 3 }).map((items): Tree => ({ t: 'fseq', items })) },
  ),
}));

/** Formatting choices drawn per text. */
interface Style {
  step: number;
  indentless: boolean;
  compact: boolean;
  comments: number[];
  spaces: number[];
  marker: boolean;
}

function render(root: Tree, style: Style): string {
  let draw = 0;
  const pick = (list: number[]): number => list[draw++ % list.length];
  const comment = (): string => ['', '', '', ' # note', '  #x', ' #: a: b', '#glued'][pick(style.comments) % 7];
  const trailing = (): string => ['', '', ' ', '   '][pick(style.spaces) % 4];
  const sp = (n: number): string => ' '.repeat(n);
  const flowText = (node: Tree): string => {
    const gap = pick(style.spaces) % 2 === 0 ? ' ' : '';
    if (node.t === 'fmap')
      return node.entries.length === 0 ? '{}' : `{${gap}${node.entries.map(([k, v]) => `${k}: ${v}`).join(', ')}${gap}}`;
    const comma = [', ', ',', ' , ', ',  '][pick(style.spaces) % 4];
    if (node.t === 'fseq') return `[${gap}${(node as { items: string[] }).items.join(comma)}${gap}]`;
    return '';
  };
  const inline = (node: Tree): string | null =>
    node.t === 'scalar' ? node.s : node.t === 'fmap' || node.t === 'fseq' ? flowText(node) : null;
  const lines: string[] = [];
  const extra = (n: number): void => {
    const c = pick(style.comments) % 9;
    if (c === 0) lines.push(`${sp(pick(style.spaces) % 5)}# a comment: with - things`);
    else if (c === 1) lines.push('');
    else if (c === 2) lines.push(sp(n));
  };
  const block = (node: Tree, n: number): void => {
    if (node.t === 'map') {
      for (const [k, v] of node.entries) {
        extra(n);
        const text = inline(v);
        if (text !== null) lines.push(`${sp(n)}${k}:${text === '' ? '' : ` ${text}`}${trailing()}${comment()}`);
        else {
          lines.push(`${sp(n)}${k}:${comment()}`);
          block(v, v.t === 'seq' && style.indentless && pick(style.spaces) % 2 === 0 ? n : n + style.step);
        }
      }
    } else if (node.t === 'seq') {
      for (const item of node.items) {
        extra(n);
        const text = inline(item);
        if (text !== null) lines.push(`${sp(n)}-${text === '' ? '' : ` ${text}`}${trailing()}${comment()}`);
        else if (item.t === 'map' && style.compact) {
          const [[k, v], ...rest] = item.entries;
          const first = inline(v);
          const at = n + 2;
          if (first !== null) lines.push(`${sp(n)}- ${k}:${first === '' ? '' : ` ${first}`}${comment()}`);
          else {
            lines.push(`${sp(n)}- ${k}:`);
            block(v, at + style.step);
          }
          if (rest.length > 0) block({ t: 'map', entries: rest }, at);
        } else {
          lines.push(`${sp(n)}-${comment()}`);
          block(item, n + style.step);
        }
      }
    }
  };
  block(root, 0);
  return `${style.marker ? '# head\n---\n' : ''}${lines.join('\n')}\n`;
}

const styleArb = fc.record({
  step: fc.integer({ min: 1, max: 4 }),
  indentless: fc.boolean(),
  compact: fc.boolean(),
  comments: fc.array(fc.nat(50), { minLength: 1, maxLength: 8 }),
  spaces: fc.array(fc.nat(50), { minLength: 1, maxLength: 8 }),
  marker: fc.boolean(),
});
const rootArb = fc.oneof(
  fc.array(fc.tuple(keyArb, tree), { minLength: 1, maxLength: 6 }).map((entries): Tree => ({ t: 'map', entries })),
  fc.array(tree, { minLength: 1, maxLength: 4 }).map((items): Tree => ({ t: 'seq', items })),
);

describe('parseFastYaml: the same document as the library, or declined', () => {
  it('agrees with the library on value and positions wherever it accepts (generated texts)', () => {
    let accepted = 0;
    let runs = 0;
    fc.assert(
      fc.property(rootArb, styleArb, (root, style) => {
        const text = render(root, style);
        runs += 1;
        const fast = parseFastYaml(text);
        const lib = library(text);
        if (fast === null) return;
        accepted += 1;
        // Whatever the library refuses (syntax, duplicate key, ...), the fast path must decline.
        expect('doc' in lib ? 'parsed' : `library error ${String((lib as { error: unknown }).error)}`).toBe('parsed');
        if ('doc' in lib) expectSame(fast, lib.doc);
      }),
      // A fixed seed keeps the suite repeatable; YAML_FAST_RUNS and YAML_FAST_SEED explore further by hand.
      { numRuns: Number(process.env.YAML_FAST_RUNS ?? 1500), seed: Number(process.env.YAML_FAST_SEED ?? 20261204) },
    );
    // The generator is meant to hit the subset often; a fast path that declined everything would pass vacuously.
    expect(accepted / runs).toBeGreaterThan(0.2);
  });

  it('resolves every scalar of the pool as the library does, in a block and in a flow list', () => {
    let checked = 0;
    for (const s of SCALARS) {
      for (const text of [`v: ${s}\n`, `- ${s}\n`, `v: [${s}]\n`, `v: { k: ${s} }\n`, `${s}: 1\n`]) {
        const fast = parseFastYaml(text);
        const lib = library(text);
        if (fast === null) continue;
        checked += 1;
        expect({ text, lib: 'doc' in lib }).toEqual({ text, lib: true });
        if ('doc' in lib) expectSame(fast, lib.doc);
      }
    }
    expect(checked).toBeGreaterThan(150);
  });

  it('resolves plain scalars with the core schema (YAML 1.2: yes/no/off stay text, 017 is decimal)', () => {
    expect(resolvePlain('yes')).toBe('yes');
    expect(resolvePlain('off')).toBe('off');
    expect(resolvePlain('017')).toBe(17);
    expect(resolvePlain('0o17')).toBe(15);
    expect(resolvePlain('0x1F')).toBe(31);
    expect(resolvePlain('1e3')).toBe(1000);
    expect(resolvePlain('-.inf')).toBe(Number.NEGATIVE_INFINITY);
    expect(resolvePlain('.NaN')).toBeNaN();
    expect(Object.is(resolvePlain('-0'), -0)).toBe(true);
    expect(resolvePlain('1_000')).toBe('1_000');
    expect(resolvePlain('2020-01-01')).toBe('2020-01-01');
    expect(resolvePlain('')).toBeNull();
    expect(resolvePlain('tRUE')).toBe('tRUE');
  });

  it('accepts the many-models benchmark descriptor and settings, with the library positions', () => {
    for (const w of Object.values(MONOREPO_WORKLOADS as Record<string, unknown>)) {
      const text = monorepoDescriptor('m0001', w) as string;
      const fast = parseFastYaml(text);
      expect(fast).not.toBeNull();
      const lib = library(text);
      expect('doc' in lib).toBe(true);
      if (fast !== null && 'doc' in lib) expectSame(fast, lib.doc);
      expect(fast?.valuePositionOf(['terms', 0, 'polynomial', 'degree'])).toEqual({ line: 9, column: 35 });
    }
    const settings = 'version: 1\nmodels:\n  - "models/*.model.yml"\n';
    const fast = parseFastYaml(settings);
    expect(fast?.value).toEqual({ version: 1, models: ['models/*.model.yml'] });
    expectSame(fast as YamlDocument, parseYamlWithLibrary(settings, F));
  });

  it('places empty values where the library does (after the indicator and its spaces)', () => {
    for (const text of ['a:\nb: 1\n', 'a:   # c\nb: 1\n', 'a:   \nb:', '-\n-   # c\n- x\n', 'x:\n  - a:\n  -\n    b:\n']) {
      const fast = parseFastYaml(text);
      expect(fast).not.toBeNull();
      expectSame(fast as YamlDocument, parseYamlWithLibrary(text, F));
    }
  });

  it('parseYaml gives the fast answer for accepted text, also after a byte-order mark', () => {
    const text = '\ufeff---\nversion: 1\nname: m\n';
    const doc = parseYaml(text, F);
    expectSame(doc, parseYamlWithLibrary(text, F));
    expect(doc.positionOf(['name'])).toEqual({ line: 3, column: 1 });
  });
});

describe('parseFastYaml: declines what is outside its subset', () => {
  const declined: [string, string][] = [
    ['an anchor and an alias', 'a: &x 1\nb: *x\n'],
    ['a tag', 'a: !!str 1\n'],
    ['a literal block scalar', 'a: |\n  text\n'],
    ['a folded block scalar', 'a: >\n  text\n'],
    ['a multi-line plain scalar', 'a: one\n  two\n'],
    ['a multi-line quoted scalar', 'a: "one\n  two"\n'],
    ['a tab', 'a:\tb\n'],
    ['a tab in indentation', 'a:\n\tb: 1\n'],
    ['a carriage return', 'a: 1\r\nb: 2\r\n'],
    ['a duplicate key', 'a: 1\nb: 2\na: 3\n'],
    ['keys equal as text', '1: a\n1.0: b\n'],
    ['a directive', '%YAML 1.2\n---\na: 1\n'],
    ['two documents', 'a: 1\n---\nb: 2\n'],
    ['a document end marker', 'a: 1\n...\n'],
    ['a marker with content', '--- a: 1\n'],
    ['an escape in a double-quoted string', 'a: "x\\ty"\n'],
    ['odd indentation', 'a: 1\n  b: 2\n'],
    ['a less indented key', 'a:\n    b: 1\n  c: 2\n'],
    ['an explicit key', '? a\n: 1\n'],
    ['a quoted key', '"a": 1\n'],
    ['a key with a space', 'a b: 1\n'],
    ['a null key', '~: 1\n'],
    ['a flow collection as a key', '{ a: 1 }: 2\n'],
    ['a flow mapping without a space after the colon', 'a: {b:1}\n'],
    ['flow collections nested too deeply', `a: ${'['.repeat(40)}1${']'.repeat(40)}\n`],
    ['a multi-line flow collection', 'a: [1,\n  2]\n'],
    ['a trailing comma in a flow list', 'a: [1, 2, ]\n'],
    ['an empty flow entry', 'a: { b: }\n'],
    ['a nested compact list', '- - a\n'],
    ['a list item at a mapping indentation', 'a: 1\n- b\n'],
    ['a compact mapping as a value', 'a: b: c\n'],
    ['a very long line', `a: ${'x'.repeat(FAST_YAML_LIMITS.maxLineLength)}\n`],
    ['deep nesting', `${Array.from({ length: 40 }, (_, i) => `${' '.repeat(i)}k:`).join('\n')}\n`],
    ['an empty document', '# only a comment\n'],
    ['a scalar document', 'just text\n'],
    ['a root indented', '  a: 1\n'],
    ['a NUL', 'a: \u0000\n'],
    ['a comment glued to a quoted scalar', 'a: "x"#c\n'],
  ];
  for (const [what, text] of declined) {
    it(`declines ${what}`, () => {
      expect(parseFastYaml(text)).toBeNull();
    });
  }

  it('leaves the library errors unchanged through parseYaml', () => {
    for (const text of [
      'a: 1\nb: 2\na: 3\n',
      'a: 1\n  b: 2\n',
      'a: 1\nb: [1, 2\nc: 3\n',
      'a: 1\n---\nb: 2\n',
      'a: b: c\n',
      'a: 1\n- b\n',
      '1: a\n1.0: b\n',
    ]) {
      let viaParse: unknown = null;
      let viaLibrary: unknown = null;
      try {
        parseYaml(text, F);
      } catch (error) {
        viaParse = error;
      }
      try {
        parseYamlWithLibrary(text, F);
      } catch (error) {
        viaLibrary = error;
      }
      expect(viaLibrary).not.toBeNull();
      expect(viaParse).toEqual(viaLibrary);
      expect(String(viaParse)).toBe(String(viaLibrary));
    }
  });
});

describe('parseFastYaml on the repository YAML files', () => {
  const files: string[] = [];
  const walk = (dir: string): void => {
    for (const name of readdirSync(dir).sort()) {
      const full = path.join(dir, name);
      if (name === 'node_modules' || name === '.git') continue;
      if (statSync(full).isDirectory()) walk(full);
      else if (/\.ya?ml$/.test(name)) files.push(path.relative(ROOT, full));
    }
  };
  walk(path.join(ROOT, 'examples'));
  walk(path.join(ROOT, 'test'));

  it('accepts them with the library answer, or declines the listed ones', () => {
    const declinedFiles: string[] = [];
    let accepted = 0;
    for (const file of files) {
      const text = readFileSync(path.join(ROOT, file), 'utf8');
      const lib = library(text);
      const fast = parseFastYaml(text.replace(/^\ufeff/, ''));
      if (fast === null) {
        declinedFiles.push(file);
        continue;
      }
      expect({ file, parsed: 'doc' in lib }).toEqual({ file, parsed: true });
      if ('doc' in lib) expectSame(fast, lib.doc);
      accepted += 1;
    }
    expect(accepted).toBeGreaterThan(20);
    expect(declinedFiles).toEqual(EXPECTED_DECLINED);
  });
});

/** Files the fast path declines (the library path reads them as before). */
const EXPECTED_DECLINED: string[] = [
  'examples/workflows/fitgate.yml', // a workflow, not a fitgate file: a block scalar (`path: |`) and `${{ }}` values
  'test/scenarios/broken-settings/fitgate.yml', // invalid YAML on purpose (an unclosed flow mapping)
];
