// The benchmark: `npm run bench` (= node test/bench/run.mjs).
//
// Builds a small repository with one model per workload size (S, M, L of ../shared/bench/README.md),
// runs whole `node dist/cli/index.js check --format json` processes several times, and, when
// Debian's python3-numpy, python3-pandas and python3-sklearn are installed, runs the reference
// ../shared/bench/ref_check.py on the same files, taking turns. Prints per size the median wall
// seconds and peak memory of both, the ratios against the targets, and the figures of both side
// by side (pass = within 1e-6 relative; leaked rows exact). Then a micro benchmark of k-fold plus
// leave-one-out against a single fit (micro.mjs).
//
// Workload C is a classifier (task: classification): 1,000,000 training rows of 8 inputs, degree 3,
// ridge 1, 5 contiguous folds, against ../shared/bench/ref_logistic.py (pandas read_csv, the same
// basis, scikit-learn LogisticRegression with the newton-cholesky solver, tol 1e-10, and its own
// k-fold loop), whose `generate` command writes the data (python3 with numpy and pandas needed).
//
// MONO1000 and MONO200 are the many-models workloads (monorepo.mjs): 1,000 models of 1,000 training
// rows and 200 of 2,000, one cubic polynomial term each, ridge 0.1, 5 contiguous folds, checked by
// one `fitgate check --root REPO` process against ref_check.py's `main` looped over the same models
// inside one Python process (ref-loop.py: the interpreter and imports paid once), with --loocv
// because fitgate computes leave-one-out too. Figures are compared model by model; the table shows
// the largest difference over the models.
//
// Options:
//   --sizes S,M,L     which workloads (default S, M, L, C, MONO1000, MONO200; XL only when named: it is large)
//   --runs N          whole-process runs per tool and size, median reported (default 3)
//   --data DIR        use DIR/S, DIR/M, DIR/L/{train,holdout}.csv (as gen_data.py writes them)
//                     instead of generating data in JavaScript (gen-data.mjs)
//   --work DIR        scratch folder (default $TMPDIR/fitgate-bench; generated data is kept there)
//   --reference FILE  ref_check.py (default ../shared/bench/ref_check.py next to the repository)
//   --no-reference    fitgate only
//   --no-micro        skip the micro benchmark
//   --json FILE       also write every measurement as JSON
//   --inherit-env     run both tools with this process's environment (default: a minimal one,
//                     PATH, HOME, LANG and TMPDIR only, the same for both tools: a site setting
//                     such as NODE_EXTRA_CA_CERTS makes every Node process read and parse a
//                     certificate bundle at start, about 50 ms on the development machine, for a
//                     command that opens no connection)
//   --cli FILE        the fitgate bundle to run (default dist/cli/index.js, built when missing)
//
// Workload XL is the ten-million-row training file of issue 18 (10,000,000 + 250,000 rows of 8
// inputs, degree 3 as L, about 1.4 GB of CSV), which fitgate streams (docs/scale.md); XLGZ is the
// same file gzip-compressed. `--sizes XL` runs both. The bench repository's settings raise the caps
// such files need (max_file_mb, max_operations, max_model_seconds). Besides wall time and peak
// memory the table gives the throughput in MB of CSV text per second of wall time; `--stages`
// also times one read-and-parse pass of the training file alone (the sources compiled by tsc
// into the work folder). The reference holds the whole file in pandas and the design in numpy;
// run it with care on a shared machine (--no-reference to leave it out).
import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, linkSync, mkdirSync, readFileSync, rmSync, statSync, symlinkSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { generate } from './gen-data.mjs';
import { measure, median, memoryMethod } from './measure.mjs';
import { buildMonorepo, MONOREPO_WORKLOADS } from './monorepo.mjs';

const root = fileURLToPath(new URL('../..', import.meta.url));

