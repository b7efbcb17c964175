/**
 * Messages quote at most about 80 characters of any piece of user text: names of columns, files,
 * keys and models, cells, headers, paths and patterns. Each repository below puts a 5,000-character
 * piece of text in one place; every message of the run (the error that stops it, each model's
 * error, each check's message and advice, each note) must hold no run of it longer than 80.
 */
import { describe, expect, it } from 'vitest';
import { errorMessage } from '../../src/core/errors.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import type { Result } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';
import { descriptor, HOLDOUT, rows, SETTINGS, TRAIN } from './corpus/repo.js';

/** The long piece of user text: a run of one letter no message of fitgate's own has. */
const LONG = 'q'.repeat(5000);
/** The longest run of it a message may hold (the cut adds an ellipsis). */
const MAX_RUN = 80;

/** Every message a run produced (or the one that stopped it). */
async function messages(files: Record<string, string>): Promise<string[]> {
  let result: Result;
  try {
    result = await runPipeline(defaultSettings('/repo'), createMemoryRepository(files));
  } catch (error) {
    return [errorMessage(error)];
  }
  const out = [...result.notes];
  for (const m of result.models) {
    if (m.error) out.push(m.error.message);
    for (const c of m.checks) out.push(c.message, c.advice, c.suggestion?.text ?? '');
  }
  return out;
}

/** The longest run of `q` in any of the texts. */
function longestRun(texts: string[]): number {
  return Math.max(0, ...texts.map((t) => Math.max(0, ...(t.match(/q+/g) ?? []).map((r) => r.length))));
}

const base = { 'fitgate.yml': SETTINGS, 'models/m.model.yml': descriptor(), 'data/train.csv': TRAIN, 'data/holdout.csv': HOLDOUT };

const CASES: Array<[string, Record<string, string>]> = [
  ['a target column the files lack', { ...base, 'models/m.model.yml': descriptor({ target: LONG }) }],
  ['an input column the files lack', { ...base, 'models/m.model.yml': descriptor({ terms: `  - linear: [${LONG}]\n` }) }],
  [
    'a long column name that is used (check messages name columns)',
    {
      ...base,
      'data/train.csv': TRAIN.replace('x,y', `${LONG},y`),
      'data/holdout.csv': HOLDOUT.replace('x,y', `${LONG},y`),
      'models/m.model.yml': descriptor({ terms: `  - polynomial: { of: ${LONG}, degree: 3 }\n` }),
    },
  ],
  ['a header name given twice', { ...base, 'data/train.csv': rows(30, 0, 1, `${LONG},${LONG}`) }],
  ['a data path that names no file', { ...base, 'models/m.model.yml': descriptor({ train: `../data/${LONG}.csv` }) }],
  ['a data path that leaves the repository', { ...base, 'models/m.model.yml': descriptor({ train: `../../${LONG}.csv` }) }],
  ['a descriptor file name (named by a duplicate model name)', { ...base, [`models/a${LONG.slice(0, 200)}.model.yml`]: descriptor() }],
  ['a pattern that matches nothing', { ...base, 'fitgate.yml': `version: 1\nmodels: ["${LONG.slice(0, 900)}/*.model.yml"]\n` }],
  ['a pattern over the length cap', { ...base, 'fitgate.yml': `version: 1\nmodels: ["${LONG}"]\n` }],
  ['a pattern with a .. segment', { ...base, 'fitgate.yml': `version: 1\nmodels: ["${LONG.slice(0, 900)}/../../x.yml"]\n` }],
  // YAML keys are at most 1024 characters.
  ['an unknown descriptor key', { ...base, 'models/m.model.yml': `${descriptor()}${LONG.slice(0, 1000)}: 1\n` }],
  [
    'a key given twice',
    { ...base, 'models/m.model.yml': `${descriptor()}limits:\n  ${LONG.slice(0, 1000)}: 1\n  ${LONG.slice(0, 1000)}: 2\n` },
  ],
  ['a wrong value', { ...base, 'models/m.model.yml': descriptor({ terms: `  - polynomial: { of: x, degree: ${LONG} }\n` }) }],
  ['a text cell', { ...base, 'data/train.csv': TRAIN.replace('\n3,', `\n${LONG},`) }],
  ['a semicolon-separated header', { ...base, 'data/train.csv': `${LONG};y\n1;2\n` }],
  ['a .yaml descriptor beside the .yml ones', { ...base, [`models/${LONG.slice(0, 200)}.model.yaml`]: descriptor({ name: 'n' }) }],
];

describe('messages cut user text to about 80 characters', () => {
  it.each(CASES)('%s', async (_, files) => {
    const texts = await messages(files);
    expect(texts.join('\n'), 'the run produced no message at all').toMatch(/q/);
    expect(longestRun(texts), texts.join('\n').slice(0, 2000)).toBeLessThanOrEqual(MAX_RUN);
  });
});
