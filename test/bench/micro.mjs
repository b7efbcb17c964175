// Micro benchmark: 5-fold cross-validation plus leave-one-out (PRESS from leverages) on 100,000
// rows x 20 parameters (an intercept and 19 linear columns) against a single fit (fold the rows
// into the QR factor and solve). Target: the cross-validation costs less than three times the fit.
// Runs a plain-JavaScript copy of src/ (TypeScript's transpileModule, one file at a time).
import { cpSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { median } from './measure.mjs';

function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)],
  );
}

async function transpile(root) {
  const ts = (await import('typescript')).default;
  const dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-micro-'));
  const src = path.join(root, 'src');
  for (const file of walk(src)) {
    const out = path.join(dir, path.relative(src, file));
    mkdirSync(path.dirname(out), { recursive: true });
    if (!file.endsWith('.ts')) {
      cpSync(file, out);
      continue;
    }
    const { outputText } = ts.transpileModule(readFileSync(file, 'utf8'), {
      compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2022 },
      fileName: file,
    });
    writeFileSync(out.replace(/\.ts$/, '.js'), outputText);
  }
  writeFileSync(path.join(dir, 'package.json'), '{ "type": "module" }\n');
  symlinkSync(path.join(root, 'node_modules'), path.join(dir, 'node_modules'), 'dir');
  return dir;
}

/** Runs the micro benchmark; resolves { fitMs, cvMs, ratio, met, text }. */
export async function microBenchmark({ root, rows = 100_000, inputs = 19, repeats = 5 }) {
  const lib = await transpile(root);
  try {
    const load = (rel) => import(pathToFileURL(path.join(lib, rel)).href);
    const { createTerm } = await load('design/terms/index.js');
    const { createDesign } = await load('design/design-matrix.js');
    const { QrAccumulator, fitFactor } = await load('fit/index.js');
    const { forEachBlock } = await load('design/blocks.js');
    const { crossValidate } = await load('diagnostics/cross-validation.js');
    const { assignFolds } = await load('diagnostics/folds.js');

    // Data: 19 uniform inputs, y = sum of inputs + noise (xorshift32; the figures do not matter).
    let s = 2463534242;
    const rand = () => {
      s ^= s << 13;
      s ^= s >>> 17;
      s ^= s << 5;
      return (s >>> 0) / 4294967296;
    };
    const names = Array.from({ length: inputs }, (_, j) => `x${j + 1}`);
    const columns = names.map(() => Float64Array.from({ length: rows }, rand));
    const y = new Float64Array(rows);
    for (let i = 0; i < rows; i++) for (let j = 0; j < inputs; j++) y[i] += columns[j][i] * (j + 1) + (rand() - 0.5) * 0.1;
    const byName = new Map(names.map((n, j) => [n, columns[j]]));
    const design = createDesign([createTerm({ kind: 'linear', columns: names, line: 1 }, byName, 'micro')], true);
    const data = { inputs: columns, y, rows };
    const fitOnce = () => {
      const factor = new QrAccumulator(design.p);
      forEachBlock(design, data, (X, start, m) => factor.addRows(X, y.subarray(start, start + m), m));
      return fitFactor(factor, { ridge: 1, penalised: design.penalised });
    };
    const folds = assignFolds(rows, 5, 'blocks', 1);
    const time = (fn) => {
      const t = process.hrtime.bigint();
      fn();
      return Number(process.hrtime.bigint() - t) / 1e6;
    };
    const fit = fitOnce();
    crossValidate(design, data, fit, folds); // warm-up
    const fitMs = median(Array.from({ length: repeats }, () => time(fitOnce)));
    const cvMs = median(Array.from({ length: repeats }, () => time(() => crossValidate(design, data, fit, folds))));
    const ratio = cvMs / fitMs;
    const met = ratio < 3;
    const text = `Micro benchmark (${rows} rows x ${design.p} parameters, median of ${repeats}): single fit ${fitMs.toFixed(1)} ms; 5-fold + leave-one-out ${cvMs.toFixed(1)} ms = ${ratio.toFixed(2)}x the fit (target < 3x): ${met ? 'met' : 'NOT met'}`;
    return { fitMs, cvMs, ratio, met, text };
  } finally {
    rmSync(lib, { recursive: true, force: true });
  }
}