/** The workloads of ../shared/bench/README.md. */
export const WORKLOADS = {
  S: {
    rows: 2_000,
    holdoutRows: 500,
    features: 1,
    degree: 10,
    folds: 10,
    loocv: true,
    seed: 1,
    wallRatio: 0.25,
    memRatio: 0.5,
    memMiB: null,
  },
  M: {
    rows: 100_000,
    holdoutRows: 25_000,
    features: 5,
    degree: 4,
    folds: 5,
    loocv: true,
    seed: 2,
    wallRatio: 0.35,
    memRatio: 0.5,
    memMiB: null,
  },
  L: {
    rows: 1_000_000,
    holdoutRows: 250_000,
    features: 8,
    degree: 3,
    folds: 5,
    loocv: false,
    seed: 3,
    wallRatio: 0.3,
    memRatio: null,
    memMiB: 256,
  },
  C: {
    rows: 1_000_000,
    holdoutRows: 250_000,
    features: 8,
    degree: 3,
    folds: 5,
    loocv: false,
    seed: 4,
    wallRatio: 0.5,
    memRatio: null,
    memMiB: 256,
    task: 'classification',
  },
  MONO1000: { ...MONOREPO_WORKLOADS.R1000, monorepo: true, wallRatio: 0.3, memRatio: 0.5, memMiB: null },
  MONO200: { ...MONOREPO_WORKLOADS.R200, monorepo: true, wallRatio: 0.3, memRatio: 0.5, memMiB: null },
  XL: {
    rows: 10_000_000,
    holdoutRows: 250_000,
    features: 8,
    degree: 3,
    folds: 5,
    loocv: false,
    seed: 6,
    wallRatio: 0.3,
    memRatio: null,
    memMiB: 256,
  },
  XLGZ: {
    rows: 10_000_000,
    holdoutRows: 250_000,
    features: 8,
    degree: 3,
    folds: 5,
    loocv: false,
    seed: 6,
    wallRatio: 0.3,
    memRatio: null,
    memMiB: 256,
    gzip: true,
    dataOf: 'XL',
  },
};

/** Caps the bench repository's settings raise for the XL workloads (docs/scale.md, "Training files too large to hold"). */
const XL_CAPS = '  max_file_mb: 4096\n  max_operations: 1e12\n  max_model_seconds: 7200\n';

/** Classifier figures compared: [label, fitgate metrics key, reader of the reference's output]. */
const CLASSIFIER_FIGURES = [
  ['training log-loss', 'train_log_loss', (r) => r.train.log_loss],
  ['hold-out log-loss', 'holdout_log_loss', (r) => r.holdout.log_loss],
  ['training ROC AUC', 'train_auc', (r) => r.train.roc_auc],
  ['hold-out ROC AUC', 'holdout_auc', (r) => r.holdout.roc_auc],
  ['hold-out Brier score', 'holdout_brier', (r) => r.holdout.brier],
  ['calibration slope', 'calibration_slope', (r) => r.calibration_slope],
  ['k-fold log-loss (blocks)', 'cv_log_loss', (r) => r.cv_log_loss],
];

/** Figures compared: [label, fitgate metrics key, reference key, exact]. */
const FIGURES = [
  ['training RMSE', 'train_rmse', 'train_rmse', false],
  ['hold-out RMSE', 'holdout_rmse', 'holdout_rmse', false],
  ['gap ratio', 'gap_ratio', 'gap_ratio', false],
  ['max std. coefficient', 'max_std_coefficient', 'max_std_coef', false],
  ['leave-one-out RMSE', 'loocv_rmse', 'loocv_rmse', false],
  ['condition number', 'condition_number', 'cond', false],
  ['k-fold RMSE (blocks)', 'cv_rmse', 'cv_rmse', false],
  ['leaked rows', 'leaked_rows', 'leaked_rows', true],
];
const RELATIVE_TOLERANCE = 1e-6;

