/**
 * The check run both entries share, the `fitgate check` command (cli.ts) and the action
 * (main.ts): the base commit's outcomes when a base is given, then the pipeline over the
 * repository on disk, on worker threads as the work pays for them. Reporting stays with each
 * entry (the command writes one report and the file reports; the action annotates, summarises
 * and comments).
 */
import type { ModelHandoff } from '../run/model-handoff.js';
import type { PipelineOptions } from '../run/pipeline.js';
import { runPipeline } from '../run/pipeline.js';
import { defaultJobs } from '../run/pool.js';
import type { Settings } from '../run/settings.js';
import type { Shard } from '../run/shard.js';
import { createFsRepository } from '../repo/fs-repository.js';
import type { ModelResult, Result } from '../result/result.js';

/** How to run a check besides its settings. */
export interface CheckRunOptions {
  /** The base commit to compare with (a SHA or any revision git understands), or null: no comparison. */
  base: string | null;
  /** Which entry runs: its hint on fetching a base commit git does not have (action/base-commit.ts). */
  entry: 'command' | 'action';
  /** Check only this shard of the models, or null for all of them. */
  shard: Shard | null;
  /** Threads named by the user (`--jobs N`: the main thread and exactly min(N, models) - 1 workers), or null: up to one per core, as many as the work pays for. */
  jobs: number | null;
  /** Called with each model's outcome as soon as it is final; the Result keeps what it returns (run/pipeline.ts `onModel`). Default none. */
  onModel?: (model: ModelResult) => ModelResult;
  /** Each outcome rendered where it was evaluated and taken on the main thread (run/model-handoff.ts). Default none. */
  handoff?: ModelHandoff;
}

/**
 * Runs the check of a repository on disk.
 * @param settings the run's settings (`settings.root` is the repository's real path)
 * @param options base commit, shard and worker threads
 * @returns the Result (reporters format it; the entry sets the exit status)
 * @throws InputError when the settings file or the list of descriptors is bad (nothing can be checked)
 */
export async function runCheck(settings: Settings, options: CheckRunOptions): Promise<Result> {
  let baseOptions: PipelineOptions = {};
  if (options.base !== null) {
    // Loaded when asked for, so that a plain check starts fast.
    const { ACTION_FETCH_HINT, CLI_FETCH_HINT, evaluateBase } = await import('../action/base-commit.js');
    baseOptions = await evaluateBase(settings, options.base, {
      fetchHint: options.entry === 'action' ? ACTION_FETCH_HINT : CLI_FETCH_HINT,
    });
  }
  return runPipeline(settings, createFsRepository(settings.root), {
    ...baseOptions,
    shard: options.shard,
    jobs: options.jobs ?? defaultJobs(),
    exactJobs: options.jobs !== null,
    onModel: options.onModel,
    handoff: options.handoff,
    root: settings.root,
  });
}
