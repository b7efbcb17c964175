import { describe, expect, it } from 'vitest';
import { decodeYamlBytes, parseYaml, readYamlFile, YAML_GUARDS } from '../../src/config/yaml-source.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { expectInputError } from './helpers.js';

const F = 'models/a.model.yml';

describe('parseYaml: values and positions', () => {
  const text = ['version: 1', 'terms:', '  - linear: [a, b]', '  - rbf:', '      of: x', '      width: 2', 'flag: off', ''].join('\n');
  const doc = parseYaml(text, F);

  it('gives plain values (YAML 1.2 core: `off` stays text)', () => {
    expect(doc.value).toEqual({ version: 1, terms: [{ linear: ['a', 'b'] }, { rbf: { of: 'x', width: 2 } }], flag: 'off' });
  });

  it('gives the position of keys and list items by key path', () => {
    expect(doc.positionOf(['version'])).toEqual({ line: 1, column: 1 });
    expect(doc.positionOf(['terms', 1])).toEqual({ line: 4, column: 5 });
    expect(doc.positionOf(['terms', 1, 'rbf', 'width'])).toEqual({ line: 6, column: 7 });
    expect(doc.valuePositionOf(['terms', 1, 'rbf', 'width'])).toEqual({ line: 6, column: 14 });
    expect(doc.positionOf(['terms', 0, 'linear', 1])).toEqual({ line: 3, column: 17 });
    expect(doc.positionOf(['terms', 5])).toBeNull();
    expect(doc.positionOf(['nope'])).toBeNull();
  });

  it('follows aliases when locating', () => {
    const d = parseYaml('base: &b { warn: 1, fail: 2 }\nother: *b\n', F);
    expect(d.value).toEqual({ base: { warn: 1, fail: 2 }, other: { warn: 1, fail: 2 } });
    expect(d.positionOf(['other', 'fail'])).toEqual({ line: 1, column: 21 });
  });

  it('accepts an empty document as null and a byte-order mark', () => {
    expect(parseYaml('', F).value).toBeNull();
    expect(parseYaml('\ufeffa: 1\n', F).value).toEqual({ a: 1 });
  });
});