function parseOptions(argv) {
  const o = {
    sizes: ['S', 'M', 'L', 'C', 'MONO1000', 'MONO200'],
    runs: 3,
    data: null,
    work: path.join(os.tmpdir(), 'fitgate-bench'),
    reference: path.resolve(root, '..', 'shared', 'bench', 'ref_check.py'),
    useReference: true,
    micro: true,
    json: null,
    cli: path.join(root, 'dist', 'cli', 'index.js'),
    inheritEnv: false,
    stages: false,
  };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const value = () => {
      if (i + 1 >= argv.length) throw new Error(`${a} needs a value`);
      return argv[++i];
    };
    if (a === '--sizes')
      o.sizes = value()
        .split(',')
        .map((s) => s.trim().toUpperCase());
    else if (a === '--runs') o.runs = Number(value());
    else if (a === '--data') o.data = path.resolve(value());
    else if (a === '--work') o.work = path.resolve(value());
    else if (a === '--reference') o.reference = path.resolve(value());
    else if (a === '--no-reference') o.useReference = false;
    else if (a === '--no-micro') o.micro = false;
    else if (a === '--json') o.json = path.resolve(value());
    else if (a === '--cli') o.cli = path.resolve(value());
    else if (a === '--inherit-env') o.inheritEnv = true;
    else if (a === '--stages') o.stages = true;
    else throw new Error(`unknown option ${a} (see the top of test/bench/run.mjs)`);
  }
  if (o.sizes.includes('XL') && !o.sizes.includes('XLGZ')) o.sizes.push('XLGZ');
  for (const s of o.sizes) if (!WORKLOADS[s]) throw new Error(`unknown size ${s}; expected S, M, L, C, MONO1000, MONO200 or XL`);
  if (!(Number.isInteger(o.runs) && o.runs >= 1)) throw new Error('--runs must be a whole number >= 1');
  return o;
}

/** Source data of one size: DIR/<size>/ from --data, or generated once into the work folder. */
function sourceData(options, size) {
  const w = WORKLOADS[size];
  if (w.dataOf) {
    // The compressed twin of another workload: its files, the training file gzipped once.
    const dir = sourceData(options, w.dataOf);
    const gz = path.join(dir, 'train.csv.gz');
    if (!existsSync(gz) || statSync(gz).mtimeMs < statSync(path.join(dir, 'train.csv')).mtimeMs) {
      process.stderr.write(`compressing ${w.dataOf} training data (gzip -1)...\n`);
      execFileSync('sh', ['-c', 'gzip -1 -c "$1" > "$2.part" && mv "$2.part" "$2"', 'sh', path.join(dir, 'train.csv'), gz]);
    }
    return dir;
  }
  if (options.data) {
    const dir = path.join(options.data, size);
    for (const f of ['train.csv', 'holdout.csv'])
      if (!existsSync(path.join(dir, f))) throw new Error(`--data: ${path.join(dir, f)} is missing`);
    return dir;
  }
  const dir = path.join(options.work, w.task === 'classification' ? 'data-py' : 'data-js', size);
  const stamp = path.join(dir, 'params.json');
  const params = JSON.stringify({ rows: w.rows, holdoutRows: w.holdoutRows, features: w.features, seed: w.seed, generator: 1 });
  if (w.task === 'classification' && (!existsSync(stamp) || readFileSync(stamp, 'utf8') !== params)) {
    process.stderr.write(
      `generating ${size} data with ref_logistic.py (${w.rows} + ${w.holdoutRows} rows x ${w.features + 1} columns)...\n`,
    );
    const script = path.join(path.dirname(options.reference), 'ref_logistic.py');
    execFileSync(
      '/usr/bin/python3',
      [
        script,
        'generate',
        '--out',
        dir,
        '--rows',
        String(w.rows),
        '--holdout-rows',
        String(w.holdoutRows),
        '--features',
        String(w.features),
        '--seed',
        String(w.seed),
      ],
      { stdio: 'inherit' },
    );
    writeFileSync(stamp, params);
  } else if (!existsSync(stamp) || readFileSync(stamp, 'utf8') !== params) {
    process.stderr.write(`generating ${size} data (${w.rows} + ${w.holdoutRows} rows x ${w.features + 1} columns)...\n`);
    generate({ out: dir, rows: w.rows, holdoutRows: w.holdoutRows, features: w.features, seed: w.seed });
    writeFileSync(stamp, params);
  }
  return dir;
}

