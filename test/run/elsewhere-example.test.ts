// The example of models trained elsewhere (examples/elsewhere, an invented parcel courier): the
// boosted-tree model whose predictions are a column fails the gap; the classifier whose
// probabilities are in keyed side files passes. Run through the command from the sources.
import { cpSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Result } from '../../src/result/result.js';
import { sourceCli } from '../entries/source-cli.js';

const dir = path.resolve(fileURLToPath(new URL('../../examples/elsewhere', import.meta.url)));

let cli: ReturnType<typeof sourceCli>;
beforeAll(() => {
  cli = sourceCli();
});
afterAll(() => cli?.remove());

describe('examples/elsewhere', () => {
  it('fails delivery-minutes on the gap, passes late-parcel, and says what was skipped and why', () => {
    const r = cli.run(['check', '--root', dir, '--format', 'json', '--jobs', '1'], dir);
    expect(r.status, r.stderr).toBe(1);
    const result = JSON.parse(r.stdout) as Result;
    const model = (name: string) => {
      const m = result.models.find((x) => x.name === name);
      if (!m) throw new Error(`no model ${name}`);
      return m;
    };
    const delivery = model('delivery-minutes');
    expect(delivery.kind).toBe('predictions');
    expect(delivery.verdict).toBe('fail');
    expect(delivery.checks.find((c) => c.id === 'generalisation-gap')?.status).toBe('fail');
    expect(delivery.checks.find((c) => c.id === 'holdout-rmse')?.status).toBe('pass');
    expect(delivery.checks.find((c) => c.id === 'leakage')?.status).toBe('pass');
    expect(delivery.checks.find((c) => c.id === 'cross-validation')?.code).toBe('cross-validation/needs-refit');
    const late = model('late-parcel');
    expect(late.kind).toBe('predictions');
    expect(late.verdict).toBe('pass');
    expect(late.metrics?.task).toBe('classification');
    expect(late.checks.find((c) => c.id === 'calibration-slope')?.status).toBe('pass');
    expect(late.checks.find((c) => c.id === 'events-per-parameter')?.status).toBe('pass');
    // The worker pool gives the same outcomes.
    const pooled = cli.run(['check', '--root', dir, '--format', 'json', '--jobs', '2'], dir);
    expect(JSON.parse(pooled.stdout).models).toEqual(result.models);
  });

  it('the text report marks both models and states the kind of the one that fails', () => {
    const r = cli.run(['check', '--root', dir, '--jobs', '1'], dir);
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('delivery-minutes (predictions)');
    expect(r.stdout).toContain('late-parcel (predictions)');
    expect(r.stdout).toContain('kind: trained elsewhere, gated from its predictions (48 stated parameters)');
  });

  it('fitgate refit keeps them as they are (nothing to refit)', () => {
    const copy = mkdtempSync(path.join(tmpdir(), 'fitgate-elsewhere-'));
    try {
      cpSync(dir, copy, { recursive: true });
      const before = readFileSync(path.join(copy, 'models/delivery-minutes.model.yml'), 'utf8');
      const r = cli.run(['refit', '--root', copy], copy);
      expect(r.status, r.stdout + r.stderr).toBe(0);
      expect(r.stdout).toContain('kept: models/delivery-minutes.model.yml: trained elsewhere (`predictions`), nothing to refit');
      expect(readFileSync(path.join(copy, 'models/delivery-minutes.model.yml'), 'utf8')).toBe(before);
    } finally {
      rmSync(copy, { recursive: true, force: true });
    }
  });
});
