/**
 * The worker pool's guess of each model's work, made before any model is planned (its rows are
 * not known yet: only its descriptor and the sizes of its data files), and the number of worker
 * threads that work pays for. A worker costs a fixed start (loading the bundle, compiling the code
 * again in its own isolate) and memory of its own; a run whose whole work is a fraction of a
 * second is faster on the main thread alone.
 *
 * The unit is the operation of cost.ts. The constants are rough and were measured on the
 * development machine (2 cores, Node.js 20) with whole runs: the bundled examples (6 models of
 * a few kilobytes) take about 0.35 s on one thread and more with two workers; 1,000 models of
 * 1,000 rows (about 45 kB of CSV each) take about 6 ms a model, and about 3 ms more each on a
 * worker ({@link MODEL_TRANSFER_OPERATIONS}), so they run on the main thread; the benchmark's
 * workload L (139 MB, 25 columns) about 10 s.
 */
import type { Descriptor } from '../config/types.js';
import type { RepoReader } from '../repo/types.js';

/** Operations a model costs whatever its size: its descriptor, plan, checks and part of the Result (about 5 ms). */
export const MODEL_FIXED_OPERATIONS = 2.5e6;

/** Operations per byte of a model's data files, for a design of {@link BYTE_COLUMNS} columns (reading, passes and diagnostics). */
export const OPERATIONS_PER_BYTE = 40;

/** Design columns {@link OPERATIONS_PER_BYTE} was measured at; the guess grows with the square of the columns guessed. */
export const BYTE_COLUMNS = 25;

/** Operations a model must be guessed at, in total, for each worker thread the run starts (about 0.5 s of work each). */
export const WORKER_OPERATIONS = 2.5e8;

/**
 * Operations a model costs on a worker thread beyond its own work, about 3 ms: its task and its
 * Result cloned across the threads (a Result is bounded by the run's chart data,
 * result/chart-types.ts) and taken in by the main thread, code warmed up and garbage collected in
 * one more isolate. Measured with whole runs: two workers took 3.7 s more CPU time than the main
 * thread alone for 1,000 models of 1,000 rows, 1.7 s more for 200 models of 2,000 rows.
 */
export const MODEL_TRANSFER_OPERATIONS = 1.5e6;

/** Operations a worker thread costs to start, about 0.4 s: it loads the bundle and compiles the code again in its own isolate. */
export const WORKER_START_OPERATIONS = 2e8;

/**
 * Workers start only when their run is guessed to take at most this fraction of the serial run's
 * time: a margin for what the guess cannot see (the main thread writing the reports meanwhile,
 * cores shared with other processes).
 */
export const POOL_PAY_RATIO = 0.8;

/**
 * Design columns guessed from the descriptor alone: 1 for the intercept, then per term its
 * `degree` (polynomial), the count of its inputs (linear), or 4 for any other kind (knots,
 * centres and levels depend on the data). Only ranks the models and sizes the pool.
 */
export function guessColumns(descriptor: Descriptor): number {
  let p = descriptor.fit.intercept ? 1 : 0;
  for (const term of descriptor.terms) {
    if (term.kind === 'polynomial') p += term.degree;
    else if (term.kind === 'linear') p += term.columns.length;
    else p += 4;
  }
  return Math.max(1, p);
}

/**
 * The guessed work of one model: {@link MODEL_FIXED_OPERATIONS} plus its data bytes times
 * {@link OPERATIONS_PER_BYTE}, scaled by (guessed columns / {@link BYTE_COLUMNS})^2 but never
 * below a quarter of it (reading the bytes costs the same whatever the design).
 * @param descriptor the loaded descriptor
 * @param dataBytes bytes of its training and hold-out files (each file once)
 */
export function guessWork(descriptor: Descriptor, dataBytes: number): number {
  const scale = Math.max(0.25, (guessColumns(descriptor) / BYTE_COLUMNS) ** 2);
  return MODEL_FIXED_OPERATIONS + dataBytes * OPERATIONS_PER_BYTE * scale;
}

/**
 * Bytes of a model's data files (training and hold-out; a file named twice counts once). A file
 * that cannot be read counts 0: the model's own run reports it.
 */
export async function dataBytes(repo: RepoReader, descriptor: Descriptor): Promise<number> {
  const files = new Set<string>([descriptor.data.train, descriptor.data.holdout].flat());
  let bytes = 0;
  for (const file of files) {
    try {
      bytes += await repo.size(file);
    } catch {
      // The model's run reads the file again and reports the problem on that model.
    }
  }
  return bytes;
}

/**
 * Worker threads that the guessed work pays for: W = one per {@link WORKER_OPERATIONS} of the
 * total, at most `jobs` and at most one per model, then fewer while the guessed time of W workers,
 * max(largest model, (total + models x {@link MODEL_TRANSFER_OPERATIONS}) / W) +
 * {@link WORKER_START_OPERATIONS}, is more than {@link POOL_PAY_RATIO} of the total (the serial
 * run); 0 or 1 means the main thread alone.
 * @param works guessed work of each model ({@link guessWork})
 * @param jobs largest number of workers allowed (>= 1)
 */
export function workersThatPay(works: readonly number[], jobs: number): number {
  let total = 0;
  let largest = 0;
  for (const w of works) {
    total += w;
    largest = Math.max(largest, w);
  }
  const moved = total + works.length * MODEL_TRANSFER_OPERATIONS;
  let workers = Math.max(0, Math.min(Math.floor(jobs), works.length, Math.floor(total / WORKER_OPERATIONS)));
  while (workers >= 2 && Math.max(largest + MODEL_TRANSFER_OPERATIONS, moved / workers) + WORKER_START_OPERATIONS > POOL_PAY_RATIO * total)
    workers--;
  return workers;
}

/**
 * The order to hand models to workers: largest guessed work first (so that no large model starts
 * last and keeps one worker busy alone at the end), ties in descriptor order. Results still come
 * back in descriptor order.
 * @returns indices into `works`
 */
export function largestFirst(works: readonly number[]): number[] {
  return works.map((_, i) => i).sort((a, b) => works[b] - works[a] || a - b);
}
