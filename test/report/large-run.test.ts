// Reports of any size: every reporter completes on a run of 10,000 models and on 1,000 models of
// 5 inputs and 5,000 rows, the file reports are written piece by piece and parse back, the
// summary and the comment stay under GitHub's limits, and a model's chart data is bounded
// whatever its number of inputs. ModelResults are built in memory (no fitting) except one real
// model of 5 inputs that is copied.
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeFileSafely } from '../../src/entries/safe-write.js';
import { formatAnnotations } from '../../src/report/annotations.js';
import { htmlReport } from '../../src/report/html.js';
import { formatJson, jsonReport } from '../../src/report/json.js';
import { junitReport } from '../../src/report/junit.js';
import { formatMarkdown } from '../../src/report/markdown.js';
import { formatSarif, sarifReport } from '../../src/report/sarif.js';
import { COMMENT_MAX_BYTES, formatComment, formatSummary, SUMMARY_MAX_BYTES } from '../../src/report/summary.js';
import { formatText } from '../../src/report/text.js';
import { summarise, type ModelResult, type Result } from '../../src/result/result.js';
import { MAX_PARTIAL_CURVES, MAX_SERIES_NUMBERS } from '../../src/result/chart-types.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';
import { check, model } from '../action/result-fixture.js';

const dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-large-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** 10,000 tiny models: passing, warning, failing (two checks over) and a few that could not be checked. */
function tenThousand(): Result {
  const models: ModelResult[] = [];
  for (let i = 0; i < 10_000; i++) {
    const name = `model-${String(i).padStart(5, '0')}`;
    if (i % 97 === 0) {
      models.push(
        model({
          name,
          verdict: 'error',
          metrics: null,
          error: { message: `bad cell on line ${i}`, file: `data/${name}.csv`, line: i + 2, code: 'csv-cell' },
        }),
      );
      continue;
    }
    const verdict = i % 3 === 0 ? 'fail' : i % 3 === 1 ? 'warn' : 'pass';
    models.push(
      model({
        name,
        verdict,
        checks: [
          check({ id: 'generalisation-gap', status: verdict === 'fail' ? 'fail' : 'pass', value: 1 + i / 10_000 }),
          check({ id: 'parameter-ratio', status: verdict === 'warn' ? 'warn' : 'pass', value: 0.2 }),
          check({ id: 'swing', status: verdict === 'fail' ? 'fail' : 'skipped', value: verdict === 'fail' ? 'Infinity' : null }),
        ],
      }),
    );
  }
  return summarise(models, '0.1.0', ['a note about the run']);
}

/** Writes the pieces to a file of `dir` and returns its text. */
function written(name: string, pieces: Iterable<string>): string {
  const file = path.join(dir, name);
  writeFileSafely(file, pieces, { option: '--out', within: [] });
  return readFileSync(file, 'utf8');
}

