/**
 * The whole run: settings file -> descriptors -> one outcome per model -> Result.
 * No output of its own: reporters format the Result; the entry points decide the exit status.
 */
import { checkUniqueNames, loadDescriptor } from './config/descriptor.js';
import { discoverDescriptors } from './config/discover.js';
import { loadSettings } from './config/settings-file.js';
import type { Descriptor } from './config/types.js';
import { InputError } from './errors.js';
import { errorResult, evaluateModel } from './model/evaluate.js';
import type { RepoReader } from './repo/types.js';
import { summarise, type ModelResult, type Result } from './result.js';
import type { Settings } from './settings.js';
import { VERSION } from './version.js';

/**
 * Checks every model of a run.
 * Problems with the settings file or the list of descriptors throw an InputError (nothing can be
 * checked). A descriptor or data file that is bad makes that model's verdict `error`; every
 * other model is still checked, so the Result always has every model's outcome.
 * @param settings what to check
 * @param repo the repository's files
 */
export async function runPipeline(settings: Settings, repo: RepoReader): Promise<Result> {
  const file = await loadSettings(repo, settings.config, { explicit: settings.configExplicit });
  const paths = await discoverDescriptors(repo, file, settings.descriptors);
  const models: ModelResult[] = [];
  const loaded: Descriptor[] = [];
  for (const path of paths) {
    try {
      loaded.push(await loadDescriptor(repo, path, file));
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      models.push(errorResult(path, path, error));
    }
  }
  checkUniqueNames(loaded);
  for (const descriptor of loaded) models.push(await evaluateModel(repo, descriptor, file));
  return summarise(models, VERSION);
}
