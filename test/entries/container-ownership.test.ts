// A job inside a container: the workspace belongs to another user id than the process, and git
// refuses it ("detected dubious ownership"). The comparison with the base commit must still work,
// through fitgate's own git calls only: the user's git configuration stays as it was.
// Making a folder another user's needs chown, i.e. root (or sudo without a password): without
// it the test skips locally and fails under CI=true (test/tools/require-tool.ts).
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { skipNote, skipOrThrow } from '../tools/require-tool.js';
import { sourceCli } from './source-cli.js';
import { greenhouse } from './small-repo.js';

/** A user id that owns nothing else here. */
const OTHER_UID = 54321;

function chownCommand(): string[] | null {
  if (process.getuid?.() === 0) return ['chown'];
  const probe = spawnSync('sudo', ['-n', 'true'], { stdio: 'ignore' });
  return probe.status === 0 ? ['sudo', '-n', 'chown'] : null;
}

const chown = chownCommand();
const missing = skipOrThrow(
  chown === null ? ['making a folder owned by another user id needs root or passwordless sudo (chown)'] : [],
  process.env,
);

describe.skipIf(missing !== null)(`a repository owned by another user id${skipNote(missing)}`, () => {
  let cli: ReturnType<typeof sourceCli>;
  let repo: ReturnType<typeof greenhouse>;
  let home: string;
  const env = () => ({ HOME: home, XDG_CONFIG_HOME: path.join(home, '.config'), GIT_CONFIG_NOSYSTEM: '1' });

  beforeAll(() => {
    cli = sourceCli();
    repo = greenhouse('limits: { params_per_sample: 0.2 }');
    home = path.join(repo.dir, '..', `${path.basename(repo.dir)}-home`);
    mkdirSync(home);
    const gitEnv = {
      ...process.env,
      ...env(),
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
      execFileSync('git', args, { cwd: repo.dir, env: gitEnv, stdio: 'pipe' });
    const [command, ...rest] = chown ?? [];
    execFileSync(command, [...rest, '-R', `${OTHER_UID}:${OTHER_UID}`, repo.dir]);
  });
  afterAll(() => {
    cli?.remove();
    if (repo && chown && process.getuid?.() !== 0)
      spawnSync('sudo', ['-n', 'chown', '-R', `${process.getuid?.()}:${process.getgid?.()}`, repo.dir]);
    repo?.remove();
  });

  it('git itself refuses the repository (the situation is real)', () => {
    const plain = spawnSync('git', ['rev-parse', 'HEAD'], { cwd: repo.dir, env: { ...process.env, ...env() }, encoding: 'utf8' });
    expect(plain.status).not.toBe(0);
    expect(plain.stderr).toContain('dubious ownership');
  });

  it('still compares with the base commit, and leaves the git configuration as it was', () => {
    const r = cli.run(['check', '--jobs', '1', '--base', 'HEAD'], repo.dir, env());
    expect(r.status, r.stdout + r.stderr).toBe(0);
    expect(r.stdout).not.toContain('not available');
    const [header, row] = r.stdout.split('\n');
    expect(header).toMatch(/vs base$/);
    expect(row).toMatch(/ 0%$/);
    // Nothing was written to the user's configuration, and git still refuses the folder on its own.
    expect(existsSync(path.join(home, '.gitconfig'))).toBe(false);
    expect(existsSync(path.join(home, '.config', 'git', 'config'))).toBe(false);
    const plain = spawnSync('git', ['rev-parse', 'HEAD'], { cwd: repo.dir, env: { ...process.env, ...env() }, encoding: 'utf8' });
    expect(plain.stderr).toContain('dubious ownership');
  });
});
