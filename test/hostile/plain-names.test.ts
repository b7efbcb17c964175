/**
 * `__proto__`, `constructor` and `hasOwnProperty` are plain names everywhere: as column names they
 * reach every object keyed by column (chart medians, swing points, check details) and the JSON
 * report, and nothing changes an object's prototype.
 */
import { describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { formatJson } from '../../src/report/json.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { defaultSettings } from '../../src/run/settings.js';
import { SETTINGS } from './corpus/repo.js';

const NAMES = ['__proto__', 'constructor', 'hasOwnProperty'];

/** n rows of three inputs named NAMES and a target y = a + 2b - c + wobble. */
function table(n: number, x0: number): string {
  const lines = [`${NAMES.join(',')},y`];
  for (let i = 0; i < n; i++) {
    const [a, b, c] = [x0 + i, ((i * 7) % 11) + x0, ((i * 5) % 13) - x0];
    lines.push(`${a},${b},${c},${a + 2 * b - c + (((i * 3) % 5) - 2) * 0.1}`);
  }
  return `${lines.join('\n')}\n`;
}

describe('column names that are also names of Object.prototype', () => {
  it('are kept in chart medians, swing points and the JSON report', async () => {
    const repo = createMemoryRepository({
      'fitgate.yml': SETTINGS,
      'models/m.model.yml': `version: 1\nname: __proto__\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - linear: [__proto__, constructor, hasOwnProperty]\n`,
      'data/train.csv': table(40, 0),
      'data/holdout.csv': table(12, 0.5),
    });
    const result = await runPipeline(defaultSettings('/repo'), repo);
    const m = result.models[0];
    expect(m.error, m.error?.message).toBeNull();
    expect(m.name).toBe('__proto__');
    expect(m.columns).toEqual(['(intercept)', ...NAMES]);
    const partials = m.charts?.partials ?? [];
    expect(partials.map((p) => p.input)).toEqual(NAMES);
    for (const p of partials) expect(Object.keys(p.others).sort()).toEqual(NAMES.filter((n) => n !== p.input).sort());
    const json = JSON.parse(formatJson(result)) as { models: { charts: { partials: { others: Record<string, number> }[] } }[] };
    expect(Object.keys(json.models[0].charts.partials[1].others).sort()).toEqual(['__proto__', 'hasOwnProperty']);
    const swing = m.checks.find((c) => c.id === 'swing');
    expect(JSON.stringify(swing?.detail)).toContain('"__proto__"');
    expect(Object.getPrototypeOf({})).toBe(Object.prototype);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});
