import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ACTION_FETCH_HINT, evaluateBase } from '../../src/action/base-commit.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { fromJsonNumber } from '../../src/result/result.js';
import type { Settings } from '../../src/run/settings.js';
import { makeFixture, type Fixture } from './fixture.js';

let fixture: Fixture;
let settings: Settings;

beforeAll(() => {
  fixture = makeFixture();
  settings = { root: path.join(fixture.workspace, 'ml'), config: 'fitgate.yml', configExplicit: false, descriptors: [], failOn: 'fail' };
});

describe('evaluateBase', () => {
  it('checks the models as they were on the base commit, in a sub-folder of the git repository', async () => {
    const options = await evaluateBase(settings, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    expect(options.notes).toEqual([]);
    expect(options.baseCommit).toBe(fixture.baseSha);
    expect([...(options.baseline?.keys() ?? [])].sort()).toEqual(['lean', 'steady', 'wide']);
    // On the base, `wide` has degree 2: 3 parameters.
    expect(options.baseline?.get('wide')?.parameters).toBe(3);
  });

  it('feeds the head run: new models, changes, and the base_change limit', async () => {
    const options = await evaluateBase(settings, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    const result = await runPipeline(settings, createFsRepository(settings.root), options);
    const byName = new Map(result.models.map((m) => [m.name, m]));
    expect(byName.get('fresh')?.base?.status).toBe('new');
    const steady = byName.get('steady')!;
    expect(steady.base?.status).toBe('compared');
    const head = fromJsonNumber(steady.metrics!.holdout_rmse);
    const base = fromJsonNumber(steady.base!.holdout_rmse!);
    const change = fromJsonNumber(steady.base!.holdout_rmse_change!);
    expect(Math.abs(change - (head - base) / base), `head ${head}, base ${base}, change ${change}`).toBeLessThan(1e-12);
    const check = steady.checks.find((c) => c.id === 'base-change')!;
    expect(check.status).toBe('fail');
    expect(fromJsonNumber(check.value)).toBeCloseTo(change, 12);
    expect(check.line).toBe(11);
    // Without a limit the check is off for the other models.
    expect(byName.get('wide')?.checks.find((c) => c.id === 'base-change')?.status).toBe('skipped');
    expect(byName.get('fresh')?.checks.find((c) => c.id === 'base-change')?.code).toBe('base-change/no-base');
  });

  it('says once that a commit git does not have is not available', async () => {
    const options = await evaluateBase(settings, 'a'.repeat(40), { fetchHint: ACTION_FETCH_HINT });
    expect(options).toEqual({ notes: [`base commit aaaaaaa is not available; ${ACTION_FETCH_HINT}`] });
  });

  it('says so when the root is not in a git work tree', async () => {
    const lonely = mkdtempSync(path.join(tmpdir(), 'fitgate-nogit-'));
    const options = await evaluateBase({ ...settings, root: lonely }, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    expect(options.baseline).toBeUndefined();
    expect(options.notes?.[0]).toMatch(/^base commit [0-9a-f]{7} is not available: .* is not inside a git work tree\./);
  });

  it('treats every model as new when the named settings file did not exist on the base', async () => {
    const options = await evaluateBase({ ...settings, config: 'lean-only.yml', configExplicit: true }, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    expect(options.baseline?.size).toBe(0);
    expect(options.notes).toEqual([]);
  });

  it('leaves out named descriptors that are new in the head', async () => {
    const options = await evaluateBase({ ...settings, descriptors: ['models/fresh.model.yml', 'models/wide.model.yml'] }, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    expect([...(options.baseline?.keys() ?? [])]).toEqual(['wide']);
  });
});
