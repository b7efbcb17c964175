// The published package: `npm pack` of a fresh bundle (built into a temporary folder, never into
// dist/), installed offline into an empty folder, and `npx fitgate` run there on a copy of the
// examples, as a user who installs it would. No network: the package has no run-time dependencies
// (ncc bundles them), so `npm install <tarball> --offline` needs nothing else.
import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, cpSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REPOSITORY_URL } from '../../src/core/links.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import type { Result } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';

const project = fileURLToPath(new URL('../..', import.meta.url));
const manifest = JSON.parse(readFileSync(path.join(project, 'package.json'), 'utf8')) as Record<string, unknown>;
const npmCli = process.platform === 'win32' ? 'npm.cmd' : 'npm';
const npxCli = process.platform === 'win32' ? 'npx.cmd' : 'npx';

let base: string;
let app: string;
let packed: { files: { path: string }[]; filename: string };

/** npm with a private cache and no network, no scripts, no audit. */
function npm(args: string[], cwd: string, command = npmCli) {
  const env = {
    ...process.env,
    npm_config_cache: path.join(base, 'npm-cache'),
    npm_config_offline: 'true',
    npm_config_audit: 'false',
    npm_config_fund: 'false',
    npm_config_update_notifier: 'false',
    NO_COLOR: '1',
  };
  return spawnSync(command, args, { cwd, env, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
}

beforeAll(() => {
  base = mkdtempSync(path.join(tmpdir(), 'fitgate-pack-'));
  const pkg = path.join(base, 'pkg');
  mkdirSync(pkg);
  for (const f of ['package.json', 'README.md', 'LICENSE']) copyFileSync(path.join(project, f), path.join(pkg, f));
  execFileSync(process.execPath, [path.join(project, 'test', 'tools', 'bundle.mjs'), '--out', path.join(pkg, 'dist'), '--cli-only'], {
    cwd: project,
    stdio: 'pipe',
  });
  const pack = npm(['pack', '--json', '--ignore-scripts', '--pack-destination', base], pkg);
  if (pack.status !== 0) throw new Error(`npm pack failed: ${pack.stderr}`);
  packed = (JSON.parse(pack.stdout) as (typeof packed)[])[0];
  app = path.join(base, 'app');
  mkdirSync(app);
  writeFileSync(path.join(app, 'package.json'), '{ "name": "app", "private": true }\n');
  const install = npm(['install', path.join(base, packed.filename), '--ignore-scripts', '--no-package-lock'], app);
  if (install.status !== 0) throw new Error(`npm install --offline failed: ${install.stderr}`);
  cpSync(path.join(project, 'examples'), path.join(app, 'cider'), { recursive: true });
}, 600_000);
afterAll(() => {
  if (base) rmSync(base, { recursive: true, force: true });
});

describe('the package', () => {
  it('is publishable: not private, a bin, only dist/ as files, an engines field, no run-time dependencies', () => {
    expect(manifest.private).toBeUndefined();
    expect(manifest.bin).toEqual({ fitgate: 'dist/cli/index.js' });
    expect(manifest.files).toEqual(['dist/']);
    expect(manifest.engines).toEqual({ node: '>=20' });
    expect(manifest.dependencies ?? {}).toEqual({});
    expect((manifest.repository as { url: string }).url).toBe(`git+${REPOSITORY_URL}.git`);
    // Node 20 is the oldest line the package says it runs on; this test runs on what CI runs.
    expect(Number(process.versions.node.split('.')[0])).toBeGreaterThanOrEqual(20);
  });

  it('packs only what runs: the bundle, its schemas, README, LICENSE and package.json', () => {
    const files = packed.files.map((f) => f.path).sort();
    expect(files).toContain('dist/cli/index.js');
    expect(files).toContain('dist/schema/descriptor.schema.json');
    expect(files).toContain('dist/schema/settings.schema.json');
    for (const f of ['README.md', 'LICENSE', 'package.json']) expect(files).toContain(f);
    for (const f of files) expect(f, f).toMatch(/^(dist\/|README\.md$|LICENSE$|package\.json$)/);
  });

  it('runs as `npx fitgate check` on a copy of the examples, as the sources do', async () => {
    const run = npm(['--offline', 'fitgate', 'check', '--root', 'cider', '--format', 'json', '--jobs', '1'], app, npxCli);
    expect(run.status, run.stderr).toBe(1);
    const installed = JSON.parse(run.stdout) as Result;
    const expected = await runPipeline(
      { root: path.join(app, 'cider'), config: 'fitgate.yml', configExplicit: false, descriptors: [], failOn: 'fail' },
      createFsRepository(path.join(app, 'cider')),
    );
    expect(installed.models.map((m) => [m.name, m.verdict, m.checks.map((c) => `${c.id}:${c.status}`)])).toEqual(
      expected.models.map((m) => [m.name, m.verdict, m.checks.map((c) => `${c.id}:${c.status}`)]),
    );
  });

  it('checks one model from inside the repository (exit 0) and prints its version', () => {
    const one = npm(['--offline', 'fitgate', 'check', 'models/press-yield.model.yml', '--jobs', '1'], path.join(app, 'cider'), npxCli);
    expect(one.status, one.stderr + one.stdout).toBe(0);
    expect(one.stdout).toContain('PASS: 1 model, 1 passed');
    const version = npm(['--offline', 'fitgate', '--version'], app, npxCli);
    expect(version.stdout).toBe(`${manifest.version}\n`);
  });
});
