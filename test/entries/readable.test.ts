// Items "readable by default" and "small data is not failed by surprise", through the command
// (the sources run as `node cli.js`, see source-cli.ts): notes, --verbose, the base column, the
// bare command, error lines, "did you mean", and the parameter-ratio rule of thumb's advice.
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sourceCli, type CliRun } from './source-cli.js';
import { greenhouse, lineDescriptor } from './small-repo.js';

let cli: ReturnType<typeof sourceCli>;
const cleanup: Array<() => void> = [];
beforeAll(() => {
  cli = sourceCli();
});
afterAll(() => {
  cli?.remove();
  for (const f of cleanup) f();
});

function inRepo(extra = '', more: Record<string, string> = {}): string {
  const repo = greenhouse(extra, more);
  cleanup.push(repo.remove);
  return repo.dir;
}

function run(args: string[], cwd: string): CliRun {
  return cli.run(args, cwd);
}

describe('readable by default', () => {
  it('exits 2 after the help when no command is given', () => {
    const r = run([], inRepo());
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^Usage: fitgate \[options\] \[command\]/);
    expect(r.stdout).toBe('');
  });

  it('says which settings file was used, or that the defaults were', () => {
    const none = run(['check', '--jobs', '1'], inRepo('limits: { params_per_sample: 0.2 }'));
    expect(none.stdout).toContain('note: settings: no file at fitgate.yml; built-in defaults (descriptors **/*.model.yml, default limits)');
    const withFile = run(
      ['check', '--jobs', '1'],
      inRepo('limits: { params_per_sample: 0.2 }', { 'fitgate.yml': 'version: 1\nmodels: ["models/*.model.yml"]\n' }),
    );
    expect(withFile.stdout).toContain('note: settings: fitgate.yml');
    expect(withFile.status, withFile.stderr).toBe(0);
  });

  it('lists every check with its figure under --verbose, passing ones included', () => {
    const dir = inRepo('limits: { params_per_sample: 0.2 }');
    const quiet = run(['check', '--jobs', '1'], dir);
    expect(quiet.status, quiet.stdout).toBe(0);
    expect(quiet.stdout).not.toContain('PASS generalisation-gap');
    const verbose = run(['check', '--jobs', '1', '--verbose'], dir);
    expect(verbose.status).toBe(0);
    expect(verbose.stdout).toContain('PASS greenhouse-humidity (models/greenhouse.model.yml)');
    expect(verbose.stdout).toMatch(
      / {2}PASS generalisation-gap \(models\/greenhouse\.model\.yml:\d+\): hold-out RMSE [\d.]+ is [\d.]+ times the training RMSE/,
    );
    expect(verbose.stdout).toContain(
      'PASS parameter-ratio (models/greenhouse.model.yml:10): 2 parameters for 15 training rows (0.1333 per row); within limits (fail above 0.2)',
    );
    expect(verbose.stdout).toMatch(/ {2}SKIPPED reproducibility/);
  });

  it('adds a base column when compared with a base commit', () => {
    const dir = inRepo('limits: { params_per_sample: 0.2 }');
    const env = {
      ...process.env,
      GIT_AUTHOR_NAME: 't',
      GIT_AUTHOR_EMAIL: 't@example.com',
      GIT_COMMITTER_NAME: 't',
      GIT_COMMITTER_EMAIL: 't@example.com',
    };
    for (const args of [
      ['init', '-q', '-b', 'main'],
      ['add', '-A'],
      ['commit', '-q', '-m', 'line'],
    ])
      execFileSync('git', args, { cwd: dir, env, stdio: 'pipe' });
    const plain = run(['check', '--jobs', '1'], dir);
    expect(plain.stdout.split('\n')[0]).not.toContain('vs base');
    const compared = run(['check', '--jobs', '1', '--base', 'HEAD'], dir);
    expect(compared.status, compared.stderr).toBe(0);
    const [header, row] = compared.stdout.split('\n');
    expect(header).toMatch(/max std coef {2}vs base$/);
    expect(row).toMatch(/ 0%$/);
  });

  it('names a descriptor error by file, line and column, does not repeat the path in its header, and suggests the nearest key', () => {
    const dir = inRepo();
    writeFileSync(
      path.join(dir, 'models/greenhouse.model.yml'),
      lineDescriptor().replace('  target: humidity_pct', '  taget: humidity_pct'),
    );
    const r = run(['check', '--jobs', '1'], dir);
    expect(r.status).toBe(2);
    const lines = r.stdout.split('\n');
    const header = lines.indexOf('ERROR models/greenhouse.model.yml');
    expect(header, r.stdout).toBeGreaterThan(0);
    expect(lines[header + 1]).toBe(
      '  models/greenhouse.model.yml:4:1: `data.target`: missing key `target` (did you mean `target` instead of "taget"?); required keys: train, target',
    );
  });

  it('suggests the nearest allowed key for an unknown one', () => {
    const dir = inRepo('fit: { ridg: 0.5 }');
    const r = run(['check', '--jobs', '1'], dir);
    expect(r.status).toBe(2);
    expect(r.stdout).toMatch(
      /models\/greenhouse\.model\.yml:10:8: `fit\.ridg`: unknown key `ridg` \(did you mean `ridge`\?\); expected one of: /,
    );
  });
});

describe('small data is not failed by surprise', () => {
  it('says which rule a straight line on 15 rows breaks and how to relax it; relaxed, it passes', () => {
    const strict = run(['check', '--jobs', '1'], inRepo());
    expect(strict.status).toBe(1);
    expect(strict.stdout).toContain(
      'FAIL parameter-ratio (models/greenhouse.model.yml:8): 2 parameters for 15 training rows (0.1333 per row); over the fail limit 0.1',
    );
    expect(strict.stdout).toContain(
      'The default limit 0.1 is a rule of thumb (common practice: at least 10 training rows per parameter), not a law. Remove terms, lower the degree or the number of radial centres, add a ridge penalty, or add training rows. If the data set is small by nature and the fit is otherwise sound, relax the rule for this model in its descriptor: `limits: { params_per_sample: 0.14 }`.',
    );
    const relaxed = run(['check', '--jobs', '1'], inRepo('limits: { params_per_sample: 0.14 }'));
    expect(relaxed.status, relaxed.stdout).toBe(0);
  });

  it('keeps the plain advice when the user set the limit', () => {
    const r = run(['check', '--jobs', '1'], inRepo('limits: { params_per_sample: 0.05 }'));
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('over the fail limit 0.05');
    expect(r.stdout).not.toContain('rule of thumb');
  });
});
