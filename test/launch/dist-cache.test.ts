// The shipped CLI (dist/cli/): its code cache is the one made for its core.js, V8 takes it when
// this Node.js is the one that made it, and a run gives the same report with the cache, without
// it, and with a damaged one.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { currentRuntime, readCodeCache } from '../../src/launch/code-cache.js';
import { coreId } from '../../src/launch/core-script.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const cli = path.join(root, 'dist', 'cli');
const work = mkdtempSync(path.join(tmpdir(), 'fitgate-dist-cache-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** A copy of dist/cli with its cache file changed by `edit` (null: removed). */
function copyWith(name: string, edit: ((cache: Buffer) => Buffer) | null): string {
  const dir = path.join(work, name);
  cpSync(cli, dir, { recursive: true });
  const cacheFile = path.join(dir, 'core.cache');
  if (edit === null) rmSync(cacheFile);
  else writeFileSync(cacheFile, edit(readFileSync(cacheFile)));
  return dir;
}

function check(dir: string): { status: number | null; stdout: string; cache: string } {
  const run = spawnSync(process.execPath, [path.join(dir, 'index.js'), 'check', '--root', path.join(root, 'examples'), '--format', 'json', '--jobs', '1'], {
    cwd: work,
    encoding: 'utf8',
    env: { PATH: process.env.PATH, HOME: process.env.HOME, NODE_DEBUG: 'fitgate' },
  });
  return { status: run.status, stdout: run.stdout, cache: /code cache: (.*)/.exec(run.stderr)?.[1] ?? `(none) ${run.stderr}` };
}

describe('the shipped code cache', () => {
  const lookup = readCodeCache(readFileSync(path.join(cli, 'core.cache')), readFileSync(path.join(cli, 'core.js')), null);

  it('was made for the shipped core.js, which the build named by the SHA-256 of its text', () => {
    expect(lookup.data === null ? lookup.reason : 'fits').toBe('fits');
    const core = readFileSync(path.join(cli, 'core.js'), 'utf8');
    const id = coreId(Buffer.from(core));
    expect(id).toMatch(/^[0-9a-f]{64}$/);
    expect(createHash('sha256').update(core.replace(`// fitgate core ${id}\n`, '// fitgate core \n'), 'utf8').digest('hex')).toBe(id);
  });

  it('is taken by V8 when this Node.js made it, and passed over otherwise', () => {
    const here = currentRuntime();
    const made = lookup.data === null ? null : lookup.runtime;
    const outcome = check(cli).cache;
    if (made !== null && made.v8 === here.v8 && made.arch === here.arch) expect(outcome).toBe('accepted');
    else expect(outcome).toMatch(/^made for V8 .* this is V8 /);
  });

  it('gives the same report as a run without it and one with a damaged cache', () => {
    const shipped = check(cli);
    expect(shipped.status).toBe(1);
    expect(JSON.parse(shipped.stdout).models.length).toBeGreaterThan(1);
    const without = check(copyWith('without', null));
    expect(without.cache).toBe('no code cache file');
    expect(without.stdout).toBe(shipped.stdout);
    const damaged = check(
      copyWith('damaged', (cache) => {
        const copy = Buffer.from(cache);
        copy[copy.length - 1000] ^= 0x5a;
        return copy;
      }),
    );
    expect(damaged.cache).toMatch(/^(rejected by V8|made for V8 .*)$/);
    expect(damaged.stdout).toBe(shipped.stdout);
  });
});

describe('the launcher', () => {
  it('ends with status 2 and says why when the core is missing', () => {
    const dir = copyWith('no-core', (cache) => cache);
    rmSync(path.join(dir, 'core.js'));
    const run = spawnSync(process.execPath, [path.join(dir, 'index.js'), '--version'], { encoding: 'utf8' });
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/^fitgate: cannot start: ENOENT: no such file or directory, open '.*core\.js'\n$/);
  });
});
