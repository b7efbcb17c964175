/**
 * Fuzzing with fast-check: random descriptors (a grammar of near-valid YAML, then random text
 * mutations), random settings and random CSV bytes. Whatever comes in, a run ends in a Result
 * (exit status 0, 1 or 2; every reporter formats it) or an InputError with a message; never
 * another exception, never a hang (each run bounded by a timeout).
 *
 * Runs in-process over a memory repository for speed, and a few through the built CLI.
 * `npm test` runs FITGATE_FUZZ_RUNS (default 300) in-process cases and 4 CLI cases;
 * `npm run fuzz` (test/hostile/fuzz-long.mjs) runs many more.
 */
import { rmSync } from 'node:fs';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { INTERNAL_ERROR } from '../../src/run/error-result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { formatAnnotations } from '../../src/report/annotations.js';
import { formatHtml } from '../../src/report/html.js';
import { formatJson } from '../../src/report/json.js';
import { formatJunit } from '../../src/report/junit.js';
import { formatMarkdown } from '../../src/report/markdown.js';
import { formatText } from '../../src/report/text.js';
import { exitStatus } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';
import { rows } from './corpus/repo.js';
import { foreignCommands, NODE_WARNING, prepareBundles, runCli, STACK_LINE, writeCase, type CaseDirs } from './harness.js';

const RUNS = Number(process.env.FITGATE_FUZZ_RUNS ?? 300);
const CLI_RUNS = Number(process.env.FITGATE_FUZZ_CLI_RUNS ?? 4);
/** A fixed seed by default so that `npm test` repeats; FITGATE_FUZZ_SEED picks another. */
const SEED = process.env.FITGATE_FUZZ_SEED !== undefined ? Number(process.env.FITGATE_FUZZ_SEED) : 20240601;
/** Longest one in-process run may take before it counts as a hang. */
const RUN_TIMEOUT_MS = 10_000;

// --- Generators -------------------------------------------------------------------------

/** Mostly `usual`, sometimes one of `odd`: keeps most repositories close enough to valid to reach the fit. */
function often<T>(usual: fc.Arbitrary<T>, odd: fc.Arbitrary<T>, weight = 20): fc.Arbitrary<T> {
  return fc.oneof({ weight, arbitrary: usual }, { weight: 1, arbitrary: odd });
}

const number = fc.oneof(
  fc.integer({ min: -5, max: 40 }).map(String),
  fc.double({ noNaN: false }).map((x) => (Number.isNaN(x) ? '.nan' : x === Infinity ? '.inf' : x === -Infinity ? '-.inf' : String(x))),
  fc.constantFrom('0', '-0', '1e308', '1e-320', '"3"', 'three', '', '~', '[]', '{}'),
);

const column = often(fc.constant('x'), fc.constantFrom('y', 'z', 'w', '"a|b"', '"::error::x"', '""', '"<b>"'));
const small = often(fc.integer({ min: 1, max: 4 }).map(String), number);
const positive = often(fc.double({ min: 0.1, max: 20, noNaN: true }).map(String), number);

const term = fc.oneof(
  fc.array(column, { minLength: 0, maxLength: 3 }).map((cs) => `  - linear: [${cs.join(', ')}]`),
  fc.constant('  - linear: [x]'),
  fc
    .tuple(column, small, often(fc.constant(null), number, 4), often(fc.constant(null), positive, 4))
    .map(
      ([of, degree, shift, scale]) =>
        `  - polynomial: { of: ${of}, degree: ${degree}${shift !== null ? `, shift: ${shift}` : ''}${scale !== null ? `, scale: ${scale}` : ''} }`,
    ),
  fc
    .tuple(
      column,
      fc.oneof(
        fc.constant('at-samples'),
        fc.array(number, { minLength: 0, maxLength: 5 }).map((xs) => `[${xs.join(', ')}]`),
        fc.tuple(number, number, small).map(([a, b, c]) => `{ from: ${a}, to: ${b}, count: ${c} }`),
        fc.tuple(small, small).map(([c, n]) => `{ from: 0, to: ${Number(c) * 10 || 10}, count: ${n} }`),
        fc.tuple(number, number, number).map(([a, b, c]) => `{ from: ${a}, to: ${b}, step: ${c} }`),
      ),
      positive,
    )
    .map(([of, centers, width]) => `  - rbf: { of: ${of}, centers: ${centers}, width: ${width} }`),
  fc.constantFrom('  - fourier: { of: x }', '  - {}', '  - linear: x', '  -'),
);

