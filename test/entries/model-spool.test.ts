// Models' JSON text kept as strings while the run goes on (entries/model-spool.ts): the report written
// from the small copies and the spooled text is the report of the whole outcomes, byte for byte.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { openModelSpool, smallCopy } from '../../src/entries/model-spool.js';
import { formatJson, jsonReport } from '../../src/report/json.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import type { ModelResult } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

const examples = (name: string): string => path.resolve(fileURLToPath(new URL(`../../examples/${name}`, import.meta.url)));

describe('the model spool', () => {
  for (const name of ['', 'classifiers', 'parts']) {
    it(`writes the same JSON report as the whole outcomes (examples/${name})`, async () => {
      const dir = examples(name);
      const whole = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
      const spool = openModelSpool();
      const kept: ModelResult[] = [];
      const small = await runPipeline(defaultSettings(dir), createFsRepository(dir), {
        jobs: 1,
        onModel: (model) => {
          const copy = spool.keep(model);
          kept.push(copy);
          return copy;
        },
      });
      try {
        expect(kept).toHaveLength(whole.models.length);
        // The copies keep no chart data and no check detail; the verdicts and counts are the same.
        for (const m of small.models) {
          expect(m.charts).toBeUndefined();
          expect(m.classifier_charts).toBeUndefined();
          expect(m.checks.every((c) => c.detail === undefined)).toBe(true);
        }
        expect(small.counts).toEqual(whole.counts);
        expect(small.verdict).toBe(whole.verdict);
        expect(whole.models.some((m) => m.charts !== undefined || m.classifier_charts !== undefined)).toBe(true);
        const text = [...jsonReport(small, { modelText: spool.text })].join('');
        expect(text).toBe(formatJson(whole));
        expect(text).toBe([...jsonReport(whole)].join(''));
        // Without the spool's text, the small copies are what is written.
        expect([...jsonReport(small)].join('')).toBe(formatJson(small));
      } finally {
        spool.close();
      }
    });
  }

  it('keeps runner commands and raw line separators out of the text written earlier, as the whole report does', async () => {
    const dir = examples('');
    const whole = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
    const hostile = { ...whole, models: whole.models.map((m) => ({ ...m, name: `${m.name}\n##[error]x\u2028::warning::y` })) };
    const spool = openModelSpool();
    try {
      const small = { ...hostile, models: hostile.models.map((m) => spool.keep(m)) };
      const text = [...jsonReport(small, { modelText: spool.text })].join('');
      expect(text).toBe(formatJson(hostile));
      expect(text).not.toContain('##[');
      expect(text).not.toContain('\u2028');
      expect(JSON.parse(text).models.map((m: ModelResult) => m.name)).toEqual(hostile.models.map((m) => m.name));
    } finally {
      spool.close();
    }
  });

  it('drops only chart data and check detail from the copy, and drops its texts when closed', async () => {
    const dir = examples('');
    const result = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
    const model = result.models.find((m) => m.charts !== undefined);
    if (model === undefined) throw new Error('no model with charts in examples/');
    const copy = smallCopy(model);
    const { charts: _charts, ...rest } = model;
    expect(copy).toEqual({ ...rest, checks: model.checks.map(({ detail: _detail, ...c }) => c) });
    expect(model.charts).toBeDefined();
    const spool = openModelSpool();
    const kept = spool.keep(model);
    const written = spool.text(kept);
    expect(written === undefined ? undefined : [...written].join('')).toBe(
      formatJson({ ...result, models: [model] })
        .split('\n  "models": [\n    ')[1]
        .split('\n  ],\n')[0],
    );
    expect(spool.text(model)).toBeUndefined();
    spool.close();
    spool.close();
    expect(spool.text(kept)).toBeUndefined();
    expect(spool.keep(model)).toBe(model);
  });
});