describe('a run of 10,000 models', () => {
  const result = tenThousand();

  it('writes the JSON report piece by piece, the same bytes as one JSON.stringify, and it parses back', () => {
    const text = written('report.json', jsonReport(result));
    expect(text).toBe(formatJson(result));
    expect(JSON.parse(text)).toEqual(JSON.parse(JSON.stringify(result)));
  });

  it('writes the HTML page, SARIF log and JUnit XML with every model, and the logs parse', () => {
    const html = written('index.html', htmlReport(result));
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html.trimEnd().endsWith('</html>')).toBe(true);
    expect(html.match(/<section class="model"/g)?.length).toBe(10_000);
    const sarif = written('report.sarif', sarifReport(result));
    expect(sarif).toBe(formatSarif(result));
    const log = JSON.parse(sarif) as { runs: { results: unknown[]; invocations: { toolExecutionNotifications?: unknown[] }[] }[] };
    const failing = result.models.filter((m) => m.verdict === 'fail').length;
    const warning = result.models.filter((m) => m.verdict === 'warn').length;
    expect(log.runs[0].results.length).toBe(2 * failing + warning);
    expect(log.runs[0].invocations[0].toolExecutionNotifications?.length).toBe(result.counts.error);
    const junit = written('junit.xml', junitReport(result));
    expect(junit.match(/<testsuite /g)?.length).toBe(10_000);
    expect(junit.trimEnd().endsWith('</testsuites>')).toBe(true);
  });

  it('keeps the job summary under 1 MiB and the comment under 65,536 characters, and says what was left out', () => {
    const summary = formatSummary(result);
    expect(Buffer.byteLength(summary)).toBeLessThanOrEqual(SUMMARY_MAX_BYTES);
    expect(SUMMARY_MAX_BYTES).toBeLessThan(1024 * 1024);
    expect(summary).toMatch(/_Cut to stay under the size limit: .* left out\./);
    const comment = formatComment(result);
    expect(Buffer.byteLength(comment)).toBeLessThanOrEqual(COMMENT_MAX_BYTES);
    expect(comment.length).toBeLessThan(65_536);
    expect(Buffer.byteLength(formatMarkdown(result))).toBeLessThanOrEqual(1_000_000);
  });

  it('formats the text report and the annotations with a line for every model', () => {
    const text = formatText(result);
    for (const m of [result.models[0], result.models[9_999]]) expect(text).toContain(m.name);
    expect(text).toContain('10000 models');
    // Annotations: as many as the runner shows, then one notice counting the rest.
    const annotations = formatAnnotations(result).split('\n');
    expect(annotations.filter((l) => l.startsWith('::error')).length).toBe(10);
    expect(annotations.filter((l) => l.startsWith('::warning')).length).toBe(10);
    expect(annotations.some((l) => l.startsWith('::notice') && l.includes('more findings are not annotated'))).toBe(true);
  });
});