const oddPath = fc.constantFrom('../data/odd.csv', '../../x.csv', '/etc/passwd', 'missing.csv', '../data', '""', '"a\\0b"', 'C:\\\\x.csv');

const limitValue = fc.oneof(
  number,
  fc.constant('off'),
  fc.tuple(number, number).map(([w, f]) => `{ warn: ${w}, fail: ${f} }`),
  fc.constant('{ }'),
);
const limitKey = fc.constantFrom(
  'gap_ratio',
  'params_per_sample',
  'coefficient',
  'cv_ratio',
  'leakage',
  'swing',
  'swing_beyond',
  'condition',
  'reproducibility',
  'base_change',
  'nonsense',
);

const descriptorText = fc
  .record({
    version: often(fc.constant('1'), fc.constantFrom('2', '"1"')),
    name: often(fc.constantFrom('m', 'n', 'p', 'q'), fc.constantFrom('"a b"', '[x', '""')),
    train: often(fc.constant('../data/train.csv'), oddPath),
    holdout: often(fc.constant('../data/holdout.csv'), oddPath),
    target: often(fc.constant('y'), column),
    terms: often(fc.array(term, { minLength: 1, maxLength: 3 }), fc.constant<string[]>([])),
    fit: often(
      fc.constant(null),
      fc.tuple(
        fc.option(number),
        fc.option(number),
        fc.option(fc.constantFrom('true', 'false', 'yes')),
        fc.option(fc.constantFrom('shuffled', 'blocks', 'random')),
      ),
      3,
    ),
    limits: often(fc.constant<[string, string][]>([]), fc.array(fc.tuple(limitKey, limitValue), { maxLength: 3 }), 2),
    coefficients: often(fc.constant(null), fc.array(number, { maxLength: 5 }), 5),
  })
  .map((d) => {
    const lines = [
      `version: ${d.version}`,
      `name: ${d.name}`,
      'data:',
      `  train: ${d.train}`,
      `  holdout: ${d.holdout}`,
      `  target: ${d.target}`,
      'terms:',
      ...d.terms,
    ];
    if (d.fit) {
      const [ridge, folds, intercept, order] = d.fit;
      lines.push('fit:');
      if (ridge !== null) lines.push(`  ridge: ${ridge}`);
      if (folds !== null) lines.push(`  folds: ${folds}`);
      if (intercept !== null) lines.push(`  intercept: ${intercept}`);
      if (order !== null) lines.push(`  fold_order: ${order}`);
    }
    if (d.limits.length > 0) lines.push('limits:', ...d.limits.map(([k, v]) => `  ${k}: ${v}`));
    if (d.coefficients) lines.push(`coefficients: [${d.coefficients.join(', ')}]`);
    return `${lines.join('\n')}\n`;
  });