/** Puts a file into the bench repository: a hard link when possible, else a copy. */
function place(from, to) {
  rmSync(to, { force: true });
  try {
    linkSync(from, to);
  } catch {
    copyFileSync(from, to);
  }
}

/** The descriptor of one workload: one polynomial term per input, default shift and scale. */
function descriptorText(size) {
  const w = WORKLOADS[size];
  const terms = Array.from({ length: w.features }, (_, j) => `  - polynomial: { of: x${j + 1}, degree: ${w.degree} }`).join('\n');
  return `# Benchmark workload ${size} (written by test/bench/run.mjs)
version: 1
name: bench-${size.toLowerCase()}
${w.task === 'classification' ? 'task: classification\n' : ''}data:
  train: ../data/${size}/train.csv${w.gzip ? '.gz' : ''}
  holdout: ../data/${size}/holdout.csv
  target: y
terms:
${terms}
fit:
  intercept: true
  ridge: 1
  folds: ${w.folds}
  fold_order: blocks
`;
}

function buildRepository(options) {
  const repo = path.join(options.work, 'repo');
  mkdirSync(path.join(repo, 'models'), { recursive: true });
  const xl = options.sizes.some((s) => s.startsWith('XL'));
  writeFileSync(path.join(repo, 'fitgate.yml'), `version: 1\nmodels:\n  - "models/*.model.yml"\n${xl ? `caps:\n${XL_CAPS}` : ''}`);
  const files = {};
  for (const size of options.sizes) {
    if (WORKLOADS[size].monorepo) continue;
    const src = sourceData(options, size);
    const data = path.join(repo, 'data', size);
    mkdirSync(data, { recursive: true });
    const trainFile = WORKLOADS[size].gzip ? 'train.csv.gz' : 'train.csv';
    for (const f of [trainFile, 'holdout.csv']) place(path.join(src, f), path.join(data, f));
    const descriptor = path.join('models', `${size.toLowerCase()}.model.yml`);
    writeFileSync(path.join(repo, descriptor), descriptorText(size));
    files[size] = {
      descriptor,
      train: path.join(data, trainFile),
      holdout: path.join(data, 'holdout.csv'),
      csvBytes: statSync(path.join(src, 'train.csv')).size,
    };
  }
  return { repo, files };
}

/** The environment both tools run with (see --inherit-env). */
function benchEnvironment(options) {
  if (options.inheritEnv) return process.env;
  const env = {};
  for (const key of ['PATH', 'HOME', 'LANG', 'TMPDIR']) if (process.env[key] !== undefined) env[key] = process.env[key];
  return env;
}

function referenceAvailable(options) {
  if (!options.useReference) return 'turned off (--no-reference)';
  if (!existsSync(options.reference)) return `not found: ${options.reference}`;
  if (!existsSync('/usr/bin/python3')) return '/usr/bin/python3 is not installed';
  const probe = spawnSync('/usr/bin/python3', ['-c', 'import numpy, pandas, sklearn'], {
    encoding: 'utf8',
    env: benchEnvironment(options),
  });
  if (probe.status !== 0)
    return 'python3-numpy, python3-pandas or python3-sklearn is not installed (apt-get install -y python3-numpy python3-pandas python3-sklearn)';
  return null;
}

function fitgateFigures(stdout) {
  const report = JSON.parse(stdout);
  const model = report.models[0];
  if (!model || model.metrics === null) throw new Error(`fitgate could not check the model: ${JSON.stringify(model?.error ?? report)}`);
  const figures = {};
  for (const [, key] of FIGURES) figures[key] = model.metrics[key] ?? null;
  for (const [, key] of CLASSIFIER_FIGURES) figures[key] = model.metrics[key] ?? null;
  figures.coefficients = model.coefficients;
  return { figures, verdict: model.verdict };
}

