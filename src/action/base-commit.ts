/**
 * Evaluates every model as it was on a base commit, read with git from that commit (settings
 * file, descriptors and data alike), so that the head run can compare with it. Used by the
 * action on pull requests and by `fitgate check --base <ref>`. A base that cannot be read or
 * checked never stops the head run: it becomes one note.
 */
import { realpath } from 'node:fs/promises';
import path from 'node:path';
import { errorMessage } from '../core/errors.js';
import type { Descriptor } from '../config/types.js';
import { dataKey } from '../run/base-comparison.js';
import { runPipeline, type PipelineOptions } from '../run/pipeline.js';
import { createGitRepository, tryGitTopLevel, tryResolveCommit } from '../repo/git-repository.js';
import type { ModelResult } from '../result/result.js';
import type { Settings } from '../run/settings.js';

/** Options of {@link evaluateBase}. */
export interface BaseOptions {
  /** What to say after "base commit abc1234 is not available; " when git does not have it. */
  fetchHint: string;
}

/** Hint for the action: how to make the base commit available. */
export const ACTION_FETCH_HINT =
  'fetch it with `fetch-depth: 2` on actions/checkout (a pull_request checkout is the merge commit, whose first parent is the base). Models are not compared with the base branch in this run.';

/** Hint for the command line. */
export const CLI_FETCH_HINT =
  'fetch it (for example `git fetch origin <branch>`) or name a commit that exists locally. Models are not compared with a base in this run.';

/**
 * The head run's options from the base commit: the baseline by model name with each base model's
 * data files (to match renamed models) and the base SHA, or one note saying why there is no
 * comparison.
 * @param settings the head run's settings (the same settings file path and descriptors are read at the base)
 * @param revision the base commit: a SHA or any revision git understands
 * @param options the hint shown when git does not have the commit
 */
export async function evaluateBase(settings: Settings, revision: string, options: BaseOptions): Promise<PipelineOptions> {
  const short = /^[0-9a-f]{40,64}$/.test(revision) ? revision.slice(0, 7) : revision;
  const top = await tryGitTopLevel(settings.root);
  if (top === null)
    return {
      notes: [
        `base commit ${short} is not available: ${settings.root} is not inside a git work tree. Models are not compared with a base in this run.`,
      ],
    };
  const sha = await tryResolveCommit(settings.root, revision);
  if (sha === null) return { notes: [`base commit ${short} is not available; ${options.fetchHint}`] };

  const prefix = path
    .relative(await realpath(top), await realpath(settings.root))
    .split(path.sep)
    .join('/');
  const repo = createGitRepository({ cwd: settings.root, commit: sha, prefix });
  try {
    // Explicitly named descriptors that do not exist at the base are new in the head.
    const descriptors: string[] = [];
    for (const d of settings.descriptors) if (await repo.isFile(d)) descriptors.push(d);
    const baseline = new Map<string, ModelResult>();
    const baselineData = new Map<string, string>();
    if (settings.descriptors.length === 0 || descriptors.length > 0) {
      const configThere = await repo.isFile(settings.config);
      if (configThere || !settings.configExplicit) {
        // The data files of each base model, to find it again when a pull request renames and moves it.
        const onDescriptors = (loaded: readonly Descriptor[]): void => {
          for (const d of loaded) baselineData.set(d.name, dataKey(d));
        };
        const base = await runPipeline({ ...settings, descriptors }, repo, { onDescriptors });
        for (const m of base.models) baseline.set(m.name, m);
      }
    }
    return { baseline, baselineData, baseCommit: sha, notes: [] };
  } catch (error) {
    return {
      notes: [`base commit ${sha.slice(0, 7)} could not be checked (${errorMessage(error)}); models are not compared with it in this run.`],
    };
  }
}
