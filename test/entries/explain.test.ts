// `fitgate explain`, through the command (the sources run as `node cli.js`).
import { existsSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CHECKS } from '../../src/checks/index.js';
import { VERSION } from '../../src/core/version.js';
import { sourceCli } from './source-cli.js';

const project = fileURLToPath(new URL('../..', import.meta.url));
let cli: ReturnType<typeof sourceCli>;
beforeAll(() => {
  cli = sourceCli();
});
afterAll(() => cli?.remove());

describe('fitgate explain', () => {
  it("prints a check's description, formula and source, what to change, its module and docs page", () => {
    const r = cli.run(['explain', 'generalisation-gap'], tmpdir());
    expect(r.status, r.stderr).toBe(0);
    const check = CHECKS.find((c) => c.id === 'generalisation-gap');
    expect(check).toBeDefined();
    if (!check) return;
    expect(r.stdout).toMatch(
      /^generalisation-gap: Generalisation gap\n\nLimit key `gap_ratio` \(a ceiling: the figure fails above its limit\)\./,
    );
    expect(r.stdout).toContain(check.description);
    expect(r.stdout).toContain('hold-out RMSE / training RMSE');
    expect(r.stdout).toContain('The Elements of Statistical Learning');
    expect(r.stdout).toContain(`What to change: ${check.advice}`);
    expect(r.stdout).toContain('Source: src/checks/generalisation-gap.ts\n');
    expect(r.stdout).toContain(`Docs: https://github.com/fitgate/fitgate/blob/v${VERSION}/docs/checks.md#generalisation-gap\n`);
  });

  it('names for every check a module that exists and a docs heading that exists', () => {
    const docs = readFileSync(path.join(project, 'docs', 'checks.md'), 'utf8');
    const r = cli.run(['explain', ...CHECKS.map((c) => c.id)], tmpdir());
    expect(r.status).toBe(0);
    for (const c of CHECKS) {
      const source = r.stdout.match(new RegExp(`Source: (src/checks/${c.id}\\.ts)\\n`));
      expect(source, c.id).not.toBeNull();
      expect(existsSync(path.join(project, source?.[1] ?? '')), `${c.id} module`).toBe(true);
      expect(docs).toContain(`\n### ${c.id}\n`);
    }
  });

  it('accepts a limit key for its check', () => {
    const byKey = cli.run(['explain', 'params_per_sample'], tmpdir());
    expect(byKey.status).toBe(0);
    expect(byKey.stdout).toMatch(/^parameter-ratio: Parameters per row\n/);
  });

  it('lists every check with no id', () => {
    const r = cli.run(['explain'], tmpdir());
    expect(r.status).toBe(0);
    expect(
      r.stdout
        .trimEnd()
        .split('\n')
        .map((l) => l.split(/\s+/)[0]),
    ).toEqual(CHECKS.map((c) => c.id));
  });

  it('refuses an unknown id with the nearest one as a suggestion (status 2)', () => {
    const r = cli.run(['explain', 'coeficient-size'], tmpdir());
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toBe(
      `error: unknown check "coeficient-size" (did you mean 'coefficient-size'?)\n(run \`fitgate explain\` for the list of checks)\n`,
    );
    const far = cli.run(['explain', 'zzz'], tmpdir());
    expect(far.stderr).toMatch(/^error: unknown check "zzz"\n/);
  });

  it('is listed in the main help', () => {
    const r = cli.run(['--help'], tmpdir());
    expect(r.stdout).toContain('  explain [options] [check...]');
  });
});
