// Models' JSON text set aside while the run goes on (entries/model-spool.ts): the report written
// from the small copies and the spooled text is the report of the whole outcomes, byte for byte,
// whether the text is kept in memory or in a spool file beside the report (never through a link,
// its name removed at once, nothing left behind when the write fails).
import {
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  readSync,
  realpathSync,
  rmSync,
  symlinkSync,
  writeFileSync,
  writeSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { openModelSpool, smallCopy, type SpoolTarget } from '../../src/entries/model-spool.js';
import { OUTPUT_FAILED, OUTPUT_REFUSED, writeFileSafely } from '../../src/entries/safe-write.js';
import { formatJson, jsonReport } from '../../src/report/json.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import type { ModelResult } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

/** Pieces of text and of UTF-8 bytes joined into one string. */
const joined = (pieces: Iterable<string | Uint8Array>): string =>
  Buffer.concat(Array.from(pieces, (piece) => (typeof piece === 'string' ? Buffer.from(piece, 'utf8') : Buffer.from(piece)))).toString(
    'utf8',
  );

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
        // The copies keep no chart data, figures or checks; the verdicts and counts are the same.
        for (const m of small.models) {
          expect(m.charts).toBeUndefined();
          expect(m.classifier_charts).toBeUndefined();
          expect(m.checks).toEqual([]);
          expect(m.metrics).toBeNull();
        }
        expect(small.models.map((m) => [m.name, m.descriptor, m.verdict])).toEqual(
          whole.models.map((m) => [m.name, m.descriptor, m.verdict]),
        );
        expect(small.counts).toEqual(whole.counts);
        expect(small.verdict).toBe(whole.verdict);
        expect(whole.models.some((m) => m.charts !== undefined || m.classifier_charts !== undefined)).toBe(true);
        const text = joined(jsonReport(small, { modelText: spool.text }));
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
      const text = joined(jsonReport(small, { modelText: spool.text }));
      expect(text).toBe(formatJson(hostile));
      expect(text).not.toContain('##[');
      expect(text).not.toContain('\u2028');
      expect(JSON.parse(text).models.map((m: ModelResult) => m.name)).toEqual(hostile.models.map((m) => m.name));
    } finally {
      spool.close();
    }
  });

  it('keeps in the copy what the summary reads (name, descriptor, verdict) with rows, parameters and error, and drops its texts when closed', async () => {
    const dir = examples('');
    const result = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
    const model = result.models.find((m) => m.charts !== undefined);
    if (model === undefined) throw new Error('no model with charts in examples/');
    const copy = smallCopy(model);
    expect(copy).toEqual({
      name: model.name,
      descriptor: model.descriptor,
      verdict: model.verdict,
      rows: model.rows,
      parameters: model.parameters,
      columns: [],
      metrics: null,
      coefficients: [],
      shipped: null,
      checks: [],
      error: null,
    });
    // Its size: a few hundred bytes of JSON where the whole outcome has kilobytes.
    expect(JSON.stringify(copy).length).toBeLessThan(400);
    expect(JSON.stringify(model).length).toBeGreaterThan(4000);
    const failed = result.models.find((m) => m.error !== null);
    if (failed !== undefined) expect(smallCopy(failed).error).toEqual(failed.error);
    expect(model.charts).toBeDefined();
    const spool = openModelSpool();
    const kept = spool.keep(model);
    const written = spool.text(kept);
    expect(written === undefined ? undefined : joined(written)).toBe(
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

const top = realpathSync(mkdtempSync(path.join(tmpdir(), 'fitgate-spool-')));
afterAll(() => rmSync(top, { recursive: true, force: true }));
let cases = 0;

/** A fresh case: `ws/` (the boundary, where the report goes) and `outside/` holding `secret.txt`. */
function fresh(): { ws: string; outside: string; secret: string; target: SpoolTarget } {
  const base = path.join(top, `case-${++cases}`);
  const ws = path.join(base, 'ws');
  const outside = path.join(base, 'outside');
  mkdirSync(ws, { recursive: true });
  mkdirSync(outside);
  const secret = path.join(outside, 'secret.txt');
  writeFileSync(secret, 'outside, unchanged\n');
  return { ws, outside, secret, target: { file: path.join(ws, 'out', 'report.json'), place: { option: '--out', within: [ws] } } };
}

/** Every name in a folder tree (relative paths), to see that nothing is left behind. */
function tree(dir: string): string[] {
  return readdirSync(dir, { recursive: true, encoding: 'utf8' }).sort();
}

/** The models of examples/ run whole and through `spool` (the copies it keeps in the Result). */
async function spooledRun(spool: ReturnType<typeof openModelSpool>) {
  const dir = examples('');
  const whole = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
  const small = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1, onModel: (m) => spool.keep(m) });
  return { whole, small };
}

describe('the spool file beside the report', () => {
  it('holds the text on disk (read back through its descriptor), under no name, and the report written is byte for byte the whole one', async () => {
    const c = fresh();
    let reads = 0;
    let written = 0;
    const spool = openModelSpool(c.target, {
      read: (fd, bytes, offset, length, position) => {
        reads++;
        return readSync(fd, bytes, offset, length, position);
      },
    });
    try {
      const { whole, small } = await spooledRun({
        keep: (m) => {
          const copy = spool.keep(m);
          written++;
          return copy;
        },
        handoff: spool.handoff,
        text: spool.text,
        close: spool.close,
      });
      expect(written).toBe(whole.models.length);
      // The folder of --out is made for the spool file, whose name is gone as soon as it was open.
      expect(tree(c.ws)).toEqual(['out']);
      const file = writeFileSafely(c.target.file, jsonReport(small, { modelText: spool.text }), c.target.place);
      expect(readFileSync(file, 'utf8')).toBe(formatJson(whole));
      expect(reads).toBeGreaterThanOrEqual(whole.models.length);
    } finally {
      spool.close();
    }
    expect(tree(c.ws)).toEqual(['out', 'out/report.json']);
    expect(tree(c.outside)).toEqual(['secret.txt']);
  });

  it('is never opened through a link: a report path that is a link keeps the text in memory, and the report is refused as without a spool', async () => {
    const c = fresh();
    mkdirSync(path.dirname(c.target.file));
    symlinkSync(c.secret, c.target.file);
    const spool = openModelSpool(c.target);
    try {
      const { whole, small } = await spooledRun(spool);
      expect(joined(jsonReport(small, { modelText: spool.text }))).toBe(formatJson(whole));
      let error: unknown;
      try {
        writeFileSafely(c.target.file, jsonReport(small, { modelText: spool.text }), c.target.place);
      } catch (e) {
        error = e;
      }
      expect(error instanceof InputError && error.code).toBe(OUTPUT_REFUSED);
    } finally {
      spool.close();
    }
    expect(readFileSync(c.secret, 'utf8')).toBe('outside, unchanged\n');
    expect(lstatSync(c.target.file).isSymbolicLink()).toBe(true);
    expect(tree(c.ws)).toEqual(['out', 'out/report.json']);
  });

  it('is not made in a folder that leads out of the boundary through a link', async () => {
    const c = fresh();
    symlinkSync(c.outside, path.join(c.ws, 'out'));
    const spool = openModelSpool(c.target);
    try {
      const { whole, small } = await spooledRun(spool);
      expect(joined(jsonReport(small, { modelText: spool.text }))).toBe(formatJson(whole));
    } finally {
      spool.close();
    }
    expect(tree(c.outside)).toEqual(['secret.txt']);
  });

  it('keeps a model in memory when its write fails (a full disk), and the report is still whole', async () => {
    const c = fresh();
    let calls = 0;
    const spool = openModelSpool(c.target, {
      write: (fd, bytes, offset, length, position) => {
        calls++;
        if (calls % 13 === 0) throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
        // At most 4 KiB a round: some models fail half-way, and the next one is written over their bytes.
        return writeSync(fd, bytes, offset, Math.min(length, 4096), position);
      },
    });
    try {
      const { whole, small } = await spooledRun(spool);
      expect(calls).toBeGreaterThan(26);
      const file = writeFileSafely(c.target.file, jsonReport(small, { modelText: spool.text }), c.target.place);
      expect(readFileSync(file, 'utf8')).toBe(formatJson(whole));
    } finally {
      spool.close();
    }
    expect(tree(c.ws)).toEqual(['out', 'out/report.json']);
  });

  it('a read that fails while the report is written fails that write: the previous report stays, and no file is left behind', async () => {
    const c = fresh();
    mkdirSync(path.dirname(c.target.file));
    writeFileSync(c.target.file, 'previous complete report\n');
    let reads = 0;
    const spool = openModelSpool(c.target, {
      read: (fd, bytes, offset, length, position) => {
        reads++;
        if (reads > 1) throw Object.assign(new Error('EIO: i/o error, read'), { code: 'EIO' });
        return readSync(fd, bytes, offset, length, position);
      },
    });
    let error: unknown;
    try {
      const { small } = await spooledRun(spool);
      writeFileSafely(c.target.file, jsonReport(small, { modelText: spool.text }), c.target.place);
    } catch (e) {
      error = e;
    } finally {
      spool.close();
    }
    expect(error instanceof InputError && error.code).toBe(OUTPUT_FAILED);
    expect(error instanceof InputError && error.message).toContain('(EIO)');
    expect(readFileSync(c.target.file, 'utf8')).toBe('previous complete report\n');
    expect(tree(c.ws)).toEqual(['out', 'out/report.json']);
  });

  it('a spool file cut short stops the write with an error instead of looping', async () => {
    const c = fresh();
    const spool = openModelSpool(c.target, { read: () => 0 });
    try {
      const { small } = await spooledRun(spool);
      expect(() => [...jsonReport(small, { modelText: spool.text })]).toThrow('the model spool file ended early');
    } finally {
      spool.close();
    }
    expect(tree(c.ws)).toEqual(['out']);
  });
});