/** `rows` rows of 5 inputs and a target. */
function fiveInputs(rows: number, seed: number): string {
  let s = seed;
  const u = (): number => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
  const lines = ['a,b,c,d,e,y'];
  for (let i = 0; i < rows; i++) {
    const x = [u(), u(), u(), u(), u()].map((v) => v * 10);
    lines.push(`${x.map((v) => v.toFixed(5)).join(',')},${(x[0] - 0.5 * x[1] + Math.sin(x[2]) + 0.2 * x[3] * x[4] + u()).toFixed(5)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** Numbers (and nulls) in a JSON value. */
function countNumbers(value: unknown): number {
  if (typeof value === 'number' || value === null) return 1;
  if (Array.isArray(value)) return value.reduce((sum: number, v) => sum + countNumbers(v), 0);
  if (typeof value === 'object') return Object.values(value as object).reduce((sum: number, v) => sum + countNumbers(v), 0);
  return 0;
}

describe('1,000 models of 5 inputs and 5,000 rows', () => {
  let result: Result;
  let one: ModelResult;

  beforeAll(async () => {
    const repo = createMemoryRepository({
      'fitgate.yml': 'version: 1\nmodels: ["*.model.yml"]\n',
      'train.csv': fiveInputs(5000, 11),
      'holdout.csv': fiveInputs(5000, 12),
      'five.model.yml':
        'version: 1\nname: five\ndata: { train: train.csv, holdout: holdout.csv, target: y }\nterms:\n  - polynomial: { of: a, degree: 2 }\n  - linear: [b, c, d, e]\n',
    });
    one = (await runPipeline(defaultSettings('/nowhere'), repo, { jobs: 1 })).models[0];
    result = summarise(
      Array.from({ length: 1000 }, (_, i) => ({
        ...one,
        name: `five-${String(i).padStart(4, '0')}`,
        descriptor: `models/five-${String(i).padStart(4, '0')}.model.yml`,
      })),
      '0.1.0',
    );
  });

  it('has chart data bounded per model, whatever the number of inputs', () => {
    expect(one.error).toBeNull();
    const charts = one.charts;
    if (!charts) throw new Error('no chart data');
    // Each point carries its line, 5 inputs, the target, the prediction and the residual.
    const perPoint = 5 + 4;
    expect(charts.train.shown).toBe(Math.floor(MAX_SERIES_NUMBERS / perPoint));
    expect(charts.train.thinned).toBe(true);
    expect(countNumbers(charts.train)).toBeLessThanOrEqual(MAX_SERIES_NUMBERS + 10);
    expect(countNumbers(charts.holdout)).toBeLessThanOrEqual(MAX_SERIES_NUMBERS + 10);
    expect(charts.partials.length).toBe(5);
    // The whole model, checks' details included: a few hundred KB of JSON at most.
    expect(JSON.stringify(one, null, 2).length).toBeLessThan(400_000);
  });

  it('writes every report: JSON and SARIF parse back, the HTML page holds every model, the summary is bounded', () => {
    const json = path.join(dir, 'five.json');
    writeFileSafely(json, jsonReport(result), { option: '--out', within: [] });
    const size = statSync(json).size;
    // Written in pieces; read back here only because it is small enough for one string.
    expect(size).toBeLessThan(512 * 1024 * 1024);
    const parsed = JSON.parse(readFileSync(json, 'utf8')) as Result;
    expect(parsed.models.length).toBe(1000);
    expect(parsed.models[999]).toEqual(JSON.parse(JSON.stringify(result.models[999])));

    const html = path.join(dir, 'five.html');
    writeFileSafely(html, htmlReport(result), { option: 'html', within: [] });
    const page = readFileSync(html, 'utf8');
    expect(page.match(/<section class="model"/g)?.length).toBe(1000);
    expect(page.trimEnd().endsWith('</html>')).toBe(true);

    expect(() => JSON.parse(written('five.sarif', sarifReport(result)))).not.toThrow();
    expect(written('five.xml', junitReport(result)).match(/<testsuite /g)?.length).toBe(1000);
    expect(Buffer.byteLength(formatSummary(result))).toBeLessThanOrEqual(SUMMARY_MAX_BYTES);
    expect(Buffer.byteLength(formatComment(result))).toBeLessThanOrEqual(COMMENT_MAX_BYTES);
    expect(formatText(result)).toContain('1000 models');
  });

  it('keeps at most 12 partial curves and thins series for a model of 30 inputs', async () => {
    const names = Array.from({ length: 30 }, (_, j) => `x${j}`);
    let s = 5;
    const u = (): number => {
      s = (s * 16807) % 2147483647;
      return s / 2147483647;
    };
    const table = (rows: number): string =>
      `${[...names, 'y'].join(',')}\n${Array.from({ length: rows }, () => {
        const x = names.map(() => u());
        return `${x.map((v) => v.toFixed(4)).join(',')},${(x.reduce((a, b) => a + b, 0) + u()).toFixed(4)}`;
      }).join('\n')}\n`;
    const repo = createMemoryRepository({
      'fitgate.yml': 'version: 1\nmodels: ["*.model.yml"]\n',
      'train.csv': table(3000),
      'holdout.csv': table(500),
      'wide.model.yml': `version: 1\nname: wide\ndata: { train: train.csv, holdout: holdout.csv, target: y }\nterms:\n  - linear: [${names.join(', ')}]\n`,
    });
    const wide = (await runPipeline(defaultSettings('/nowhere'), repo, { jobs: 1 })).models[0];
    const charts = wide.charts;
    if (!charts) throw new Error(`no chart data: ${JSON.stringify(wide.error)}`);
    expect(charts.partials.length).toBe(MAX_PARTIAL_CURVES);
    expect(charts.partialsLeftOut).toBe(30 - MAX_PARTIAL_CURVES);
    expect(charts.train.shown).toBe(Math.floor(MAX_SERIES_NUMBERS / 34));
    const swing = wide.checks.find((c) => c.id === 'swing')?.detail as { curves: unknown[] } | undefined;
    expect(swing?.curves.length).toBe(12);
  });
});