/** A classifier's figures against ref_logistic.py's, and the largest coefficient difference relative to the largest coefficient. */
function compareClassifierFigures(fg, ref) {
  const rows = CLASSIFIER_FIGURES.map(([label, key, read]) => {
    const a = fg[key];
    const b = read(ref);
    if (typeof a !== 'number') return { label, fitgate: a, reference: b, relative: null, status: 'fail' };
    const relative = Math.abs(a - b) / Math.max(Math.abs(b), Number.MIN_VALUE);
    return { label, fitgate: a, reference: b, relative, status: relative <= RELATIVE_TOLERANCE ? 'pass' : 'fail' };
  });
  const scale = Math.max(...ref.coefficients.map(Math.abs));
  const ok = Array.isArray(fg.coefficients) && fg.coefficients.length === ref.coefficients.length;
  const relative = ok ? Math.max(...ref.coefficients.map((w, j) => Math.abs(fg.coefficients[j] - w) / scale)) : null;
  rows.push({
    label: `coefficients (${ref.coefficients.length}, max diff / max |w|)`,
    fitgate: null,
    reference: null,
    relative,
    status: relative !== null && relative <= RELATIVE_TOLERANCE ? 'pass' : 'fail',
  });
  return rows;
}

function compareFigures(fg, ref) {
  return FIGURES.map(([label, fgKey, refKey, exact]) => {
    const a = fg[fgKey];
    const b = ref[refKey];
    if (b === null || b === undefined) return { label, fitgate: a, reference: null, relative: null, status: 'n/a' };
    if (a === null || a === undefined || typeof a !== 'number') return { label, fitgate: a, reference: b, relative: null, status: 'fail' };
    const relative = exact ? Math.abs(a - b) : Math.abs(a - b) / Math.max(Math.abs(b), Number.MIN_VALUE);
    const ok = exact ? a === b : relative <= RELATIVE_TOLERANCE;
    return { label, fitgate: a, reference: b, relative, status: ok ? 'pass' : 'fail' };
  });
}

/**
 * One many-models workload: fitgate over the whole repository (its JSON report to a file), then
 * ref-loop.py over the same models, taking turns; figures compared model by model, the largest
 * difference of each figure over the models reported.
 */
