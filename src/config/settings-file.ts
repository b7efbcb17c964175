/**
 * The repository settings file (`fitgate.yml` by default): where the descriptors are, the
 * limits every model gets, defaults for `fit`, and resource caps.
 */

import { InputError, clip } from '../core/errors.js';
import { kindWords, NOT_A_FILE } from '../repo/repo-path.js';
import type { RepoReader } from '../repo/types.js';
import { limitDirection, limitOrderProblem } from './limits.js';
import { errorAt, schemaError } from './schema-errors.js';
import { validateSettingsValue } from './schemas.js';
import type { FoldOrder, LimitSpec, ParameterCount, SettingsFile } from './types.js';
import { readYamlFile, type YamlDocument } from './yaml-source.js';

/** Default settings path, relative to the repository root. */
export const DEFAULT_SETTINGS_PATH = 'fitgate.yml';

/** Descriptor glob used when there is no settings file. */
export const DEFAULT_MODEL_PATTERNS: readonly string[] = Object.freeze(['**/*.model.yml']);

/** Built-in `fit` defaults: 5 shuffled folds, seed 1. */
export const DEFAULT_FIT = Object.freeze({
  folds: 5,
  foldOrder: 'shuffled' as FoldOrder,
  seed: 1,
  parameterCount: 'columns' as ParameterCount,
});

/**
 * Built-in resource caps: 512 MiB per data file, 2e8 training rows x parameters, 2e10 estimated
 * operations per model (run/cost.ts; at most about 20 to 30 s of one core of a 2-core machine,
 * measured) and 40 s per model.
 */
export const DEFAULT_CAPS = Object.freeze({ maxFileMb: 512, maxCells: 200_000_000, maxOperations: 20_000_000_000, maxModelSeconds: 40 });

/** Stable codes of the errors this module throws (besides YAML and schema codes). */
export const SETTINGS_ERROR = Object.freeze({ missing: 'file-missing', limitOrder: 'limit-order' });

const MIB = 1024 * 1024;

/** Lines of each `models` pattern, kept beside a loaded settings object for later messages. */
const modelLines = new WeakMap<SettingsFile, number[]>();

/**
 * The settings line of the `index`-th `models` pattern, or null (no file, or settings not
 * made by {@link loadSettings}).
 */
export function modelPatternLine(settings: SettingsFile, index: number): number | null {
  return modelLines.get(settings)?.[index] ?? null;
}

/** Settings used when the repository has no settings file. */
export function defaultSettings(): SettingsFile {
  return {
    file: null,
    models: [...DEFAULT_MODEL_PATTERNS],
    limits: {},
    fit: { ...DEFAULT_FIT },
    caps: {
      maxFileBytes: DEFAULT_CAPS.maxFileMb * MIB,
      maxCells: DEFAULT_CAPS.maxCells,
      maxOperations: DEFAULT_CAPS.maxOperations,
      maxModelSeconds: DEFAULT_CAPS.maxModelSeconds,
    },
  };
}

/**
 * Loads and validates the settings file; a missing file at the default path gives defaults
 * with models ["**\/*.model.yml"]; a missing file given explicitly is an InputError.
 *
 * @param repo the repository
 * @param path repository-relative settings path (default {@link DEFAULT_SETTINGS_PATH} at the caller)
 * @param options `explicit`: the user named the file (default false), so it must exist
 * @throws InputError `file-missing`, `path-outside`, YAML errors, `schema`, `limit-order`
 */
export async function loadSettings(repo: RepoReader, path: string, options: { explicit?: boolean } = {}): Promise<SettingsFile> {
  const kind = await repo.entryKind(path);
  const notes = await yamlTwinNotes(repo, path);
  if (kind === 'missing') {
    if (options.explicit) {
      throw new InputError(
        SETTINGS_ERROR.missing,
        `settings file not found in ${repo.label}; expected a YAML file such as ${DEFAULT_SETTINGS_PATH}`,
        { file: path },
      );
    }
    return { ...defaultSettings(), notes };
  }
  if (kind !== 'file') {
    // A folder, a link to nothing or a FIFO where the settings belong is never taken for "no settings".
    throw new InputError(
      NOT_A_FILE,
      `the settings file ${kindWords(kind)}; expected a regular YAML file there, or nothing at all (for the defaults)`,
      { file: path },
    );
  }
  const doc = await readYamlFile(repo, path);
  // The same object (the pattern lines are kept beside it).
  const settings = settingsFromDocument(doc, path);
  settings.notes = notes;
  return settings;
}