describe('parseYaml: errors', () => {
  it('reports syntax errors with the yaml package line and column', async () => {
    await expectInputError(() => parseYaml('a: 1\nb: [1, 2\nc: 3\n', F), { code: 'yaml-syntax', file: F, line: 3 });
    // The yaml package places this one at the end of `a: 1` (line 1, column 4): we pass its position on.
    await expectInputError(() => parseYaml('a: 1\n  b: 2\n', F), { code: 'yaml-syntax', file: F, line: 1, column: 4 });
  });

  it('refuses several documents in one file', async () => {
    await expectInputError(() => parseYaml('a: 1\n---\nb: 2\n', F), { code: 'yaml-syntax', file: F, line: 2 });
  });

  it('refuses duplicate keys at the second occurrence, at any depth', async () => {
    await expectInputError(() => parseYaml('a: 1\nb: 2\na: 3\n', F), { code: 'yaml-duplicate-key', file: F, line: 3, column: 1, key: 'a' });
    await expectInputError(() => parseYaml('fit:\n  ridge: 1\n  seed: 2\n  ridge: 3\n', F), {
      code: 'yaml-duplicate-key',
      file: F,
      line: 4,
      column: 3,
    });
  });

  it('refuses a list or a mapping used as a key, at its position, without a process warning', async () => {
    const warnings: Error[] = [];
    const onWarning = (w: Error): void => void warnings.push(w);
    process.on('warning', onWarning);
    try {
      await expectInputError(() => parseYaml('version: 1\nterms:\n  - { from: 0, to: 10 }: 3\n', F), {
        code: 'yaml-collection-key',
        file: F,
        line: 3,
        column: 5,
      });
      await expectInputError(() => parseYaml('a: 1\n[x, y]: 2\n', F), { code: 'yaml-collection-key', file: F, line: 2, column: 1 });
      await expectInputError(() => parseYaml('a: &l [1, 2]\n*l : 2\n', F), { code: 'yaml-collection-key', file: F, line: 2, column: 1 });
      expect(() => parseYaml('a: 1\n[x, y]: 2\n', F)).toThrow('a list used as a key (`[x, y]`)');
      // A scalar alias as a key is a plain key.
      expect(parseYaml('a: &k name\n*k : 2\n', F).value).toEqual({ a: 'name', name: 2 });
      await new Promise((resolve) => setImmediate(resolve));
    } finally {
      process.off('warning', onWarning);
    }
    expect(warnings.map((w) => w.message)).toEqual([]);
  });

  it('refuses an alias bomb quickly', async () => {
    const lines = ['a: &a ["x","x","x","x","x","x","x","x","x"]'];
    for (let i = 1; i < 10; i++) {
      const prev = String.fromCharCode(96 + i);
      const name = String.fromCharCode(97 + i);
      lines.push(`${name}: &${name} [${Array(9).fill(`*${prev}`).join(',')}]`);
    }
    const start = performance.now();
    await expectInputError(() => parseYaml(lines.join('\n'), F), { code: 'yaml-aliases', file: F, line: 2 });
    const ms = performance.now() - start;
    expect(ms, `alias bomb took ${ms.toFixed(0)} ms, expected under 1000 ms`).toBeLessThan(1000);
  });

  it('allows a few aliases', () => {
    expect(parseYaml('a: &x 1\nb: *x\nc: *x\n', F).value).toEqual({ a: 1, b: 1, c: 1 });
  });

  it('refuses nesting deeper than the cap, in flow and block style', async () => {
    const depth = YAML_GUARDS.maxDepth + 1;
    await expectInputError(() => parseYaml(`a: ${'['.repeat(depth)}${']'.repeat(depth)}`, F), { code: 'yaml-too-deep', file: F, line: 1 });
    const block = Array.from({ length: depth }, (_, i) => `${' '.repeat(i)}k:`).join('\n') + ' 1\n';
    await expectInputError(() => parseYaml(block, F), { code: 'yaml-too-deep', file: F });
    const shallow = `a: ${'['.repeat(YAML_GUARDS.maxDepth - 1)}${']'.repeat(YAML_GUARDS.maxDepth - 1)}`;
    expect(() => parseYaml(shallow, F), 'nesting at the cap is allowed').not.toThrow();
  });

  it('refuses pathological nesting quickly (no stack overflow, no hang)', async () => {
    const cases = {
      flow: '['.repeat(400_000) + ']'.repeat(400_000),
      compactSeq: '- '.repeat(400_000) + 'x',
      flowMaps: 'a: {'.repeat(200_000) + '}'.repeat(200_000),
    };
    for (const [name, text] of Object.entries(cases)) {
      const start = performance.now();
      await expectInputError(() => parseYaml(text, F), { code: 'yaml-too-deep', file: F });
      const ms = performance.now() - start;
      expect(ms, `${name}: ${text.length} chars refused in ${ms.toFixed(0)} ms, expected under 500 ms`).toBeLessThan(500);
    }
  });

  it('refuses documents above the size cap', async () => {
    const big = `a: "${'x'.repeat(YAML_GUARDS.maxBytes)}"\n`;
    await expectInputError(() => parseYaml(big, F), { code: 'file-too-large', file: F });
  });
});

describe('decodeYamlBytes and readYamlFile', () => {
  it('refuses bytes that are not UTF-8, pointing at the bad byte', async () => {
    const bytes = new Uint8Array([0x61, 0x3a, 0x20, 0x31, 0x0a, 0x62, 0x3a, 0x20, 0xff, 0x0a]);
    await expectInputError(() => decodeYamlBytes(bytes, F), { code: 'file-encoding', file: F, line: 2, column: 4 });
  });

  it('refuses binary content (NUL characters)', async () => {
    await expectInputError(() => decodeYamlBytes(new Uint8Array([0x61, 0x00, 0x62]), F), {
      code: 'file-encoding',
      file: F,
      line: 1,
      column: 2,
    });
  });

  it('reads through a repository, checking the size before reading', async () => {
    const repo = createMemoryRepository({ [F]: 'a: 1\n', 'big.yml': new Uint8Array(YAML_GUARDS.maxBytes + 1).fill(0x20) });
    expect((await readYamlFile(repo, F)).value).toEqual({ a: 1 });
    await expectInputError(() => readYamlFile(repo, 'big.yml'), { code: 'file-too-large', file: 'big.yml' });
  });
});
