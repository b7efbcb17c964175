/**
 * Models on worker threads beside the main thread, in two rounds on the same threads. First the
 * descriptors: each thread loads some of them ({@link loadDescriptors}), so that the workers,
 * started as soon as the number of descriptors alone pays for them ({@link openModelThreads}),
 * have work while the rest is read. Then the models: the main thread sends each model's descriptor
 * (with the settings file and, when comparing with a base commit, that model's base outcome) as
 * plain data; a worker reads the model's files from the same repository root, fits it, runs its
 * checks and sends the ModelResult back (or, when the run asks for a handoff, its rendered copy
 * and text: model-handoff.ts), with its thread's kernel notes. The main thread evaluates models
 * too, from the small end of the list while the workers take the large end. Each outcome is
 * handed over as soon as it is final; the list comes back in descriptor order, identical to a
 * serial run.
 *
 * The worker runs this very module's file. The CLI is bundled into one file, so there the
 * worker loads the whole bundle: the bundle's entry must not start its own work in a worker
 * (it asks isFitgateWorker() of worker-role.ts first), and this module's top level starts the worker loop.
 * When the module is not JavaScript (a `.ts` file run through a transpiler, as in tests),
 * worker threads cannot load it and models run serially.
 */
import { fileURLToPath } from 'node:url';
import { workerData } from 'node:worker_threads';
import { loadDescriptor } from '../config/descriptor.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { InputError } from '../core/errors.js';
import type { BaseMatch } from './base-comparison.js';
import { evaluateModel, type BaseInput } from './evaluate.js';
import { kernelNotes, recordKernelNotes } from '../kernels/index.js';
import { createFsRepository } from '../repo/fs-repository.js';
import type { RepoReader } from '../repo/types.js';
import { chartShare, type ChartShare } from '../result/chart-types.js';
import type { ModelResult } from '../result/result.js';
import { errorResult, timeLimitError } from './error-result.js';
import { modelRender, wholeModelKeeper, type ModelHandoff, type RenderedModel } from './model-handoff.js';
import { openPool, serveTasks, type ThreadPool } from './pool.js';
import { isFitgateWorker, WORKER_FLAG } from './worker-role.js';
import { dataBytes, guessWork, largestFirst, MODEL_FIXED_OPERATIONS, workersThatPay } from './work-guess.js';

/** What every model worker receives as `workerData`. */
interface ModelWorkerData {
  [WORKER_FLAG]: true;
  /** Absolute repository root the worker reads from. */
  root: string;
  settings: SettingsFile;
}

/** What a model worker receives for a run over the repository at `root` (absolute) with these settings. */
function workerDataFor(root: string, settings: SettingsFile): ModelWorkerData {
  return { [WORKER_FLAG]: true, root, settings };
}

/** One descriptor to load (the first round). */
interface LoadTask {
  kind: 'load';
  /** Repository-relative path of the descriptor. */
  path: string;
}

/** A descriptor loaded, or the error outcome of one that could not be (an InputError of its file). */
export type LoadedDescriptor = { descriptor: Descriptor } | { failed: ModelResult };

/** One model to evaluate (the second round). */
interface ModelTask {
  kind: 'evaluate';
  descriptor: Descriptor;
  /** The base model this model is compared with (null: new), or undefined when not comparing. */
  baseline?: BaseMatch | null;
  commit?: string;
  /** The model's share of the run's chart data. */
  share: ChartShare;
  /** Name of the render to apply before sending the outcome back (model-handoff.ts), or undefined: send it whole. */
  render?: string;
}

/**
 * What a worker sends back for a model: its outcome whole or rendered (model-handoff.ts), and the
 * thread's kernel notes (kernels/engine.ts).
 */
type ModelReply = ({ result: ModelResult } | { rendered: RenderedModel }) & { kernelNotes: string[] };

/** Threads for a run's models: how many the run may use and what they need. */
export interface ModelThreadOptions {
  /** Largest number of threads evaluating models, this one included (workers: jobs - 1). Default 1 (serial). */
  jobs?: number;
  /**
   * Absolute root of the repository on disk, for the workers to read from. Workers are used only
   * when it is given (a reader in memory or on a git commit cannot cross threads). Default none.
   */
  root?: string;
  /** True: min(jobs, models) - 1 workers whatever the guessed work. Default false (as many as the work pays for). */
  exactJobs?: boolean;
}

