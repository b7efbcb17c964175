/**
 * The whole run: settings file -> descriptors -> one outcome per model -> Result.
 * No output of its own: reporters format the Result; the entry points decide the exit status.
 */
import { checkUniqueNames } from '../config/descriptor.js';
import { discoverDescriptors } from '../config/discover.js';
import { loadSettings } from '../config/settings-file.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { kernelNotes } from '../kernels/index.js';
import { matchBase, type BaseInput } from './base-comparison.js';
import { wholeModelKeeper, type ModelHandoff } from './model-handoff.js';
import { evaluateModels, loadDescriptors, openModelThreads } from './model-worker.js';
import type { RepoReader } from '../repo/types.js';
import { summarise, type ModelResult, type Result } from '../result/result.js';
import type { Settings } from './settings.js';
import { formatShard, selectShard, type Shard } from './shard.js';
import { VERSION } from '../core/version.js';

/** Optional inputs of a run besides its settings. */
export interface PipelineOptions {
  /**
   * Outcomes of the models on the base commit of a pull request, by model name. When given,
   * every model gets a `base` comparison, matched by name, else by descriptor path, else by data
   * files (see base-comparison.ts; `new` when nothing matches), and the `base-change` check can
   * judge it. Default: no comparison.
   */
  baseline?: ReadonlyMap<string, ModelResult>;
  /** The base descriptors' data keys (base-comparison.ts `dataKey`) by base model name. Default none. */
  baselineData?: ReadonlyMap<string, string>;
  /** Called with the descriptors that loaded, before any model is checked (the base run uses it). Default none. */
  onDescriptors?: (descriptors: readonly Descriptor[]) => void;
  /** Full SHA of the commit the baseline comes from (recorded in each comparison). Default empty. */
  baseCommit?: string;
  /** Messages about the run as a whole, added to `result.notes`. Default none. */
  notes?: string[];
  /** Check only this shard of the descriptors (see shard.ts for the rule). Default: all of them. */
  shard?: Shard | null;
  /**
   * Largest number of threads to evaluate models on, the main thread included (workers: jobs - 1).
   * Default 1 (serial). Workers are used only when `root` is given too and there is more than one
   * model; results are the same either way.
   */
  jobs?: number;
  /** Absolute repository root on disk for worker threads to read from. Default none (serial). */
  root?: string;
  /**
   * True: start min(jobs, models) - 1 workers whatever the work (a count the user named, `--jobs N`).
   * Default false: as many as the guessed work pays for, at most `jobs` - 1 (run/work-guess.ts).
   */
  exactJobs?: boolean;
  /**
   * Called with each model's outcome as soon as it is final (a writer keeps its report text
   * elsewhere); the Result keeps what it returns instead (a smaller copy: the verdict and what
   * the summaries read). Called once per model, on the main thread, in the order the outcomes
   * become final (load errors first). Default: the Result keeps every outcome whole.
   */
  onModel?: (model: ModelResult) => ModelResult;
  /**
   * Each outcome rendered on the thread that evaluated it (a worker thread too) and taken on the
   * main thread (model-handoff.ts); `onModel` then sees only outcomes no thread could render.
   * Default none.
   */
  handoff?: ModelHandoff;
}

/**
 * The run's note on its settings: the file used, or that there was none and the built-in
 * defaults applied (limits as in docs/checks.md, descriptors matched by the default pattern).
 */
export function settingsNote(file: SettingsFile, configPath: string): string {
  if (file.file !== null) return `settings: ${file.file}`;
  return `settings: no file at ${configPath}; built-in defaults (descriptors ${file.models.join(', ')}, default limits)`;
}

/**
 * Checks every model of a run.
 * Problems with the settings file or the list of descriptors throw an InputError (nothing can be
 * checked). A descriptor or data file that is bad makes that model's verdict `error`; every
 * other model is still checked, so the Result always has every model's outcome. When the row
 * kernels fell back to JavaScript in this process, the Result's notes say so once.
 * @param settings what to check
 * @param repo the repository's files
 * @param options baseline of a base commit and run notes; default none
 */
export async function runPipeline(settings: Settings, repo: RepoReader, options: PipelineOptions = {}): Promise<Result> {
  const file = await loadSettings(repo, settings.config, { explicit: settings.configExplicit });
  const shard = options.shard ?? null;
  const discovery = await discoverDescriptors(repo, file, settings.descriptors);
  const paths = selectShard(discovery.paths, shard);
  const models: ModelResult[] = [];
  const loaded: Descriptor[] = [];
  const keepWhole = wholeModelKeeper(options.handoff, options.onModel);
  // Workers start now when the number of descriptors alone pays for them, and share the reading.
  const threads = { jobs: options.jobs, root: options.root, exactJobs: options.exactJobs };
  const pool = openModelThreads(paths.length, file, threads);
  try {
    for (const entry of await loadDescriptors(repo, paths, file, pool)) {
      if ('descriptor' in entry) loaded.push(entry.descriptor);
      else models.push(keepWhole(entry.failed));
    }
    checkUniqueNames(loaded);
    options.onDescriptors?.(loaded);
    const notes = [settingsNote(file, settings.config), ...(options.notes ?? []), ...(file.notes ?? []), ...discovery.notes];
    let base: BaseInput | undefined;
    if (options.baseline) {
      const matching = matchBase(loaded, [...options.baseline.values()], options.baselineData ?? new Map());
      base = { matches: matching.matches, commit: options.baseCommit ?? '' };
      // A shard checks part of the models, so the base models of the other shards match nothing here.
      if (shard === null) for (const m of matching.unmatched) notes.push(removedNote(m));
    }
    for (const model of await evaluateModels(repo, loaded, file, {
      ...threads,
      pool,
      onModel: options.onModel,
      handoff: options.handoff,
      base,
      models: paths.length,
    }))
      models.push(model);
    return finishRun(models, notes, shard, paths.length);
  } finally {
    pool?.close();
  }
}

/** The Result of a run from its models' outcomes and notes: the shard's note, the kernels' note, the summary. */
function finishRun(models: ModelResult[], notes: string[], shard: Shard | null, count: number): Result {
  if (shard) notes.push(`shard ${formatShard(shard)}: ${count} model${count === 1 ? '' : 's'} of this run's share`);
  // The row kernels' note when they had to fall back to JavaScript (here or on a worker thread).
  for (const note of kernelNotes()) if (!notes.includes(note)) notes.push(note);
  const result = summarise(models, VERSION, notes);
  if (shard) result.shard = { index: shard.index, count: shard.count };
  return result;
}

/** Longest piece of a model name or path quoted in a note. */
const QUOTE = 80;

function quoted(text: string): string {
  const chars = [...text];
  return chars.length > QUOTE ? `${chars.slice(0, QUOTE - 1).join('')}…` : text;
}

/** The note of a base model that matched no model of this run. */
function removedNote(m: ModelResult): string {
  return `base model ${quoted(m.name)} (${quoted(m.descriptor)}) matches no model of this run by name, descriptor path or data files: it was removed, or renamed and moved with other data, and is not compared`;
}
