// One model's part of the JSON report as UTF-8 bytes (report/json.ts `jsonModelBytes`, what the
// model spool writes) is exactly jsonModelReport's text encoded, and the piece of the whole report:
// runner commands, line separators and characters of 2 to 4 bytes inside strings included.
import { describe, expect, it } from 'vitest';
import { jsonBytesAt, jsonPiecesAt } from '../../src/core/json-pieces.js';
import { formatJson, jsonModelBytes, jsonModelReport } from '../../src/report/json.js';
import { awkwardResult } from './fixture.js';

describe('jsonModelBytes', () => {
  it('is the model text encoded, for models with hostile and multi-byte strings', () => {
    const result = awkwardResult();
    const models = result.models.map((m, i) => ({ ...m, name: `${m.name} ##[error]x\u2028::warning::é€😀 ${i}` }));
    expect(models.length).toBeGreaterThan(0);
    for (const model of models) {
      const text = [...jsonModelReport(model)].join('');
      const bytes = jsonModelBytes(model);
      expect(Buffer.from(bytes).toString('utf8')).toBe(text);
      expect(Buffer.from(text, 'utf8').equals(Buffer.from(bytes))).toBe(true);
      expect(text).not.toContain('##[');
      // It is the model's place in the whole report, byte for byte.
      expect(formatJson({ ...result, models: [model] })).toContain(`"models": [\n    ${text}\n  ]`);
    }
  });

  it('jsonBytesAt gives the text of jsonPiecesAt at every level', () => {
    const value = { a: [1, 2.5, null, 'x\u00e9'], b: { c: [] as number[], d: {} }, e: 'f' };
    for (const level of [0, 1, 2, 5]) {
      const text = [...jsonPiecesAt(value, level, { depth: 0 })].join('');
      expect(Buffer.from(jsonBytesAt(value, level)).toString('utf8'), `level ${level}`).toBe(text);
    }
  });
});
