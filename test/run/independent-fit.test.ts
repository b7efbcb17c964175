// The pipeline's figures against an independent least-squares solution: the design is rebuilt here
// from the CSV text with plain arrays and solved with ml-matrix's own QR decomposition on the
// explicitly augmented ridge system [Phi; sqrt(lambda) E] (a textbook identity: Hastie, Tibshirani &
// Friedman, The Elements of Statistical Learning, 2nd ed., exercise 3.12). Tolerance 1e-6 relative.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Matrix, QrDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { defaultSettings } from '../../src/run/settings.js';
import { fromJsonNumber, type ModelResult } from '../../src/result/result.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'examples');

function readCsv(file: string): Record<string, number[]> {
  const [head, ...rows] = readFileSync(path.join(root, file), 'utf8').trim().split('\n');
  const names = head.split(',');
  const out: Record<string, number[]> = Object.fromEntries(names.map((n) => [n, []]));
  for (const r of rows) r.split(',').forEach((v, j) => out[names[j]].push(Number(v)));
  return out;
}

const meanSd = (x: number[]): [number, number] => {
  const m = x.reduce((a, b) => a + b, 0) / x.length;
  return [m, Math.sqrt(x.reduce((a, b) => a + (b - m) ** 2, 0) / x.length)];
};

function rel(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
}

describe('press-yield example against an independent ridge solution', async () => {
  const result = await runPipeline(defaultSettings(root), createFsRepository(root));
  const model = result.models.find((m) => m.name === 'press-yield') as ModelResult;
  const train = readCsv('data/press-train.csv');
  const holdout = readCsv('data/press-holdout.csv');
  const inputs = ['apples_kg', 'press_min'];
  const stats = inputs.map((c) => meanSd(train[c]));
  const phi = (t: Record<string, number[]>) =>
    t.juice_l.map((_, i) => [
      1,
      ...inputs.flatMap((c, k) => {
        const z = (t[c][i] - stats[k][0]) / stats[k][1];
        return [z, z * z];
      }),
    ]);
  const X = phi(train);
  const p = X[0].length;
  const lambda = 0.1;
  const aug = [
    ...X,
    ...Array.from({ length: p - 1 }, (_, j) => Array.from({ length: p }, (_, k) => (k === j + 1 ? Math.sqrt(lambda) : 0))),
  ];
  const rhs = [...train.juice_l, ...new Array(p - 1).fill(0)];
  const w = new QrDecomposition(new Matrix(aug)).solve(Matrix.columnVector(rhs)).to1DArray();
  const rmse = (rows: number[][], y: number[]) =>
    Math.sqrt(rows.reduce((s, r, i) => s + (y[i] - r.reduce((a, v, j) => a + v * w[j], 0)) ** 2, 0) / y.length);

  it('has the same coefficients', () => {
    model.coefficients.forEach((c, j) => expect(rel(fromJsonNumber(c), w[j]), `coefficient ${j}: ${c} vs ${w[j]}`).toBeLessThan(1e-6));
  });

  it('has the same training and hold-out RMSE and gap ratio', () => {
    const tr = rmse(X, train.juice_l);
    const ho = rmse(phi(holdout), holdout.juice_l);
    expect(rel(fromJsonNumber(model.metrics?.train_rmse), tr)).toBeLessThan(1e-6);
    expect(rel(fromJsonNumber(model.metrics?.holdout_rmse), ho)).toBeLessThan(1e-6);
    expect(rel(fromJsonNumber(model.metrics?.gap_ratio), ho / tr)).toBeLessThan(1e-6);
  });

  it('has the same largest standardised coefficient', () => {
    const sdY = meanSd(train.juice_l)[1];
    let best = 0;
    for (let j = 1; j < p; j++) best = Math.max(best, (Math.abs(w[j]) * meanSd(X.map((r) => r[j]))[1]) / sdY);
    expect(rel(fromJsonNumber(model.metrics?.max_std_coefficient), best)).toBeLessThan(1e-6);
  });
});
