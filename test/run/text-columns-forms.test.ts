// Text columns (a category term's levels, a classifier's text labels) in every data form: the
// separator set or detected (semicolon, tab), a decimal comma, `missing: drop`, a split column.
// Each form must give the fit of the same rows written as a plain comma file (0/1 labels for a
// classifier), since the text is read apart from the numbers and has to follow the same rows.
import { describe, expect, it } from 'vitest';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import type { ModelResult } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

const SITES = ['north', 'south', 'east', 'north', 'west', 'south', 'north'];
/** 56 rows: x, a site level, a numeric target y and a class c (1 when y is high, with overlap). */
const ROWS = Array.from({ length: 56 }, (_, i) => {
  const x = ((i * 37) % 50) / 5;
  const site = SITES[i % SITES.length];
  const y = 1 + 0.5 * x + { north: 0, south: 1, east: -1, west: 2 }[site]! + ((i * 13) % 7) / 10;
  const c = y > 4.2 !== (i % 9 === 0) ? 1 : 0;
  return { x, site, y, c };
});
const isHoldout = (i: number) => i % 4 === 0;
type Row = (typeof ROWS)[number];

/** A CSV of `rows` with the given separator, decimal mark and class labels; `extra` adds a column. */
function csv(
  rows: Row[],
  o: { sep?: string; decimal?: string; label?: (c: number) => string; extra?: (i: number) => string } = {},
): string {
  const sep = o.sep ?? ',';
  const num = (v: number) => String(v).replace('.', o.decimal ?? '.');
  const label = o.label ?? ((c: number) => String(c));
  const head = ['x', 'site', 'y', 'c', ...(o.extra ? ['set'] : [])].join(sep);
  return `${head}\n${rows.map((r, i) => [num(r.x), r.site, num(r.y), label(r.c), ...(o.extra ? [o.extra(i)] : [])].join(sep)).join('\n')}\n`;
}

function descriptor(o: { classifier?: boolean; data?: string; train?: string; holdout?: string | null } = {}): string {
  const target = o.classifier ? 'c' : 'y';
  const holdout = o.holdout === null ? '' : `  holdout: ${o.holdout ?? 'h.csv'}\n`;
  return `version: 1\nname: m\n${o.classifier ? 'task: classification\n' : ''}data:\n  train: ${o.train ?? 't.csv'}\n${holdout}  target: ${target}\n${o.data ?? ''}terms:\n  - linear: [x]\n  - category: { of: site }\nlimits:\n  leakage: off\n`;
}

async function run(files: Record<string, string>): Promise<ModelResult> {
  const repo = createMemoryRepository(files);
  const result = await runPipeline(defaultSettings('/repo'), repo, { jobs: 1 });
  expect(result.models).toHaveLength(1);
  return result.models[0];
}

const train = ROWS.filter((_, i) => !isHoldout(i));
const holdout = ROWS.filter((_, i) => isHoldout(i));

/** The same model read from other files must give the plain files' rows, coefficients and figures. */
function expectSameFit(model: ModelResult, plain: ModelResult): void {
  expect(model.error).toBeNull();
  expect(model.rows).toEqual(plain.rows);
  expect(model.coefficients).toEqual(plain.coefficients);
  // A classifier's metrics name its labels as written (`passed`, not `1`); every figure is the same.
  const figures = (m: ModelResult) => {
    const { positive_label: _p, negative_label: _n, ...rest } = (m.metrics ?? {}) as Record<string, unknown>;
    return rest;
  };
  expect(figures(model)).toEqual(figures(plain));
}