async function runMonorepo(options, size, env, refMissing) {
  const w = WORKLOADS[size];
  process.stderr.write(`${size}: building ${w.models} models of ${w.rows} rows (cached when built before)...\n`);
  const { repo, list } = buildMonorepo(path.join(options.work, `mono-${size.toLowerCase()}`), w);
  const out = path.join(options.work, `mono-${size.toLowerCase()}-report.json`);
  const loop = path.join(root, 'test', 'bench', 'ref-loop.py');
  const runs = { fitgate: [], reference: [] };
  let refOut = null;
  for (let r = 0; r < options.runs; r++) {
    const fg = await measure(process.execPath, [options.cli, 'check', '--root', repo, '--format', 'json', '--out', out], {
      cwd: repo,
      okStatus: [0, 1],
      env,
    });
    runs.fitgate.push(fg);
    if (!refMissing) {
      const args = [loop, '--reference', options.reference, '--list', path.join(repo, 'models.json'), '--root', repo];
      args.push('--degree', String(w.degree), '--ridge', String(w.ridge), '--folds', String(w.folds), '--loocv');
      const ref = await measure('/usr/bin/python3', args, { cwd: repo, env });
      runs.reference.push(ref);
      refOut = ref.stdout;
    }
    process.stderr.write(
      `${size} run ${r + 1}/${options.runs}: fitgate ${fg.wall.toFixed(2)} s ${fg.peakMiB.toFixed(0)} MiB` +
        (refMissing ? '\n' : `; reference ${runs.reference[r].wall.toFixed(2)} s ${runs.reference[r].peakMiB.toFixed(0)} MiB\n`),
    );
  }
  const report = JSON.parse(readFileSync(out, 'utf8'));
  const byName = new Map(report.models.map((m) => [m.name, m]));
  const ref = refOut ? JSON.parse(refOut).models : null;
  const figures = FIGURES.map(([label, fgKey, refKey, exact]) => {
    let worst = 0;
    let status = ref ? 'pass' : 'n/a';
    let example = null;
    for (const { name } of list) {
      const a = byName.get(name)?.metrics?.[fgKey];
      example ??= a ?? null;
      if (!ref) continue;
      const b = ref[name]?.[refKey];
      if (typeof a !== 'number' || typeof b !== 'number') {
        status = 'fail';
        continue;
      }
      const relative = exact ? Math.abs(a - b) : Math.abs(a - b) / Math.max(Math.abs(b), Number.MIN_VALUE);
      worst = Math.max(worst, relative);
      if (exact ? a !== b : relative > RELATIVE_TOLERANCE) status = 'fail';
    }
    return {
      label: `${label} (first model shown; largest difference of ${list.length})`,
      fitgate: example,
      reference: ref ? (ref[list[0].name]?.[refKey] ?? null) : null,
      relative: ref ? worst : null,
      status,
    };
  });
  return {
    fitgate: {
      wall: median(runs.fitgate.map((x) => x.wall)),
      peakMiB: median(runs.fitgate.map((x) => x.peakMiB)),
      walls: runs.fitgate.map((x) => x.wall),
      verdict: report.verdict,
    },
    reference: ref
      ? {
          wall: median(runs.reference.map((x) => x.wall)),
          peakMiB: median(runs.reference.map((x) => x.peakMiB)),
          walls: runs.reference.map((x) => x.wall),
          timings: { loop: JSON.parse(refOut).seconds },
        }
      : null,
    figures,
    trainBytes: list.reduce((sum, m) => sum + statSync(path.join(repo, m.train)).size + statSync(path.join(repo, m.holdout)).size, 0),
  };
}

const fmt = (x, digits = 3) =>
  x === null || x === undefined ? '-' : typeof x !== 'number' ? String(x) : Number.isInteger(x) ? String(x) : x.toPrecision(digits);

function table(rows) {
  const widths = rows[0].map((_, j) => Math.max(...rows.map((r) => String(r[j]).length)));
  const line = (r) => `| ${r.map((c, j) => String(c).padEnd(widths[j])).join(' | ')} |`;
  return [line(rows[0]), `| ${widths.map((w) => '-'.repeat(w)).join(' | ')} |`, ...rows.slice(1).map(line)].join('\n');
}

/**
 * Seconds of one read-and-parse pass over a training file alone (readTableChunks of the sources,
 * compiled by tsc into the work folder once): the share of a streamed model's wall time each of its
 * passes over the file costs.
 */
function readPassSeconds(options, file) {
  const out = path.join(options.work, 'js');
  if (!existsSync(path.join(out, 'data', 'table.js'))) {
    execFileSync(process.execPath, [
      path.join(root, 'node_modules', 'typescript', 'bin', 'tsc'),
      '-p',
      path.join(root, 'tsconfig.json'),
      '--outDir',
      out,
    ]);
    writeFileSync(path.join(out, 'package.json'), '{ "type": "module" }\n');
    if (!existsSync(path.join(out, 'node_modules'))) symlinkSync(path.join(root, 'node_modules'), path.join(out, 'node_modules'));
  }
  const script = `
const [dir, file] = process.argv.slice(1);
const { readTableChunks } = await import(dir + '/data/table.js');
const { createFsRepository } = await import(dir + '/repo/fs-repository.js');
const path = await import('node:path');
const repo = createFsRepository(path.dirname(file));
const columns = ['x1','x2','x3','x4','x5','x6','x7','x8','y'];
const t = process.hrtime.bigint();
let rows = 0;
for await (const c of readTableChunks(repo, path.basename(file), { columns, maxBytes: 2 ** 40, recycle: true })) rows += c.rows;
process.stdout.write(String(Number(process.hrtime.bigint() - t) / 1e9));
`;
  const run = spawnSync(process.execPath, ['--input-type=module', '-e', script, out, file], { encoding: 'utf8', cwd: root });
  if (run.status !== 0) throw new Error(`read pass failed: ${run.stderr}`);
  return Number(run.stdout);
}

