// The category term end to end: text levels (numeric-looking text stays text), the reference
// level, indicator columns against an independent construction in Python (sorted levels, one
// indicator per non-reference level), unseen hold-out levels, and swing scanning level by level.
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { fitModel } from '../../src/run/fit-model.js';
import { runPythonJson } from '../tools/python-json.js';
import { requireTool, skipNote } from '../tools/require-tool.js';

const missing = requireTool(['python3-numpy']);
const SITES = ['north', 'south', '07', '7', 'south', 'north', 'north', 'east'];
const train = `site,x,y\n${Array.from({ length: 48 }, (_, i) => {
  const site = SITES[i % SITES.length];
  const effect = { north: 0, south: 2, '07': -1, '7': 1.5, east: 3 }[site] as number;
  return `${site === '07' ? '"07"' : site},${i % 11},${(5 + effect + 0.3 * (i % 11) + ((i * 7) % 5) * 0.01).toFixed(4)}`;
}).join('\n')}\n`;
const holdout = 'site,x,y\nsouth,3,8\n07,2,4.6\nnorth,5,6.5\n';

function repo(term: string, hold = holdout) {
  return createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../train.csv\n  holdout: ../holdout.csv\n  target: y\nterms:\n  - ${term}\n  - linear: [x]\n`,
    'train.csv': train,
    'holdout.csv': hold,
  });
}

async function fitSite(term: string, hold = holdout) {
  const r = repo(term, hold);
  const settings = defaultSettings();
  const d = await loadDescriptor(r, 'models/m.model.yml', settings);
  return { model: await fitModel(r, d, settings), result: () => evaluateModel(r, d, settings) };
}

const SCRIPT = `
import json, sys
import numpy as np
d = json.load(sys.stdin)
levels = sorted(set(d['train']))
counts = {l: d['train'].count(l) for l in levels}
ref = d['reference'] if d['reference'] is not None else max(levels, key=lambda l: (counts[l], -levels.index(l)))
kept = [l for l in levels if l != ref]
print(json.dumps({'names': kept, 'cols': [[1.0 if v == l else 0.0 for v in d['at']] for l in kept]}))
`;

describe.skipIf(missing !== null)(`category against an independent construction${skipNote(missing)}`, () => {
  for (const reference of [null, 'east']) {
    it(`indicator columns, reference ${reference ?? 'the most frequent level'}`, async () => {
      const { model } = await fitSite(reference === null ? 'category: { of: site }' : `category: { of: site, reference: ${reference} }`);
      const trainSites = train
        .trim()
        .split('\n')
        .slice(1)
        .map((l) => l.split(',')[0].replace(/"/g, ''));
      const ref = runPythonJson<{ names: string[]; cols: number[][] }>(SCRIPT, { train: trainSites, at: trainSites, reference });
      const { design, tables } = model;
      expect(design.columnNames.slice(1, -1)).toEqual(ref.names.map((l) => `site=${l}`));
      const n = tables.train.rows;
      const X = design.fill(tables.train.inputs, 0, n);
      ref.cols.forEach((col, j) => expect(Array.from(X.subarray((j + 1) * n, (j + 2) * n))).toEqual(col));
    });
  }
});

describe('category levels', () => {
  it('numeric-looking text is a level: 07 and 7 are two levels', async () => {
    const { model } = await fitSite('category: { of: site }');
    expect(model.design.columnNames).toEqual(['(intercept)', 'site=07', 'site=7', 'site=east', 'site=south', 'x']);
  });

  it('an unseen hold-out level is the model error naming level, file and line', async () => {
    const rp = repo('category: { of: site }', `${holdout}west,1,5\n`);
    const d = await loadDescriptor(rp, 'models/m.model.yml', defaultSettings());
    const r = await evaluateModel(rp, d, defaultSettings());
    expect(r.verdict).toBe('error');
    expect(r.error?.message).toContain('"west" on line 5 of holdout.csv');
    expect(r.error).toMatchObject({ code: 'unseen-level' });
  });

  it('unseen: zero predicts an unseen level as the reference level', async () => {
    const { model } = await fitSite('category: { of: site, unseen: zero }', `${holdout}west,5,6.5\n`);
    // The last hold-out row (west, x = 5) gets the reference (north) row's prediction at x = 5.
    expect(model.holdoutPredictions[3]).toBeCloseTo(model.holdoutPredictions[2], 12);
  });

  it('a reference that is not a training level is an error at the term', async () => {
    const r = repo('category: { of: site, reference: west }');
    const d = await loadDescriptor(r, 'models/m.model.yml', defaultSettings());
    await expect(fitModel(r, d, defaultSettings())).rejects.toMatchObject({ code: 'category-reference', location: { line: 8 } });
  });

  it('swing scans the category level by level, never between levels', async () => {
    const { result } = await fitSite('category: { of: site }');
    const r = await result();
    const detail = r.checks.find((c) => c.id === 'swing')?.detail as { curves: { input: string; x: number[] }[] } | undefined;
    const curves = detail?.curves ?? [];
    expect(curves.find((c) => c.input === 'site')?.x).toEqual([0, 1, 2, 3, 4]);
    expect(r.checks.find((c) => c.id === 'swing-spikes')?.status).not.toBe('fail');
  });

  it('the chart of a category input is drawn at its levels only, no margins, no points between levels', async () => {
    const { result } = await fitSite('category: { of: site }');
    const r = await result();
    const curve = r.charts?.partials.find((c) => c.input === 'site');
    expect(curve?.x).toEqual([0, 1, 2, 3, 4]);
    expect(curve?.y).toHaveLength(5);
  });

  it('a swing message names the category input by its level, not by its code', async () => {
    const rp = createMemoryRepository({
      'models/m.model.yml':
        'version: 1\nname: m\ndata:\n  train: ../train.csv\n  holdout: ../holdout.csv\n  target: y\nterms:\n  - category: { of: site }\n  - polynomial: { of: x, degree: 10 }\n',
      'train.csv': train,
      'holdout.csv': holdout,
    });
    const d = await loadDescriptor(rp, 'models/m.model.yml', defaultSettings());
    const r = await evaluateModel(rp, d, defaultSettings());
    // A degree-10 polynomial through 11 values of x leaves the band in the margins beyond them.
    const beyond = r.checks.find((c) => c.id === 'swing-beyond');
    expect(beyond?.message).toMatch(/leave the training target band .* at site = "(07|7|east|north|south)", x = /);
  });
});