/**
 * A note when a file named like `path` but ending `.yaml` sits beside it (fitgate reads only the
 * `.yml` name it was given): empty otherwise.
 */
async function yamlTwinNotes(repo: RepoReader, path: string): Promise<string[]> {
  if (!path.endsWith('.yml')) return [];
  const twin = `${path.slice(0, -4)}.yaml`;
  let kind: Awaited<ReturnType<typeof repo.entryKind>>;
  try {
    kind = await repo.entryKind(twin);
  } catch {
    return []; // a twin that leads outside is not read, and not ours to report
  }
  if (kind === 'missing') return [];
  return [
    `${clip(twin)} is not read: fitgate reads its settings from ${clip(path)} (rename the file, or name it with --config / the \`config\` input)`,
  ];
}

/**
 * Validates a parsed settings document and builds the {@link SettingsFile}.
 *
 * @param doc the parsed YAML
 * @param file repository-relative path of the settings file
 */
export function settingsFromDocument(doc: YamlDocument, file: string): SettingsFile {
  const errors = validateSettingsValue(doc.value);
  if (errors) throw schemaError(errors, doc, file);
  const raw = doc.value as RawSettings;

  const defaults = defaultSettings();
  const settings: SettingsFile = {
    file,
    models: raw.models ? [...raw.models] : defaults.models,
    limits: readLimits(doc, file, raw.limits, ['limits']),
    fit: {
      folds: raw.fit?.folds ?? DEFAULT_FIT.folds,
      foldOrder: raw.fit?.fold_order ?? DEFAULT_FIT.foldOrder,
      seed: raw.fit?.seed ?? DEFAULT_FIT.seed,
      parameterCount: raw.fit?.parameter_count ?? DEFAULT_FIT.parameterCount,
    },
    caps: {
      maxFileBytes: Math.round((raw.caps?.max_file_mb ?? DEFAULT_CAPS.maxFileMb) * MIB),
      maxCells: raw.caps?.max_cells ?? DEFAULT_CAPS.maxCells,
      maxOperations: raw.caps?.max_operations ?? DEFAULT_CAPS.maxOperations,
      maxModelSeconds: raw.caps?.max_model_seconds ?? DEFAULT_CAPS.maxModelSeconds,
    },
  };
  if (raw.models)
    modelLines.set(
      settings,
      raw.models.map((_, i) => doc.positionOf(['models', i])?.line ?? 1),
    );
  return settings;
}

/**
 * Reads a validated `limits` map with the line of each key, checking the order of its bounds
 * ({@link limitOrderProblem}).
 *
 * @param doc the parsed document
 * @param file repository-relative path
 * @param limits the map as validated by the schema (or undefined)
 * @param at key path of the map, e.g. `['limits']`
 */
export function readLimits(
  doc: YamlDocument,
  file: string,
  limits: Record<string, LimitSpec> | undefined,
  at: (string | number)[],
): Record<string, { spec: LimitSpec; line: number }> {
  const out: Record<string, { spec: LimitSpec; line: number }> = {};
  for (const [key, spec] of Object.entries(limits ?? {})) {
    const problem = limitOrderProblem(spec, limitDirection(key));
    if (problem !== null) throw errorAt(doc, file, SETTINGS_ERROR.limitOrder, [...at, key, problem[0]], problem[1]);
    out[key] = { spec: typeof spec === 'object' ? { ...spec } : spec, line: doc.positionOf([...at, key])?.line ?? 1 };
  }
  return out;
}

/** The settings file as the schema lets it through. */
interface RawSettings {
  version: 1;
  models?: string[];
  limits?: Record<string, LimitSpec>;
  fit?: { folds?: number; fold_order?: FoldOrder; seed?: number; parameter_count?: ParameterCount };
  caps?: { max_file_mb?: number; max_cells?: number; max_operations?: number; max_model_seconds?: number };
}
