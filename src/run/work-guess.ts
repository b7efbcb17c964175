/**
 * The worker pool's guess of each model's work, made before any model is planned (its rows are
 * not known yet: only its descriptor and the sizes of its data files), and the number of worker
 * threads that work pays for beside the main thread (which evaluates models too). A worker takes
 * a while to start (it loads the bundle and compiles the code again in its own isolate), during
 * which the main thread works alone, and memory of its own; a run whose whole work is a fraction
 * of a second is faster on the main thread alone.
 *
 * The unit is the operation of cost.ts. The constants are rough and were measured on the
 * development machine (2 cores, Node.js 20) with whole runs: the bundled examples (6 models of
 * a few kilobytes) take about 0.35 s on one thread; 1,000 models of 1,000 rows (about 45 kB of
 * CSV each) about 6 ms a model; the benchmark's workload L (139 MB, 25 columns) about 10 s.
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
 * Operations a model costs the run beyond its own work when a worker evaluates it, about 8 ms: its
 * task and outcome (or the outcome's rendered copy and text, run/model-handoff.ts) cloned across the
 * threads and taken in, the code warmed up and the garbage collected in one more isolate, and the
 * engine's own threads (its collector and optimising compiler keep about 0.3 of a second core busy
 * beside each busy thread) sharing the cores. Measured with whole runs on 2 cores, the main thread
 * beside one worker against the main thread alone, in turns: 1,000 models of 1,000 rows 4.7 s
 * against 5.2 s, 200 models of 2,000 rows 2.0 s against 2.1 s, with about 35 MiB more memory; with
 * this value neither pays for the worker there (more cores leave room for more workers and for the
 * engine's threads).
 */
export const MODEL_TRANSFER_OPERATIONS = 4e6;
/**
 * Operations the main thread does alone while a worker starts, about 0.3 s: the worker loads the
 * bundle and compiles the code again in its own isolate before it takes its first model.
 */
export const WORKER_START_OPERATIONS = 1.5e8;
/**
 * Workers start only when their run is guessed to take at most this fraction of the serial run's
 * time: a margin for what the guess cannot see (cores shared with other processes, the code
 * warming up and collecting garbage in one more isolate).
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
 * The guessed time of a run on the main thread and `workers` workers, in operations: the main
 * thread works alone for {@link WORKER_START_OPERATIONS} while the workers start, then the rest and
 * the transfer of the models the workers take ({@link MODEL_TRANSFER_OPERATIONS} each, a share
 * workers / (workers + 1) of the models) are shared by the workers + 1 threads; never less than
 * the largest model. With no worker, the total.
 * @param total guessed work of all models
 * @param largest guessed work of the largest model
 * @param models number of models
 * @param workers worker threads beside the main thread (>= 0)
 */
export function guessedWall(total: number, largest: number, models: number, workers: number): number {
  if (workers <= 0 || total <= WORKER_START_OPERATIONS) return total;
  const threads = workers + 1;
  const moved = (models * workers) / threads;
  return Math.max(largest, WORKER_START_OPERATIONS + (total - WORKER_START_OPERATIONS + moved * MODEL_TRANSFER_OPERATIONS) / threads);
}

/**
 * Worker threads that the guessed work pays for beside the main thread: at most `jobs` - 1, one
 * per model beyond the first and one per {@link WORKER_OPERATIONS} of the total, the count with
 * the least {@link guessedWall} provided that is at most {@link POOL_PAY_RATIO} of the total (the
 * main thread alone); 0 means the main thread alone.
 * @param works guessed work of each model ({@link guessWork})
 * @param jobs threads allowed in all, the main thread included (>= 1)
 */
export function workersThatPay(works: readonly number[], jobs: number): number {
  let total = 0;
  let largest = 0;
  for (const w of works) {
    total += w;
    largest = Math.max(largest, w);
  }
  const most = Math.max(0, Math.min(Math.floor(jobs) - 1, works.length - 1, Math.floor(total / WORKER_OPERATIONS)));
  let best = 0;
  let bestWall = POOL_PAY_RATIO * total;
  for (let w = 1; w <= most; w++) {
    const wall = guessedWall(total, largest, works.length, w);
    if (wall <= bestWall) {
      best = w;
      bestWall = wall;
    }
  }
  return best;
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
