// The CLI's core as a classic script (src/launch/core-script.ts): ncc's ES module rewritten into
// one strict async function, with every rewrite checked.
import { createRequire } from 'node:module';
import vm from 'node:vm';
import { describe, expect, it } from 'vitest';
import { CORE_PARAMETERS, coreId, toCoreScript, type CoreFunction } from '../../src/launch/core-script.js';

const REQUIRE = ['__nccwpck', 'require__'].join('_');

/** A small module shaped as ncc writes one: its import, import.meta.url, a chunk loader. */
function nccModule(body: string): string {
  return [
    '#!/usr/bin/env node',
    'import { createRequire as __WEBPACK_EXTERNAL_createRequire } from "module";',
    `var ${REQUIRE} = { u: (chunkId) => "" + chunkId + ".index.js" };`,
    '/* webpack/runtime/import chunk loading */',
    '// import() chunk loading for javascript',
    `const load = (chunkId) => import("./" + ${REQUIRE}.u(chunkId));`,
    body,
  ].join('\n');
}

describe('toCoreScript', () => {
  it('gives a strict async function of createRequire, the entry URL and the chunk loader', async () => {
    const source = toCoreScript(
      nccModule(
        [
          'const os = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:os");',
          'globalThis.__coreSeen = { url: import.meta.url, strict: (function () { return this; })() === undefined, cpus: typeof os.cpus };',
          'globalThis.__coreSeen.chunk = await load(7);',
        ].join('\n'),
      ),
      () => 'abc123',
    );
    expect(source.split('\n')[0]).toBe(`(async function (${CORE_PARAMETERS.join(', ')}) {"use strict"; // fitgate core abc123`);
    const core = new vm.Script(source).runInThisContext() as CoreFunction;
    const loaded: string[] = [];
    await core(
      (url) => {
        expect(url).toBe('file:///somewhere/index.js');
        return createRequire(import.meta.url);
      },
      'file:///somewhere/index.js',
      async (specifier) => {
        loaded.push(specifier);
        return 'chunk module';
      },
    );
    const seen = (globalThis as unknown as { __coreSeen: Record<string, unknown> }).__coreSeen;
    expect(seen).toEqual({ url: 'file:///somewhere/index.js', strict: true, cpus: 'function', chunk: 'chunk module' });
    expect(loaded).toEqual(['./7.index.js']);
  });

  it('refuses a bundle of another shape, saying what it found', () => {
    expect(() => toCoreScript('console.log(1);\n', () => 'a')).toThrow(/does not start with ncc's import of createRequire/);
    expect(() => toCoreScript(nccModule('import fs from "node:fs";'), () => 'a')).toThrow(/module statement at offset \d+: "import fs/);
    expect(() => toCoreScript(nccModule('export const x = 1;'), () => 'a')).toThrow(/module statement/);
    expect(() => toCoreScript(nccModule('const r = import.meta.resolve("x");'), () => 'a')).toThrow(/import\.meta other than import\.meta\.url/);
    expect(() => toCoreScript(nccModule('const other = import("./x.js");'), () => 'a')).toThrow(/an import\(\) besides the chunk loader/);
    const twice = nccModule(`const again = (chunkId) => import("./" + ${REQUIRE}.u(chunkId));`);
    expect(() => toCoreScript(twice, () => 'a')).toThrow(/chunk loader once in the CLI bundle, found it 2 times/);
    const none = nccModule('').replace(`import("./" + ${REQUIRE}.u(chunkId))`, 'null');
    expect(() => toCoreScript(none, () => 'a')).toThrow(/found it 0 times/);
    expect(() => toCoreScript(nccModule(''), () => 'A B')).toThrow(/lower-case letters and digits/);
  });

  it('names the build from the whole script with its name left empty', () => {
    const seen: string[] = [];
    const source = toCoreScript(nccModule('const a = 1;'), (script) => {
      seen.push(script);
      return 'f00d';
    });
    expect(seen).toHaveLength(1);
    expect(seen[0]).toBe(source.replace('// fitgate core f00d\n', '// fitgate core \n'));
    // Another bundle gives another script to name.
    toCoreScript(nccModule('const a = 2;'), (script) => (seen.push(script), 'f00e'));
    expect(seen[1]).not.toBe(seen[0]);
  });

  it('leaves the text between the rewrites as it was', () => {
    const body = 'const s = "import is a word"; // import() in a comment';
    const source = toCoreScript(nccModule(body), () => 'a');
    expect(source).toContain('const s = "import is a word"; // import() in a comment');
    expect(source.endsWith('\n})')).toBe(true);
  });
});

describe('coreId', () => {
  it('reads the identity at the end of the first line', () => {
    expect(coreId(Buffer.from(toCoreScript(nccModule(''), () => '0f9e')))).toBe('0f9e');
  });
  it('is null for a script without one', () => {
    expect(coreId(Buffer.from('(async function () {\n})'))).toBeNull();
    expect(coreId(Buffer.from('x // fitgate core ABC\n'))).toBeNull();
    expect(coreId(Buffer.from(`x // fitgate core ${'a'.repeat(600)}`))).toBeNull();
    expect(coreId(new Uint8Array(0))).toBeNull();
  });
});
