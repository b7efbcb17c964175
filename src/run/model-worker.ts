/**
 * Models on worker threads: the main thread sends each model's descriptor (with the settings
 * file and, when comparing with a base commit, that model's base outcome) as plain data; a
 * worker reads the model's files from the same repository root, fits it, runs its checks and
 * sends the ModelResult back, with its thread's kernel notes. Results come back in descriptor
 * order, identical to a serial run.
 *
 * The worker runs this very module's file. The CLI is bundled into one file, so there the
 * worker loads the whole bundle: the bundle's entry must not start its own work in a worker
 * (it asks isFitgateWorker() of worker-role.ts first), and this module's top level starts the worker loop.
 * When the module is not JavaScript (a `.ts` file run through a transpiler, as in tests),
 * worker threads cannot load it and models run serially.
 */
import { fileURLToPath } from 'node:url';
import { workerData } from 'node:worker_threads';
import type { Descriptor, SettingsFile } from '../config/types.js';
import type { BaseMatch } from './base-comparison.js';
import { evaluateModel, type BaseInput } from './evaluate.js';
import { kernelNotes, recordKernelNotes } from '../kernels/index.js';
import { createFsRepository } from '../repo/fs-repository.js';
import type { RepoReader } from '../repo/types.js';
import { chartShare, type ChartShare } from '../result/chart-types.js';
import type { ModelResult } from '../result/result.js';
import { errorResult, timeLimitError } from './error-result.js';
import { runPool, serveTasks } from './pool.js';
import { isFitgateWorker, WORKER_FLAG } from './worker-role.js';
import { dataBytes, guessWork, largestFirst, workersThatPay } from './work-guess.js';

/** What every model worker receives as `workerData`. */
interface ModelWorkerData {
  [WORKER_FLAG]: true;
  /** Absolute repository root the worker reads from. */
  root: string;
  settings: SettingsFile;
}

/** One model to evaluate. */
interface ModelTask {
  descriptor: Descriptor;
  /** The base model this model is compared with (null: new), or undefined when not comparing. */
  baseline?: BaseMatch | null;
  commit?: string;
  /** The model's share of the run's chart data. */
  share: ChartShare;
}

/** What a worker sends back for a model: its outcome and the thread's kernel notes (kernels/engine.ts). */
interface ModelReply {
  result: ModelResult;
  kernelNotes: string[];
}

/** True in a model worker thread started by {@link evaluateModels} (the only kind of fitgate worker). */
export function isModelWorker(): boolean {
  return isFitgateWorker();
}

/**
 * The file a worker should run: this module's own file, or null when it is not plain JavaScript
 * (then worker threads cannot load it and models run serially).
 */
export function workerScript(): string | null {
  const url = import.meta.url;
  if (!url.startsWith('file:') || !/\.(m?js|cjs)$/.test(url)) return null;
  return fileURLToPath(url);
}

/** How to evaluate a list of models. */
export interface EvaluateModelsOptions {
  /** Largest number of worker threads; 1 (the default) runs serially on this thread. */
  jobs?: number;
  /**
   * Absolute root of the repository on disk, for the workers to read from. Workers are used only
   * when it is given (a reader in memory or on a git commit cannot cross threads). Default none.
   */
  root?: string;
  /** True: min(jobs, models) workers whatever the guessed work. Default false (as many as the work pays for). */
  exactJobs?: boolean;
  /** The base commit's outcomes to compare with. Default none. */
  base?: BaseInput;
  /**
   * Models in the run, for each model's share of the run's chart data (result/chart-types.ts
   * `chartShare(models, index)`, the index in `descriptors`). Default `descriptors.length`.
   */
  models?: number;
  /**
   * Called with each outcome as soon as it is final (on this thread alone: after each model; with
   * workers: after the pool, in descriptor order); the list returned holds what it returns. Default none.
   */
  onModel?: (model: ModelResult) => ModelResult;
}

/**
 * Evaluates models, on worker threads when that is possible and worth it (more than one model,
 * `jobs` > 1, a disk root, a JavaScript module file, and guessed work that pays for the workers:
 * work-guess.ts, unless `exactJobs`), serially otherwise. Workers get the models largest guessed work first.
 * @param repo the repository reader (used by the serial path)
 * @param descriptors the models, in report order
 * @param settings the settings file
 * @param options workers and base comparison; default serial, no comparison
 * @returns one ModelResult per descriptor, in the same order
 */
export async function evaluateModels(
  repo: RepoReader,
  descriptors: readonly Descriptor[],
  settings: SettingsFile,
  options: EvaluateModelsOptions = {},
): Promise<ModelResult[]> {
  const jobs = Math.min(options.jobs ?? 1, descriptors.length);
  const script = workerScript();
  const models = options.models ?? descriptors.length;
  const keep = options.onModel ?? ((model: ModelResult) => model);
  const serial = async (): Promise<ModelResult[]> => {
    const results: ModelResult[] = [];
    for (let i = 0; i < descriptors.length; i++)
      results.push(keep(await evaluateModel(repo, descriptors[i], settings, options.base, undefined, chartShare(models, i))));
    return results;
  };
  if (jobs <= 1 || options.root === undefined || script === null) return serial();
  const works: number[] = [];
  for (const descriptor of descriptors) works.push(guessWork(descriptor, await dataBytes(repo, descriptor)));
  const workers = options.exactJobs === true ? jobs : workersThatPay(works, jobs);
  if (workers <= 1) return serial();
  const base = options.base;
  const tasks: ModelTask[] = descriptors.map((descriptor, i) =>
    base
      ? { descriptor, baseline: base.matches.get(descriptor.file) ?? null, commit: base.commit, share: chartShare(models, i) }
      : { descriptor, share: chartShare(models, i) },
  );
  const data: ModelWorkerData = { [WORKER_FLAG]: true, root: options.root, settings };
  // The worker checks the model's time limit itself between stages; a model still running
  // HARD_STOP_GRACE_MS later is stuck in one step, and its thread is ended from here.
  const limitSeconds = settings.caps.maxModelSeconds;
  const replies = await runPool<ModelTask, ModelReply>(
    tasks,
    { jobs: workers, script, workerData: data, order: largestFirst(works) },
    {
      ms: limitSeconds * 1000 + HARD_STOP_GRACE_MS,
      onTimeLimit: (task, elapsedMs) => ({
        result: errorResult(
          task.descriptor.name,
          task.descriptor.file,
          timeLimitError(task.descriptor, limitSeconds, elapsedMs, null, settings.file),
        ),
        kernelNotes: [],
      }),
    },
  );
  for (const reply of replies) recordKernelNotes(reply.kernelNotes);
  return replies.map((reply) => keep(reply.result));
}

/**
 * Milliseconds past a model's time limit after which its worker thread is ended from outside:
 * the model's own checks stop it at the limit unless one step runs longer than this.
 */
export const HARD_STOP_GRACE_MS = 2000;

/** The worker loop: evaluate each model task sent by the pool. */
function startModelWorker(): void {
  const data = workerData as ModelWorkerData;
  const repo = createFsRepository(data.root);
  serveTasks<ModelTask, ModelReply>(async (task) => {
    const base: BaseInput | undefined =
      task.baseline === undefined
        ? undefined
        : { matches: new Map(task.baseline === null ? [] : [[task.descriptor.file, task.baseline]]), commit: task.commit ?? '' };
    const result = await evaluateModel(repo, task.descriptor, data.settings, base, undefined, task.share);
    return { result, kernelNotes: kernelNotes() };
  });
}

if (isModelWorker()) startModelWorker();