/** Random edits of a text: cut a piece, insert syntax characters, repeat or swap lines. */
function mutated(text: fc.Arbitrary<string>): fc.Arbitrary<string> {
  const edit = fc.oneof(
    fc.tuple(fc.constant('cut' as const), fc.nat(), fc.nat({ max: 20 })),
    fc.tuple(fc.constant('insert' as const), fc.nat(), fc.stringMatching(/^[[\]{}:,\-&*!|>'"%@`\t\n# \\\r\u0000\ufeffa1.]{1,6}$/)),
    fc.tuple(fc.constant('line' as const), fc.nat(), fc.nat()),
  );
  return fc
    .tuple(
      text,
      often(
        fc.constant<Array<['cut', number, number] | ['insert', number, string] | ['line', number, number]>>([]),
        fc.array(edit, { minLength: 1, maxLength: 3 }),
        10,
      ),
    )
    .map(([t, edits]) => {
      let out = t;
      for (const e of edits) {
        if (e[0] === 'cut') {
          const at = e[1] % (out.length + 1);
          out = out.slice(0, at) + out.slice(at + e[2]);
        } else if (e[0] === 'insert') {
          const at = e[1] % (out.length + 1);
          out = out.slice(0, at) + e[2] + out.slice(at);
        } else {
          const lines = out.split('\n');
          const a = e[1] % lines.length;
          const b = e[2] % lines.length;
          lines.splice(b, 0, lines[a]);
          out = lines.join('\n');
        }
      }
      return out;
    });
}

const settingsText = fc.option(
  mutated(
    fc
      .record({
        models: often(fc.constant('["models/*.model.yml"]'), fc.constantFrom('["**/*.yml"]', '["nothing/*"]', '["../*"]', '[]', '"x"')),
        caps: often(fc.constant(null), fc.tuple(number, number), 5),
        folds: often(fc.constant(null), number, 5),
        limits: often(fc.constant<[string, string][]>([]), fc.array(fc.tuple(limitKey, limitValue), { maxLength: 2 }), 2),
      })
      .map((s) => {
        const lines = ['version: 1', `models: ${s.models}`];
        if (s.caps) lines.push('caps:', `  max_file_mb: ${s.caps[0]}`, `  max_cells: ${s.caps[1]}`);
        if (s.folds !== null) lines.push('fit:', `  folds: ${s.folds}`);
        if (s.limits.length > 0) lines.push('limits:', ...s.limits.map(([k, v]) => `  ${k}: ${v}`));
        return `${lines.join('\n')}\n`;
      }),
  ),
  { freq: 4 },
);

/** CSV text: a valid table of 0 to 40 rows with random damage, or random bytes. */
const csvBytes: fc.Arbitrary<Uint8Array> = fc.oneof(
  {
    weight: 25,
    arbitrary: fc
      .tuple(
        fc.integer({ min: 0, max: 40 }),
        often(fc.constantFrom('x,y', 'x,y,z', 'y,x'), fc.constantFrom('x,x', '"x",y', '\ufeffx,y', 'x;y', '"a|b",x,y', '')),
      )
      .chain(([n, header]) =>
        mutated(
          fc.constant(
            rows(n, 0, 1, header).replace(/\n([^\n]+)/g, (_, line: string) => `\n${line}${header.split(',').length > 2 ? ',1' : ''}`),
          ),
        ).map((t) => new TextEncoder().encode(t)),
      ),
  },
  { weight: 1, arbitrary: fc.uint8Array({ maxLength: 300 }) },
  {
    weight: 1,
    arbitrary: fc
      .array(
        fc.constantFrom(
          '1',
          '2.5',
          'NaN',
          'Infinity',
          '',
          '1e999',
          '"3"',
          '"',
          '\r',
          '\n',
          ',',
          'x',
          '1e308',
          '-1e308',
          '\u0000',
          '\ufeff',
          'é',
        ),
        { maxLength: 60 },
      )
      .map((parts) => new TextEncoder().encode(`x,y\n${parts.join('')}`)),
  },
);

/** A whole random repository. */
const repository = fc.record({
  settings: settingsText,
  descriptors: often(
    fc.array(mutated(descriptorText), { minLength: 1, maxLength: 1 }),
    fc.array(mutated(descriptorText), { minLength: 2, maxLength: 2 }),
    3,
  ),
  train: csvBytes,
  holdout: csvBytes,
  odd: csvBytes,
});

type Repo = typeof repository extends fc.Arbitrary<infer T> ? T : never;

function filesOf(r: Repo): Record<string, string | Uint8Array> {
  const files: Record<string, string | Uint8Array> = { 'data/train.csv': r.train, 'data/holdout.csv': r.holdout, 'data/odd.csv': r.odd };
  if (r.settings !== null) files['fitgate.yml'] = r.settings;
  // The second descriptor gets another name unless the generator broke it (duplicate names are their own case).
  r.descriptors.forEach((text, i) => (files[`models/d${i}.model.yml`] = i === 0 ? text : text.replace(/^name: \w+$/m, `name: second`)));
  return files;
}

// --- Properties --------------------------------------------------------------------------

function timeout(ms: number): Promise<never> {
  return new Promise((_, reject) => setTimeout(() => reject(new Error(`run did not end within ${ms} ms (a hang)`)), ms).unref());
}

/** Runs one repository in-process; returns the exit status, throwing on anything but an InputError. */
async function check(r: Repo): Promise<number> {
  const settings = defaultSettings('/repo');
  try {
    const result = await Promise.race([runPipeline(settings, createMemoryRepository(filesOf(r))), timeout(RUN_TIMEOUT_MS)]);
    const status = exitStatus(result);
    // Every reporter formats whatever the pipeline returned.
    formatText(result);
    formatMarkdown(result);
    formatAnnotations(result);
    formatJunit(result);
    formatHtml(result);
    JSON.parse(formatJson(result));
    if (status === 2) {
      const bad = result.models.filter((m) => m.verdict === 'error');
      if (bad.length === 0 || bad.some((m) => !m.error || m.error.message.trim() === ''))
        throw new Error('exit status 2 without a message');
    }
    const fault = result.models.find((m) => m.error?.code === INTERNAL_ERROR);
    if (fault) throw new Error(`a fault in fitgate on ${fault.descriptor}: ${fault.error?.message}`);
    return status;
  } catch (error) {
    if (error instanceof InputError) {
      if (error.describe().trim() === '') throw new Error('InputError without a message');
      return 2;
    }
    throw error;
  }
}

describe('fuzzing the pipeline in-process', () => {
  it(`${RUNS} random repositories end in exit 0, 1 or 2 with a message and no process warning (seed ${SEED})`, async () => {
    const seen = new Map<number, number>();
    // A library's process warning (printed on stderr by Node.js) is not a message of fitgate's.
    const warnings: string[] = [];
    const onWarning = (w: Error): void => void warnings.push(`${w.name}: ${w.message}`);
    process.on('warning', onWarning);
    try {
      await fc.assert(
        fc.asyncProperty(repository, async (r) => {
          const status = await check(r);
          seen.set(status, (seen.get(status) ?? 0) + 1);
          await new Promise((resolve) => setImmediate(resolve)); // warnings are emitted on the next tick
          return (status === 0 || status === 1 || status === 2) && warnings.length === 0;
        }),
        { numRuns: RUNS, seed: SEED, endOnFailure: true },
      );
    } finally {
      process.off('warning', onWarning);
    }
    expect(warnings).toEqual([]);
    // The grammar must reach past the loaders sometimes, not only produce errors.
    if (RUNS >= 60) expect((seen.get(0) ?? 0) + (seen.get(1) ?? 0), `statuses seen: ${JSON.stringify([...seen])}`).toBeGreaterThan(0);
  }, 300_000);

  it('a valid repository from the same generators passes through every stage (the generators are not all noise)', async () => {
    const status = await check({
      settings: 'version: 1\nmodels: ["models/*.model.yml"]\n',
      descriptors: [
        'version: 1\nname: m\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - linear: [x]\n',
      ],
      train: new TextEncoder().encode(rows(30)),
      holdout: new TextEncoder().encode(rows(10, 0.5, 3)),
      odd: new Uint8Array(),
    });
    expect(status).toBe(0);
  });
});

describe('fuzzing through the built CLI', () => {
  const written: CaseDirs[] = [];
  afterAll(() => {
    for (const dirs of written) rmSync(dirs.base, { recursive: true, force: true });
  });

  it(`${CLI_RUNS} random repositories: exit 0, 1 or 2, a message, no stack trace, no stray workflow command`, async () => {
    prepareBundles();
    const samples = fc.sample(repository, { numRuns: CLI_RUNS, seed: SEED + 1 });
    const runs = await Promise.all(
      samples.map(async (r, i) => {
        const dirs = writeCase(filesOf(r), `fuzz-${i}`);
        written.push(dirs);
        return { r, run: await runCli(dirs, [], 30_000) };
      }),
    );
    for (const { r, run } of runs) {
      const detail = `${JSON.stringify(filesOf(r), (_, v: unknown) => (v instanceof Uint8Array ? Buffer.from(v).toString('latin1') : v))}\n${run.stdout}\n${run.stderr}`;
      expect([0, 1, 2], detail).toContain(run.status);
      expect(`${run.stdout}${run.stderr}`, detail).not.toMatch(STACK_LINE);
      expect(run.stderr, detail).not.toMatch(NODE_WARNING);
      expect(run.stderr, detail).not.toContain('--debug');
      expect(foreignCommands(run.stdout), detail).toEqual([]);
      if (run.status === 2) expect(`${run.stdout}${run.stderr}`.trim().length, detail).toBeGreaterThan(0);
    }
  }, 120_000);
});
