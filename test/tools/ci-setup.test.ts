// The system packages the tests need are installed by one named set-up step of .ci/run, listed
// in the README, and asked for through requireTool only: these lists stay in step.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));
const read = (file: string) => readFileSync(path.join(root, file), 'utf8');

function testSources(dir = 'test'): string[] {
  return readdirSync(path.join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = `${dir}/${e.name}`;
    if (e.isDirectory()) return e.name === 'fixtures' || e.name === 'corpus' ? [] : testSources(rel);
    return /\.(ts|mjs)$/.test(e.name) ? [rel] : [];
  });
}

const setUp = /^SYSTEM_PACKAGES=\(([^)]*)\)$/m.exec(read('.ci/run'));
const installed = (setUp?.[1] ?? '').split(/\s+/).filter(Boolean);
const sources = testSources().filter((f) => !f.startsWith('test/tools/require-tool') && f !== 'test/tools/ci-setup.test.ts');
const asked = new Set(
  sources.flatMap((f) =>
    [...read(f).matchAll(/requireTool\(\[([^\]]*)\]/g)].flatMap((m) => [...m[1].matchAll(/'([^']+)'/g)].map((q) => q[1])),
  ),
);
const packagesAsked = [...asked].filter((n) => !n.startsWith('shared/')).sort();

describe('.ci/run set-up step', () => {
  it('installs exactly the Debian packages the tests ask requireTool for', () => {
    expect(installed.length).toBeGreaterThan(0);
    expect(packagesAsked.length).toBeGreaterThan(0);
    expect([...installed].sort()).toEqual(packagesAsked);
  });

  it('lists the same packages in the README', () => {
    const readme = read('README.md');
    for (const p of installed) expect(readme, `README names \`${p}\``).toContain(`\`${p}\``);
  });

  it('leaves the CI-or-skip decision to requireTool: no other test reads process.env.CI', () => {
    expect(sources.filter((f) => /process\.env\.CI\b/.test(read(f)))).toEqual([]);
  });
});
