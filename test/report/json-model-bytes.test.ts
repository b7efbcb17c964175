// One model's part of the JSON report as UTF-8 bytes (report/json.ts `jsonModelBytes`, what the
// model spool writes) is exactly the model's place in the whole report: runner commands, line
// separators and characters of 2 to 4 bytes inside strings included.
import { describe, expect, it } from 'vitest';
import { jsonBytesAt, jsonPieces } from '../../src/core/json-pieces.js';
import { formatJson, jsonModelBytes } from '../../src/report/json.js';
import { awkwardResult } from './fixture.js';

describe('jsonModelBytes', () => {
  it("is the model's text in the whole report, for models with hostile and multi-byte strings", () => {
    const result = awkwardResult();
    const models = result.models.map((m, i) => ({ ...m, name: `${m.name} ##[error]x\u2028::warning::é€😀 ${i}` }));
    expect(models.length).toBeGreaterThan(0);
    for (const model of models) {
      const whole = formatJson({ ...result, models: [model] });
      const text = whole.split('\n  "models": [\n    ')[1].split('\n  ],\n')[0];
      const bytes = jsonModelBytes(model);
      expect(Buffer.from(text, 'utf8').equals(Buffer.from(bytes))).toBe(true);
      expect(text).not.toContain('##[');
      expect(text).not.toContain('\u2028');
    }
  });

  it('jsonBytesAt gives the value stringified with every line after the first indented `level` more steps', () => {
    const value = { a: [1, 2.5, null, 'x\u00e9'], b: { c: [] as number[], d: {} }, e: 'f' };
    for (const level of [0, 1, 2, 5]) {
      const text = JSON.stringify(value, null, 2).replaceAll('\n', `\n${'  '.repeat(level)}`);
      expect(Buffer.from(jsonBytesAt(value, level)).toString('utf8'), `level ${level}`).toBe(text);
      // At level 0 it is what jsonPieces writes for the value alone.
      if (level === 0) expect([...jsonPieces(value)].join('')).toBe(text);
    }
  });
});
