// Measures what cross-validation costs next to a single fit (run by hand, never in a timed test):
//   npx tsc -p tsconfig.json --outDir /tmp/fg-build && node test/diagnostics/measure-cost.mjs /tmp/fg-build
// Workload: 100,000 rows x 20 parameters (intercept + 19 linear inputs), ridge 1, 5 shuffled folds.
// A single fit = build the design block by block, fold it into the QR factor, solve (as evaluate.ts).
// Cross-validation = the whole `crossValidate`: per-fold factors (pass 1), merges and k solves,
// out-of-fold scoring, leverages and PRESS (pass 2). Reports the median of 7 runs of each.
import { pathToFileURL } from 'node:url';
import { resolve } from 'node:path';

const build = resolve(process.argv[2] ?? 'lib');
const load = (p) => import(pathToFileURL(`${build}/${p}`).href);
const { linearTerm } = await load('basis/linear.js');
const { createDesign } = await load('design-matrix.js');
const { fitFactor, QrAccumulator } = await load('fit/index.js');
const { forEachBlock } = await load('model/blocks.js');
const { crossValidate } = await load('diagnostics/cross-validation.js');
const { assignFolds } = await load('diagnostics/folds.js');
const { seededRandom } = await load('diagnostics/random.js');

const n = 100_000;
const q = 19;
const u = seededRandom(1);
const inputs = Array.from({ length: q }, () => Float64Array.from({ length: n }, () => u()));
const y = Float64Array.from({ length: n }, (_, i) => inputs.reduce((s, c, j) => s + (j + 1) * c[i], 0) + u());
const design = createDesign([linearTerm({ kind: 'linear', columns: inputs.map((_, j) => `x${j}`), line: 1 })], true);
const rows = { inputs, y, rows: n };

function singleFit() {
  const acc = new QrAccumulator(design.p);
  forEachBlock(design, rows, (X, start, m) => acc.addRows(X, y.subarray(start, start + m), m));
  return fitFactor(acc, { ridge: 1, penalised: design.penalised });
}
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const time = (f) => {
  const t = performance.now();
  f();
  return performance.now() - t;
};
const fit = singleFit();
const folds = assignFolds(n, 5, 'shuffled', 1);
for (let w = 0; w < 2; w++) {
  singleFit();
  crossValidate(design, rows, fit, folds);
}
const fitTimes = [];
const cvTimes = [];
for (let r = 0; r < 7; r++) {
  fitTimes.push(time(singleFit));
  cvTimes.push(time(() => crossValidate(design, rows, fit, folds)));
}
const tf = median(fitTimes);
const tc = median(cvTimes);
process.stdout.write(
  `rows ${n}, parameters ${design.p}: single fit ${tf.toFixed(1)} ms, 5-fold + leave-one-out + GCV ${tc.toFixed(1)} ms, ratio ${(tc / tf).toFixed(2)} (goal < 3)\n`,
);
