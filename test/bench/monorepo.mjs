// The many-models workloads of ../shared/bench/README.md: a repository of many small models, each
// one cubic polynomial term of one input with ridge 0.1 and 5 contiguous folds, its own training
// and hold-out files (hold-out rows = a quarter of the training rows, as in workload S), data from
// gen-data.mjs (the reference generator's first feature: x1 in [0, 50], y = 2 sin(x1 / 8) + noise,
// 5 leaked rows), a different seed per model.
//
//   node test/bench/monorepo.mjs --out DIR --models N --rows R [--seed S]
//
// Writes DIR/fitgate.yml, DIR/models/mNNNN.model.yml and DIR/data/mNNNN/{train,holdout}.csv, and
// DIR/models.json: the list [{ name, descriptor, train, holdout }] (paths relative to DIR) the
// looped reference (ref-loop.py) reads.
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { generate } from './gen-data.mjs';

/** The many-models workloads: models, training rows per model, and the model's settings. */
export const MONOREPO_WORKLOADS = {
  R1000: { models: 1000, rows: 1000, holdoutRows: 250, degree: 3, ridge: 0.1, folds: 5, seed: 1000 },
  R200: { models: 200, rows: 2000, holdoutRows: 500, degree: 3, ridge: 0.1, folds: 5, seed: 2000 },
};

const name = (i) => `m${String(i + 1).padStart(4, '0')}`;

/** The descriptor of one model of a many-models workload. */
export function monorepoDescriptor(model, w) {
  return `# Many-models benchmark (written by test/bench/monorepo.mjs)
version: 1
name: ${model}
data:
  train: ../data/${model}/train.csv
  holdout: ../data/${model}/holdout.csv
  target: y
terms:
  - polynomial: { of: x1, degree: ${w.degree} }
fit:
  intercept: true
  ridge: ${w.ridge}
  folds: ${w.folds}
  fold_order: blocks
`;
}

/**
 * Builds (or reuses, when DIR/params.json says it was built with the same parameters) the
 * repository of one many-models workload.
 * @param dir the repository folder
 * @param w a workload of {@link MONOREPO_WORKLOADS} (models, rows, holdoutRows, degree, ridge, folds, seed)
 * @returns { repo: dir, list: [{ name, descriptor, train, holdout }] }, paths relative to dir
 */
export function buildMonorepo(dir, w) {
  const stamp = path.join(dir, 'params.json');
  const params = JSON.stringify({ ...w, generator: 1 });
  const listFile = path.join(dir, 'models.json');
  if (existsSync(stamp) && readFileSync(stamp, 'utf8') === params && existsSync(listFile))
    return { repo: dir, list: JSON.parse(readFileSync(listFile, 'utf8')) };
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(path.join(dir, 'models'), { recursive: true });
  writeFileSync(path.join(dir, 'fitgate.yml'), 'version: 1\nmodels:\n  - "models/*.model.yml"\n');
  const list = [];
  for (let i = 0; i < w.models; i++) {
    const model = name(i);
    const data = path.join('data', model);
    generate({ out: path.join(dir, data), rows: w.rows, holdoutRows: w.holdoutRows, features: 1, seed: w.seed + i });
    const descriptor = path.join('models', `${model}.model.yml`);
    writeFileSync(path.join(dir, descriptor), monorepoDescriptor(model, w));
    list.push({ name: model, descriptor, train: path.join(data, 'train.csv'), holdout: path.join(data, 'holdout.csv') });
  }
  writeFileSync(listFile, `${JSON.stringify(list)}\n`);
  writeFileSync(stamp, params);
  return { repo: dir, list };
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const args = process.argv.slice(2);
  const get = (flag, fallback) => {
    const i = args.indexOf(flag);
    if (i < 0 || i + 1 >= args.length) {
      if (fallback !== undefined) return fallback;
      throw new Error(`missing ${flag}`);
    }
    return args[i + 1];
  };
  const models = Number(get('--models'));
  const rows = Number(get('--rows'));
  const w = {
    ...MONOREPO_WORKLOADS.R1000,
    models,
    rows,
    holdoutRows: Math.max(5, Math.round(rows / 4)),
    seed: Number(get('--seed', '1000')),
  };
  const { list } = buildMonorepo(path.resolve(get('--out')), w);
  process.stderr.write(`${list.length} models written\n`);
}
