// The CLI bundle (node dist/cli/index.js) loads some parts on first use from files in
// (dist/cli/chunks/N.index.js): the general CSV parser, the Markdown, HTML, SARIF and JUnit reporters,
// `merge`, the base comparison and the glob matcher. Each of those paths runs here once through
// the bundle, so a chunk missing from dist/ or failing to load shows up as a failed run.
import { execFileSync, spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('..', import.meta.url));
const bundle = path.join(root, 'dist', 'cli', 'index.js');
let repo: string;

function cli(args: string[]): { status: number | null; stdout: string; stderr: string } {
  const run = spawnSync(process.execPath, [bundle, ...args], {
    cwd: repo,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1' },
    maxBuffer: 64 * 1024 * 1024,
  });
  return { status: run.status, stdout: run.stdout, stderr: run.stderr };
}

function git(...args: string[]): void {
  execFileSync('git', args, {
    cwd: repo,
    env: {
      ...process.env,
      GIT_AUTHOR_NAME: 't',
      GIT_AUTHOR_EMAIL: 't@example.com',
      GIT_COMMITTER_NAME: 't',
      GIT_COMMITTER_EMAIL: 't@example.com',
    },
    stdio: 'pipe',
  });
}

beforeAll(() => {
  repo = mkdtempSync(path.join(tmpdir(), 'fitgate-cli-'));
  cpSync(path.join(root, 'examples'), repo, { recursive: true });
  git('init', '-q', '-b', 'main');
  git('add', '-A');
  git('commit', '-q', '-m', 'examples');
});
afterAll(() => {
  if (repo) rmSync(repo, { recursive: true, force: true });
});

describe('the CLI bundle loads what a run needs on demand', () => {
  it('is built (npm run bundle)', () => {
    expect(existsSync(bundle), bundle).toBe(true);
  });

  it('globs the descriptors and writes Markdown, HTML, SARIF and JUnit reports', () => {
    const run = cli(['check', '--format', 'markdown', '--html', 'site', '--sarif', 'out.sarif', '--junit', 'out.xml', '--jobs', '1']);
    expect(run.status, run.stderr).toBe(1);
    expect(run.stdout).toContain('press-yield');
    expect(readFileSync(path.join(repo, 'site', 'index.html'), 'utf8')).toContain('<svg');
    expect(JSON.parse(readFileSync(path.join(repo, 'out.sarif'), 'utf8')).version).toBe('2.1.0');
    expect(readFileSync(path.join(repo, 'out.xml'), 'utf8')).toContain('<testsuite');
  });

  it('merges shard reports', () => {
    for (const k of [1, 2]) {
      const run = cli(['check', '--shard', `${k}/2`, '--format', 'json', '--out', `shard-${k}.json`, '--jobs', '1']);
      expect(run.status, run.stderr).toBe(1);
    }
    const merged = cli(['merge', 'shard-1.json', 'shard-2.json', '--format', 'json']);
    expect(merged.status, merged.stderr).toBe(1);
    expect((JSON.parse(merged.stdout) as { models: unknown[] }).models).toHaveLength(6);
    // A report that cannot be read stops the merge with exit status 2 and names the file.
    const missing = cli(['merge', 'shard-1.json', 'no-such-shard.json']);
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/^fitgate: .*no-such-shard\.json.*expected a readable JSON report file: ENOENT/m);
  });

  it('compares with a base commit', () => {
    const run = cli(['check', 'models/press-yield.model.yml', '--base', 'HEAD', '--format', 'json']);
    expect(run.status, run.stderr).toBe(0);
    const report = JSON.parse(run.stdout) as { models: { base?: { status: string } }[] };
    expect(report.models[0].base?.status).toBe('compared');
  });

  it('reads a CSV file that needs the general parser (quoted fields)', () => {
    const file = path.join(repo, 'data', 'press-train.csv');
    const text = readFileSync(file, 'utf8').split('\n');
    // Quote every field of the first data row: same numbers, but only the general parser reads quotes.
    text[1] = text[1]
      .split(',')
      .map((cell) => `"${cell}"`)
      .join(',');
    writeFileSync(file, text.join('\n'));
    const run = cli(['check', 'models/press-yield.model.yml', '--format', 'json']);
    expect(run.status, run.stderr).toBe(0);
  });
});