async function main() {
  const options = parseOptions(process.argv.slice(2));
  const cli = options.cli;
  if (!existsSync(cli)) {
    process.stderr.write('dist/cli/index.js is missing; building it (npm run bundle)...\n');
    execFileSync(process.execPath, [path.join(root, 'test', 'tools', 'bundle.mjs')], { stdio: 'inherit', cwd: root });
  }
  mkdirSync(options.work, { recursive: true });
  const { repo, files } = buildRepository(options);
  const refMissing = referenceAvailable(options);
  const env = benchEnvironment(options);
  const envNote = options.inheritEnv ? "the caller's environment" : `a minimal environment (${Object.keys(env).join(', ')}) for both tools`;
  process.stderr.write(`peak memory: ${memoryMethod()}; reference: ${refMissing ?? options.reference}; ${envNote}\n`);

  const results = {};
  for (const size of options.sizes) {
    const w = WORKLOADS[size];
    if (w.monorepo) {
      results[size] = await runMonorepo(options, size, env, refMissing);
      continue;
    }
    const f = files[size];
    const runs = { fitgate: [], reference: [] };
    let fgOut = null;
    let refOut = null;
    for (let r = 0; r < options.runs; r++) {
      // Taking turns: fitgate, then the reference, on the same files.
      const fg = await measure(process.execPath, [cli, 'check', f.descriptor, '--format', 'json'], { cwd: repo, okStatus: [0, 1], env });
      runs.fitgate.push(fg);
      fgOut = fg.stdout;
      // The compressed twin's reference would read the same rows again: XL's reference stands for both.
      if (!refMissing && !w.gzip) {
        const classifier = w.task === 'classification';
        const script = classifier ? path.join(path.dirname(options.reference), 'ref_logistic.py') : options.reference;
        const args = [
          script,
          ...(classifier ? ['check'] : []),
          '--train',
          f.train,
          '--holdout',
          f.holdout,
          '--degree',
          String(w.degree),
          '--ridge',
          '1',
          '--folds',
          String(w.folds),
        ];
        if (w.loocv) args.push('--loocv');
        const ref = await measure('/usr/bin/python3', args, { cwd: repo, env });
        runs.reference.push(ref);
        refOut = ref.stdout;
      }
      process.stderr.write(
        `${size} run ${r + 1}/${options.runs}: fitgate ${fg.wall.toFixed(2)} s ${fg.peakMiB.toFixed(0)} MiB` +
          (refMissing || w.gzip
            ? '\n'
            : `; reference ${runs.reference[r].wall.toFixed(2)} s ${runs.reference[r].peakMiB.toFixed(0)} MiB\n`),
      );
    }
    const fg = fitgateFigures(fgOut);
    const ref = refOut ? JSON.parse(refOut) : null;
    results[size] = {
      fitgate: {
        wall: median(runs.fitgate.map((x) => x.wall)),
        peakMiB: median(runs.fitgate.map((x) => x.peakMiB)),
        walls: runs.fitgate.map((x) => x.wall),
        verdict: fg.verdict,
      },
      reference: ref
        ? {
            wall: median(runs.reference.map((x) => x.wall)),
            peakMiB: median(runs.reference.map((x) => x.peakMiB)),
            walls: runs.reference.map((x) => x.wall),
            timings: ref.timings_s ?? ref.timings,
          }
        : null,
      figures:
        w.task === 'classification'
          ? ref
            ? compareClassifierFigures(fg.figures, ref)
            : CLASSIFIER_FIGURES.map(([label, key]) => ({
                label,
                fitgate: fg.figures[key],
                reference: null,
                relative: null,
                status: 'n/a',
              }))
          : ref
            ? compareFigures(fg.figures, ref)
            : FIGURES.map(([label, key]) => ({ label, fitgate: fg.figures[key], reference: null, relative: null, status: 'n/a' })),
      trainBytes: statSync(f.train).size + statSync(f.holdout).size,
      csvBytes: f.csvBytes,
      stages: options.stages && size.startsWith('XL') ? readPassSeconds(options, f.train) : null,
    };
  }

  // Timing table.
  const head = [
    'size',
    'fitgate wall s',
    'fitgate peak MiB',
    'reference wall s',
    'reference peak MiB',
    'wall ratio',
    'memory ratio',
    'target',
    'met',
  ];
  const rows = [head];
  for (const size of options.sizes) {
    const w = WORKLOADS[size];
    const r = results[size];
    const wallRatio = r.reference ? r.fitgate.wall / r.reference.wall : null;
    const memRatio = r.reference ? r.fitgate.peakMiB / r.reference.peakMiB : null;
    const target = `wall <= ${w.wallRatio}x, ` + (w.memMiB !== null ? `memory <= ${w.memMiB} MiB` : `memory <= ${w.memRatio}x`);
    const memOk = w.memMiB !== null ? r.fitgate.peakMiB <= w.memMiB : memRatio !== null && memRatio <= w.memRatio;
    const met =
      wallRatio === null
        ? w.memMiB !== null
          ? `memory ${memOk ? 'yes' : 'NO'}; wall n/a`
          : 'n/a'
        : wallRatio <= w.wallRatio && memOk
          ? 'yes'
          : 'NO';
    r.ratios = { wall: wallRatio, memory: memRatio, met };
    rows.push([
      size,
      fmt(r.fitgate.wall),
      fmt(r.fitgate.peakMiB, 4),
      fmt(r.reference?.wall),
      fmt(r.reference?.peakMiB, 4),
      wallRatio === null ? '-' : `${wallRatio.toFixed(3)}x`,
      memRatio === null ? '-' : `${memRatio.toFixed(3)}x`,
      target,
      met,
    ]);
  }
  const big = options.sizes.filter((s) => s.startsWith('XL'));
  if (big.length > 0) {
    const tp = [['size', 'training CSV MB', 'stored MB', 'fitgate wall s', 'MB of CSV per s', 'peak MiB', 'one read+parse pass s']];
    for (const size of big) {
      const r = results[size];
      tp.push([
        size,
        fmt(r.csvBytes / 1e6, 5),
        fmt(statSync(files[size].train).size / 1e6, 5),
        fmt(r.fitgate.wall),
        fmt(r.csvBytes / 1e6 / r.fitgate.wall),
        fmt(r.fitgate.peakMiB, 4),
        fmt(r.stages),
      ]);
    }
    process.stdout.write(`\nStreamed workloads (throughput = training CSV text / whole wall time)\n\n${table(tp)}\n`);
  }
  process.stdout.write(
    `\nWhole processes, median of ${options.runs} (${os.cpus().length} cores, node ${process.version}; data: ${options.data ?? 'gen-data.mjs'}; ${envNote})\n\n${table(rows)}\n`,
  );

  // Figures.
  const figRows = [['size', 'figure', 'fitgate', 'reference', 'relative difference', 'within 1e-6']];
  for (const size of options.sizes) {
    for (const f of results[size].figures)
      figRows.push([
        size,
        f.label,
        fmt(f.fitgate, 12),
        fmt(f.reference, 12),
        f.relative === null ? '-' : f.relative.toExponential(2),
        f.status,
      ]);
  }
  process.stdout.write(`\nFigures (leaked rows exact)\n\n${table(figRows)}\n`);

  if (options.micro) {
    const { microBenchmark } = await import('./micro.mjs');
    const micro = await microBenchmark({ root });
    results.micro = micro;
    process.stdout.write(`\n${micro.text}\n`);
  }
  if (options.json) writeFileSync(options.json, `${JSON.stringify(results, null, 2)}\n`);
  const failed = options.sizes.some((s) => results[s].figures.some((f) => f.status === 'fail'));
  if (failed) process.exitCode = 1;
}

await main();
