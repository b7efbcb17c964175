// `fitgate refit`, through the command (the sources run as `node cli.js`): coefficients written
// into a commented descriptor with every other byte kept, `--check` for CI, and errors.
import { readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import type { Result } from '../../src/result/result.js';
import { sourceCli } from './source-cli.js';
import { greenhouse } from './small-repo.js';

let cli: ReturnType<typeof sourceCli>;
const cleanup: Array<() => void> = [];
beforeAll(() => {
  cli = sourceCli();
});
afterAll(() => {
  cli?.remove();
  for (const f of cleanup) f();
});

/** A descriptor written by hand: comments everywhere, flow and block styles, quotes, blank lines, stale coefficients in block style. */
const COMMENTED = `# Greenhouse humidity against the vent opening.
version: 1            # format version

name: 'greenhouse-humidity'
data:                 # the committed data
  train: "../data/air-train.csv"
  holdout: ../data/air-holdout.csv   # 8 rows
  target: humidity_pct
terms:
  - linear: [ vent_pct ]     # spaces kept
fit: {intercept: true,   ridge: 0}
coefficients:   # shipped by the team
  - 80.0   # intercept
  - -0.3
  - 0.0    # a third one that should not be there
# trailing remark
limits:
  params_per_sample: 0.2
`;

function repo(descriptor: string, more: Record<string, string> = {}): string {
  const r = greenhouse('', { 'models/greenhouse.model.yml': descriptor, ...more });
  cleanup.push(r.remove);
  return r.dir;
}

describe('fitgate refit', () => {
  it('writes the refit coefficients into a commented descriptor, every other byte the same; --check then passes', () => {
    const dir = repo(COMMENTED);
    const before = cli.run(['refit', '--check'], dir);
    expect(before.status).toBe(1);
    expect(before.stdout).toBe(
      'stale: models/greenhouse.model.yml: 2 coefficients from the refit, 3 shipped; run `fitgate refit models/greenhouse.model.yml`\n1 model: 1 with stale coefficients\n',
    );
    expect(readFileSync(path.join(dir, 'models/greenhouse.model.yml'), 'utf8')).toBe(COMMENTED);

    const r = cli.run(['refit'], dir);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toBe('wrote: models/greenhouse.model.yml: 2 coefficients (3 shipped)\n1 model: 1 descriptor written\n');
    const text = readFileSync(path.join(dir, 'models/greenhouse.model.yml'), 'utf8');
    const written = (parse(text) as { coefficients: number[] }).coefficients;
    expect(written).toHaveLength(2);
    const expected = COMMENTED.replace(
      '  - 80.0   # intercept\n  - -0.3\n  - 0.0    # a third one that should not be there\n',
      `  - ${String(written[0])}\n  - ${String(written[1])}    # a third one that should not be there\n`,
    );
    expect(text).toBe(expected);
    // What was written is the refit of `fitgate check`, to the last bit.
    const report = JSON.parse(cli.run(['check', '--format', 'json', '--jobs', '1'], dir).stdout) as Result;
    expect(report.models[0].coefficients).toEqual(written);

    const after = cli.run(['refit', '--check'], dir);
    expect(after.status).toBe(0);
    expect(after.stdout).toBe('current: models/greenhouse.model.yml: 2 coefficients\n1 model: 0 with stale coefficients\n');
    // The shipped coefficients now reproduce the refit exactly.
    const check = JSON.parse(cli.run(['check', '--format', 'json', '--jobs', '1'], dir).stdout) as Result;
    expect(check.models[0].checks.find((c) => c.id === 'reproducibility')?.value).toBe(0);
    // Refitting again changes nothing.
    expect(cli.run(['refit'], dir).stdout).toBe('unchanged: models/greenhouse.model.yml: 2 coefficients\n1 model: 0 descriptors written\n');
    expect(readFileSync(path.join(dir, 'models/greenhouse.model.yml'), 'utf8')).toBe(expected);
  });

  it('adds coefficients to a descriptor that ships none, only for the descriptors named', () => {
    const plain = COMMENTED.replace(/coefficients:[\s\S]*?# trailing remark\n/, '# trailing remark\n');
    const dir = repo(plain, { 'models/other.model.yml': plain.replace("name: 'greenhouse-humidity'", 'name: other') });
    const r = cli.run(['refit', 'models/greenhouse.model.yml'], dir);
    expect(r.status, r.stderr).toBe(0);
    const text = readFileSync(path.join(dir, 'models/greenhouse.model.yml'), 'utf8');
    expect(text.startsWith(plain)).toBe(true);
    expect(text.slice(plain.length)).toMatch(/^coefficients: \[[-\d.e]+, [-\d.e]+\]\n$/);
    expect(readFileSync(path.join(dir, 'models/other.model.yml'), 'utf8')).toBe(
      plain.replace("name: 'greenhouse-humidity'", 'name: other'),
    );
  });

  it('lists a model that cannot be refitted (exit 2) and still writes the others', () => {
    const dir = repo(COMMENTED, { 'models/broken.model.yml': 'version: 1\nname: broken\n' });
    const r = cli.run(['refit'], dir);
    expect(r.status).toBe(2);
    expect(r.stdout).toMatch(/^error: models\/broken\.model\.yml: line 1: `data`: missing key `data`/);
    expect(r.stdout).toContain('wrote: models/greenhouse.model.yml: 2 coefficients (3 shipped)\n');
  });

  it('never writes through a descriptor that is a link', () => {
    const dir = repo(COMMENTED);
    writeFileSync(path.join(dir, 'real.yml'), COMMENTED);
    const link = path.join(dir, 'models/greenhouse.model.yml');
    rmSync(link);
    symlinkSync(path.join(dir, 'real.yml'), link);
    const r = cli.run(['refit', 'models/greenhouse.model.yml'], dir);
    expect(r.status).toBe(2);
    expect(r.stdout).toMatch(
      /error: models\/greenhouse\.model\.yml: .*greenhouse\.model\.yml is a symbolic link; fitgate never writes through a link/,
    );
    expect(readFileSync(path.join(dir, 'real.yml'), 'utf8')).toBe(COMMENTED);
  });
});
