/**
 * Files fitgate writes and the folder it reads, against a pull request that plants symbolic
 * links: every report target that is a link, every report folder that leads out of the
 * repository, and a root folder replaced by a link to its parent are refused with an error
 * naming the option, through the built CLI (run in the repository, as a CI step does) and the
 * action; nothing outside is written, and every other report is still written.
 */
import { existsSync, lstatSync, mkdirSync, readdirSync, readFileSync, rmSync, symlinkSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { repo } from './corpus/repo.js';
import {
  foreignCommands,
  prepareBundles,
  runAction,
  runCli,
  runnerCommands,
  SECRET,
  writeCase,
  type CaseDirs,
  type FileSpec,
  type Run,
} from './harness.js';

const written: CaseDirs[] = [];
function write(files: Record<string, FileSpec>, label: string): CaseDirs {
  const dirs = writeCase(files, label);
  written.push(dirs);
  return dirs;
}

/** The files of the outside folder, with their contents: must be as writeCase made them. */
function outsideState(dirs: CaseDirs): Record<string, string> {
  return Object.fromEntries(readdirSync(dirs.outside).map((f) => [f, readFileSync(path.join(dirs.outside, f), 'utf8')]));
}

function show(run: Run): string {
  return `status ${run.status}\n--- stdout\n${run.stdout.slice(0, 3000)}\n--- stderr\n${run.stderr.slice(0, 3000)}`;
}

beforeAll(() => {
  prepareBundles();
}, 240_000);

afterAll(() => {
  for (const dirs of written) rmSync(dirs.base, { recursive: true, force: true });
});

describe('a report target that is a link, or a report folder leading out, is refused (item 1)', () => {
  // One repository with every trap: `out.txt` and `junit.xml` link to a file outside, `site` is a
  // link to the outside folder, `up` is a link to the repository's parent.
  const traps = (): Record<string, FileSpec> =>
    repo({
      'out.txt': { link: '$OUTSIDE/plain.txt' },
      'junit.xml': { link: '$OUTSIDE/plain.txt' },
      site: { link: '$OUTSIDE' },
      up: { link: '..' },
    });

  it('CLI, run in the repository: --out, --html, --sarif and --junit each refused by name, exit 2, nothing written outside', async () => {
    const dirs = write(traps(), 'writes-cli');
    const before = outsideState(dirs);
    const run = await runCli(
      dirs,
      ['--out', 'out.txt', '--html', 'site', '--sarif', 'up/outside/x.sarif', '--junit', 'junit.xml'],
      30_000,
      'check',
      dirs.repo,
    );
    expect(run.status, show(run)).toBe(2);
    const lines = run.stderr.trim().split('\n');
    expect(lines, show(run)).toEqual([
      `fitgate: \`--out\`: ${path.join(dirs.repo, 'out.txt')} is a symbolic link; fitgate never writes through a link (remove it, or name another file)`,
      `fitgate: \`--html\`: ${path.join(dirs.repo, 'site')} leads out of ${dirs.repo} through a symbolic link; expected a folder whose real path is inside it`,
      `fitgate: \`--sarif\`: ${path.join(dirs.repo, 'up', 'outside')} leads out of ${dirs.repo} through a symbolic link; expected a folder whose real path is inside it`,
      `fitgate: \`--junit\`: ${path.join(dirs.repo, 'junit.xml')} is a symbolic link; fitgate never writes through a link (remove it, or name another file)`,
    ]);
    expect(outsideState(dirs)).toEqual(before);
    for (const link of ['out.txt', 'junit.xml', 'site', 'up'])
      expect(lstatSync(path.join(dirs.repo, link)).isSymbolicLink(), link).toBe(true);
  });

  it('CLI: a refused report does not stop the others (the SARIF file next to a refused JUnit link is written)', async () => {
    const dirs = write(traps(), 'writes-cli-others');
    const run = await runCli(
      dirs,
      ['--sarif', 'reports/x.sarif', '--junit', 'junit.xml', '--html', 'reports/html'],
      30_000,
      'check',
      dirs.repo,
    );
    expect(run.status, show(run)).toBe(2);
    expect(run.stderr).toContain('`--junit`');
    expect(JSON.parse(readFileSync(path.join(dirs.repo, 'reports/x.sarif'), 'utf8')).version).toBe('2.1.0');
    expect(readFileSync(path.join(dirs.repo, 'reports/html/index.html'), 'utf8')).toContain('<!DOCTYPE html>');
    expect(run.stdout).toContain('PASS');
  });

  it('action: html, sarif and junit each refused by name; the step fails as bad input after every other reporter ran', async () => {
    const dirs = write(traps(), 'writes-action');
    const before = outsideState(dirs);
    const run = await runAction(dirs, { html: 'site', sarif: 'up/outside/x.sarif', junit: 'junit.xml' });
    expect(run.status, show(run)).toBe(1);
    expect(run.outputs.verdict).toBe('error');
    const refused = run.stdout.split('\n').filter((l) => l.startsWith('::error title=fitgate::a report file was refused'));
    expect(
      refused.map((l) => /`(\w+)`/.exec(l)?.[1]),
      show(run),
    ).toEqual(['html', 'sarif', 'junit']);
    expect(refused[0]).toContain('site leads out of');
    expect(refused[2]).toContain('junit.xml is a symbolic link');
    expect(run.stdout).toContain('::error::fitgate refused to write 3 report files (see the errors above).');
    // The rest of the run: the JSON report, the job summary, the outputs.
    expect(JSON.parse(run.report).verdict).toBe('pass');
    expect(run.summary).toContain('**pass**: every model within its limits');
    expect(foreignCommands(run.stdout), show(run)).toEqual([]);
    expect(outsideState(dirs)).toEqual(before);
  });

  it('action: the JSON report under RUNNER_TEMP is not written through a link placed there', async () => {
    const dirs = write(repo(), 'writes-runner-temp');
    const temp = path.join(dirs.base, 'runner', 'temp');
    mkdirSync(temp, { recursive: true });
    symlinkSync(path.join(dirs.outside, 'plain.txt'), path.join(temp, 'fitgate-report-fitgate.json'));
    const run = await runAction(dirs);
    expect(run.status, show(run)).toBe(1);
    expect(run.outputs.verdict).toBe('error');
    expect(run.stdout).toContain('`RUNNER_TEMP`: ');
    expect(run.stdout).toContain('fitgate-report-fitgate.json is a symbolic link');
    expect(readFileSync(path.join(dirs.outside, 'plain.txt'), 'utf8')).toBe(`${SECRET}\n`);
    expect(run.summary).toContain('**pass**: every model within its limits');
  });

  it('action: reports inside the workspace, through a link that stays inside, are written', async () => {
    const dirs = write(repo({ 'out/.keep': '', alias: { link: 'out' } }), 'writes-action-ok');
    const run = await runAction(dirs, { html: 'alias/html', sarif: 'alias/x.sarif', junit: 'out/deeper/x.xml' });
    expect(run.status, show(run)).toBe(0);
    expect(run.outputs.verdict).toBe('pass');
    expect(existsSync(path.join(dirs.repo, 'out/html/index.html'))).toBe(true);
    expect(existsSync(path.join(dirs.repo, 'out/x.sarif'))).toBe(true);
    expect(readFileSync(path.join(dirs.repo, 'out/deeper/x.xml'), 'utf8')).toContain('<testsuites');
  });
});

describe('the repository root is its real path, inside the workspace (item 2)', () => {
  it('action: working-directory replaced by a link to the parent is refused, naming the input, nothing read', async () => {
    const dirs = write(repo({ ml: { link: '..' } }), 'root-action');
    const run = await runAction(dirs, { 'working-directory': 'ml' });
    expect(run.status, show(run)).toBe(1);
    expect(run.outputs.verdict).toBe('error');
    expect(run.stdout).toContain(
      `::error::fitgate could not run: \`working-directory\`: ${path.join(dirs.repo, 'ml')} leads out of the workspace ${dirs.repo} through a symbolic link; expected a folder whose real path is inside it`,
    );
    expect(run.stdout).not.toContain(SECRET);
    expect(run.report).toBe('');
  });

  it('CLI, run in the repository: --root replaced by a link to the parent is refused, naming the option', async () => {
    const dirs = write(repo({ ml: { link: '..' } }), 'root-cli');
    const run = await runCli(dirs, ['--root', 'ml'], 20_000, 'check', dirs.repo);
    expect(run.status, show(run)).toBe(2);
    expect(run.stderr).toBe(
      `fitgate: \`--root\`: ${path.join(dirs.repo, 'ml')} leads out of the working directory ${dirs.repo} through a symbolic link; expected a folder whose real path is inside it\n`,
    );
    expect(run.stdout).toBe('');
  });

  it('a root reached through a link that stays inside is checked at its real path (annotations point at the real files)', async () => {
    const dirs = write(
      {
        'real/fitgate.yml': 'version: 1\nmodels: ["models/*.model.yml"]\nlimits:\n  params_per_sample: { warn: 0.01, fail: 0.5 }\n',
        ...prefixed('real/', repo()),
        ml: { link: 'real' },
      },
      'root-inside',
    );
    const action = await runAction(dirs, { 'working-directory': 'ml' });
    expect(action.status, show(action)).toBe(0);
    expect(action.stdout).toMatch(/^::warning file=real\/models\/m\.model\.yml,/m);
    const cli = await runCli(dirs, ['--root', 'ml', 'ml/models/m.model.yml'], 20_000, 'check', dirs.repo);
    expect(cli.status, show(cli)).toBe(0);
    expect(runnerCommands(cli.stdout)).toEqual([]);
  });
});

/** The files of a repository moved under `prefix`. */
function prefixed(prefix: string, files: Record<string, FileSpec>): Record<string, FileSpec> {
  return Object.fromEntries(
    Object.entries(files)
      .filter(([name]) => name !== 'fitgate.yml')
      .map(([name, spec]) => [`${prefix}${name}`, spec]),
  );
}