for (const classifier of [false, true]) {
  describe(`${classifier ? 'classifier with text labels' : 'regression'} and a category term in every data form`, () => {
    const label = classifier ? (c: number) => (c ? 'passed' : 'failed') : undefined;
    const positive = classifier ? '  positive: passed\n' : '';
    const plainFiles = () => ({ 'm.model.yml': descriptor({ classifier }), 't.csv': csv(train), 'h.csv': csv(holdout) });

    it('semicolons (detected and set), tabs and a decimal comma', async () => {
      const plain = await run(plainFiles());
      expect(plain.error).toBeNull();
      const forms: [string, { sep: string; decimal?: string }][] = [
        ['', { sep: ';' }],
        ['  separator: ";"\n', { sep: ';' }],
        ['  separator: "\\t"\n', { sep: '\t' }],
        ['  decimal: ","\n', { sep: ';', decimal: ',' }],
      ];
      for (const [data, form] of forms) {
        const m = await run({
          'm.model.yml': descriptor({ classifier, data: positive + data }),
          't.csv': csv(train, { ...form, label }),
          'h.csv': csv(holdout, { ...form, label }),
        });
        expectSameFit(m, plain);
      }
    });

    it('a split column', async () => {
      const plain = await run(plainFiles());
      const m = await run({
        'm.model.yml': descriptor({
          classifier,
          data: `${positive}  split: { column: set, train: fit, holdout: test }\n`,
          train: 'all.csv',
          holdout: null,
        }),
        'all.csv': csv(ROWS, { label, extra: (i) => (isHoldout(i) ? 'test' : 'fit') }),
      });
      expectSameFit(m, plain);
    });

    it('missing: drop drops the rows with a missing cell (a label or level too) and keeps the text of the others', async () => {
      // Rows 1 and 6 of the training file lose their x; row 10 its label (classifier) or target;
      // rows 13 and 20 their category level (NA, empty): a missing level drops its row too.
      const gaps = (rows: Row[]) => {
        const lines = csv(rows, { label }).split('\n');
        lines[2] = lines[2].replace(/^[^,]*/, 'NA');
        lines[7] = lines[7].replace(/^[^,]*/, '');
        const cells = lines[11].split(',');
        cells[classifier ? 3 : 2] = 'NA';
        lines[11] = cells.join(',');
        for (const [at, cell] of [
          [14, 'NA'],
          [21, ' '],
        ] as const) {
          const row = lines[at].split(',');
          row[1] = cell;
          lines[at] = row.join(',');
        }
        return lines.join('\n');
      };
      const kept = train.filter((_, i) => ![1, 6, 10, 13, 20].includes(i));
      const plain = await run({ 'm.model.yml': descriptor({ classifier }), 't.csv': csv(kept), 'h.csv': csv(holdout) });
      expect(plain.error).toBeNull();
      const m = await run({
        'm.model.yml': descriptor({ classifier, data: `${positive}  missing: drop\n` }),
        't.csv': gaps(train),
        'h.csv': csv(holdout, { label }),
      });
      expect(m.error).toBeNull();
      expect(m.rows).toEqual(plain.rows);
      expect(m.coefficients).toEqual(plain.coefficients);
      expect(m.dropped).toEqual({ train: 5, holdout: 0 });
    });
  });
}

describe('predictions matched by a key column in semicolon and tab files', () => {
  // The key column is text read apart from the numbers: it must be read with the data's separator.
  const keyed = (rows: Row[], sep: string, prefix: string) =>
    `id${sep}x${sep}y\n${rows.map((r, i) => [`${prefix}${i}`, r.x, r.y].join(sep)).join('\n')}\n`;
  // The side file lists the predictions in reverse order, so only the key can match them.
  const side = (rows: Row[], prefix: string, sep: string) =>
    `id${sep}pred\n${rows
      .map((r, i) => `${prefix}${i}${sep}${(1.2 + 0.5 * r.x).toFixed(4)}`)
      .reverse()
      .join('\n')}\n`;
  const model = (data: string) =>
    `version: 1\nname: m\ndata:\n  train: t.csv\n  holdout: h.csv\n  target: y\n${data}predictions:\n  train: { file: tp.csv, key: id, column: pred }\n  holdout: { file: hp.csv, key: id, column: pred }\n  inputs: [x]\nlimits:\n  leakage: off\n`;
  // A set separator holds for every file of the model, the side files too.
  const files = (sep: string, data: string, sideSep = sep) => ({
    'm.model.yml': model(data),
    't.csv': keyed(train, sep, 't'),
    'h.csv': keyed(holdout, sep, 'h'),
    'tp.csv': side(train, 't', sideSep),
    'hp.csv': side(holdout, 'h', sideSep),
  });

  it('gives the figures of the comma files', async () => {
    const plain = await run(files(',', ''));
    expect(plain.error).toBeNull();
    for (const [sep, data, sideSep] of [
      [';', '', ','],
      ['\t', '  separator: "\\t"\n', '\t'],
    ]) {
      const m = await run(files(sep, data, sideSep));
      expect(m.error).toBeNull();
      expect(m.metrics).toEqual(plain.metrics);
    }
  });
});

describe('charts of a category input', () => {
  it("a classifier's probability curve along a category input is drawn at its level codes only", async () => {
    const m = await run({ 'm.model.yml': descriptor({ classifier: true }), 't.csv': csv(train), 'h.csv': csv(holdout) });
    expect(m.error).toBeNull();
    const curve = m.classifier_charts?.curves.find((c) => c.input === 'site');
    // Four levels (east, north, south, west), coded 0..3.
    expect(curve?.x).toEqual([0, 1, 2, 3]);
    expect(curve?.p).toHaveLength(4);
  });
});