/**
 * Starts the workers for a run of `count` descriptors when their number alone pays for at least
 * one (each model's fixed work, work-guess.ts `MODEL_FIXED_OPERATIONS`, a lower bound of its
 * guessed work), or when `exactJobs`; null otherwise (one model, `jobs` 1, no disk root, a module
 * that is not JavaScript, or too little fixed work: {@link evaluateModels} may still start workers
 * once the data sizes are known). The workers load their script while this thread reads the
 * descriptors. The caller must close the pool.
 * @param count descriptors the run found
 * @param settings the settings file (every worker gets it)
 * @param options threads allowed and the repository root
 */
export function openModelThreads(count: number, settings: SettingsFile, options: ModelThreadOptions): ThreadPool | null {
  const jobs = Math.min(options.jobs ?? 1, count);
  const script = workerScript();
  if (jobs <= 1 || options.root === undefined || script === null) return null;
  const workers = options.exactJobs === true ? jobs - 1 : workersThatPay(new Array<number>(count).fill(MODEL_FIXED_OPERATIONS), jobs);
  if (workers < 1) return null;
  return openPool({ jobs: workers, script, workerData: workerDataFor(options.root, settings) });
}

/**
 * Loads every descriptor, on the pool's workers and this thread together when a pool is given
 * ({@link openModelThreads}), else here one after another. A descriptor that cannot be loaded
 * (an InputError) becomes its model's error outcome; any other error is thrown.
 * @param repo the repository reader (used on this thread)
 * @param paths repository-relative descriptor paths
 * @param settings the settings file
 * @param pool the run's workers, or null
 * @returns one entry per path, in the same order
 */
export async function loadDescriptors(
  repo: RepoReader,
  paths: readonly string[],
  settings: SettingsFile,
  pool: ThreadPool | null,
): Promise<LoadedDescriptor[]> {
  if (pool === null || paths.length < 2) {
    const loaded: LoadedDescriptor[] = [];
    for (const path of paths) loaded.push(await loadOne(repo, path, settings));
    return loaded;
  }
  const tasks: LoadTask[] = paths.map((path) => ({ kind: 'load', path }));
  return pool.run<LoadTask, LoadedDescriptor>(tasks, { local: (task) => loadOne(repo, task.path, settings) });
}

/** One descriptor loaded, or its model's error outcome when its file is bad (an InputError). */
async function loadOne(repo: RepoReader, path: string, settings: SettingsFile): Promise<LoadedDescriptor> {
  try {
    return { descriptor: await loadDescriptor(repo, path, settings) };
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    return { failed: errorResult(path, path, error) };
  }
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
export interface EvaluateModelsOptions extends ModelThreadOptions {
  /**
   * Workers already started for the run ({@link openModelThreads}): used, and grown when the
   * guessed work pays for more; the caller closes them. Default none (started here as needed, and
   * ended before returning).
   */
  pool?: ThreadPool | null;
  /** The base commit's outcomes to compare with. Default none. */
  base?: BaseInput;
  /**
   * Models in the run, for each model's share of the run's chart data (result/chart-types.ts
   * `chartShare(models, index)`, the index in `descriptors`). Default `descriptors.length`.
   */
  models?: number;
  /**
   * Called on this thread with each whole outcome as soon as it is final, in the order they
   * finish; the list returned holds what it returns. Default none.
   */
  onModel?: (model: ModelResult) => ModelResult;
  /**
   * Each outcome rendered on the thread that evaluated it and taken on this one (model-handoff.ts);
   * when given, `onModel` is called only for outcomes no thread could render. Default none.
   */
  handoff?: ModelHandoff;
}

/**
 * Evaluates models, on worker threads beside this one when that is possible and worth it (more
 * than one model, `jobs` > 1, a disk root, a JavaScript module file, and guessed work that pays
 * for the workers: work-guess.ts, unless `exactJobs`), serially otherwise. Workers take the models
 * largest guessed work first, this thread the smallest first.
 * @param repo the repository reader (used on this thread)
 * @param descriptors the models, in report order
 * @param settings the settings file
 * @param options threads, handover and base comparison; default serial, outcomes kept whole, no comparison
 * @returns one ModelResult per descriptor (what the handover kept), in the same order
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
  const keep = wholeModelKeeper(options.handoff, options.onModel);
  const here = (i: number): Promise<ModelResult> =>
    evaluateModel(repo, descriptors[i], settings, options.base, undefined, chartShare(models, i));
  const serial = async (): Promise<ModelResult[]> => {
    const results: ModelResult[] = [];
    for (let i = 0; i < descriptors.length; i++) results.push(keep(await here(i)));
    return results;
  };
  const given = options.pool ?? null;
  if (jobs <= 1 || options.root === undefined || script === null) return serial();
  const works: number[] = [];
  for (const descriptor of descriptors) works.push(guessWork(descriptor, await dataBytes(repo, descriptor)));
  const workers = options.exactJobs === true ? jobs - 1 : workersThatPay(works, jobs);
  if (workers < 1 && given === null) return serial();
  const pool = given ?? openPool({ jobs: workers, script, workerData: workerDataFor(options.root, settings) });
  pool.grow(workers);
  try {
    return await evaluateOnPool(pool, descriptors, works, settings, options, here, keep);
  } finally {
    if (given === null) pool.close();
  }
}

/** The second round of {@link evaluateModels} on a pool: models largest first on the workers, smallest first here. */
async function evaluateOnPool(
  pool: ThreadPool,
  descriptors: readonly Descriptor[],
  works: readonly number[],
  settings: SettingsFile,
  options: EvaluateModelsOptions,
  here: (i: number) => Promise<ModelResult>,
  keep: (model: ModelResult) => ModelResult,
): Promise<ModelResult[]> {
  const models = options.models ?? descriptors.length;
  const base = options.base;
  const render = options.handoff?.render;
  const tasks: ModelTask[] = descriptors.map((descriptor, i) => ({
    kind: 'evaluate',
    descriptor,
    share: chartShare(models, i),
    ...(base ? { baseline: base.matches.get(descriptor.file) ?? null, commit: base.commit } : {}),
    ...(render === undefined ? {} : { render }),
  }));
  const indexOf = new Map<ModelTask, number>(tasks.map((task, i) => [task, i]));
  const handoff = options.handoff;
  // The worker checks the model's time limit itself between stages; a model still running
  // HARD_STOP_GRACE_MS later is stuck in one step, and its thread is ended from here.
  const limitSeconds = settings.caps.maxModelSeconds;
  const kept = await pool.run<ModelTask, ModelReply>(
    tasks,
    {
      order: largestFirst(works),
      local: async (task) => ({ result: await here(indexOf.get(task) ?? -1), kernelNotes: [] }),
      onResult: (reply) => {
        recordKernelNotes(reply.kernelNotes);
        const result =
          'rendered' in reply && handoff !== undefined ? handoff.take(reply.rendered) : keep((reply as { result: ModelResult }).result);
        return { result, kernelNotes: [] };
      },
    },
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
  return kept.map((reply) => (reply as { result: ModelResult }).result);
}

/**
 * Milliseconds past a model's time limit after which its worker thread is ended from outside:
 * the model's own checks stop it at the limit unless one step runs longer than this.
 */
export const HARD_STOP_GRACE_MS = 2000;

/** The worker loop: load each descriptor and evaluate each model the pool sends. */
function startModelWorker(): void {
  const data = workerData as ModelWorkerData;
  const repo = createFsRepository(data.root);
  serveTasks<LoadTask | ModelTask, LoadedDescriptor | ModelReply>(async (task) => {
    if (task.kind === 'load') return loadOne(repo, task.path, data.settings);
    const base: BaseInput | undefined =
      task.baseline === undefined
        ? undefined
        : { matches: new Map(task.baseline === null ? [] : [[task.descriptor.file, task.baseline]]), commit: task.commit ?? '' };
    const result = await evaluateModel(repo, task.descriptor, data.settings, base, undefined, task.share);
    const render = task.render === undefined ? undefined : modelRender(task.render);
    return render === undefined ? { result, kernelNotes: kernelNotes() } : { rendered: render(result), kernelNotes: kernelNotes() };
  });
}

if (isModelWorker()) startModelWorker();
