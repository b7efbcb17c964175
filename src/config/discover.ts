/**
 * Which descriptors a run checks: the paths given on the command line, or the settings
 * file's glob patterns; and the rule that model names are unique.
 */

import { posix } from 'node:path';
import { InputError } from '../core/errors.js';
import type { RepoReader } from '../repo/types.js';
import { modelPatternLine } from './settings-file.js';
import type { Descriptor, SettingsFile } from './types.js';

/** Stable codes of the errors this module throws. */
export const DISCOVER_ERROR = Object.freeze({
  missing: 'file-missing',
  outside: 'path-outside',
  globOutside: 'glob-outside',
  globEmpty: 'glob-empty',
  duplicateName: 'duplicate-name',
});

/**
 * Descriptor paths for a run: the given paths (each must exist and be inside the
 * repository) or the settings' globs (a glob that matches nothing is an InputError naming
 * the settings line). Sorted, de-duplicated.
 *
 * @param repo the repository
 * @param settings the loaded settings file
 * @param explicit repository-relative descriptor paths from the command line (empty: use the globs)
 * @returns repository-relative paths with `/` separators
 * @throws InputError `path-outside`, `file-missing`, `glob-outside`, `glob-empty`
 */
export async function discoverDescriptors(repo: RepoReader, settings: SettingsFile, explicit: string[]): Promise<string[]> {
  const found = new Set<string>();
  if (explicit.length > 0) {
    for (const given of explicit) {
      const path = normaliseGiven(given);
      if (!(await repo.isFile(path))) {
        throw new InputError(DISCOVER_ERROR.missing, `descriptor not found in ${repo.label}; expected a repository-relative path to a *.model.yml file`, { file: given });
      }
      found.add(path);
    }
  } else {
    for (const [index, pattern] of settings.models.entries()) {
      const where = { file: settings.file ?? undefined, line: modelPatternLine(settings, index) ?? undefined, key: `models[${index}]` };
      if (isOutsidePattern(pattern)) {
        throw new InputError(DISCOVER_ERROR.globOutside, `pattern ${JSON.stringify(pattern)} leaves the repository; expected a pattern relative to the repository root, not absolute and not starting with \`..\``, where);
      }
      const matches = await repo.glob([pattern]);
      if (matches.length === 0) {
        const source = settings.file === null ? ' (the default, as there is no settings file)' : '';
        throw new InputError(DISCOVER_ERROR.globEmpty, `pattern ${JSON.stringify(pattern)}${source} matches no file in ${repo.label}; expected at least one model descriptor`, where);
      }
      for (const match of matches) found.add(match);
    }
  }
  return [...found].sort();
}

/**
 * After loading: duplicate model names are an InputError naming both files.
 *
 * @param descriptors loaded descriptors, in run order
 * @throws InputError `duplicate-name` at the second descriptor's `name` line
 */
export function checkUniqueNames(descriptors: Descriptor[]): void {
  const seen = new Map<string, Descriptor>();
  for (const d of descriptors) {
    const first = seen.get(d.name);
    if (first) {
      throw new InputError(
        DISCOVER_ERROR.duplicateName,
        `model name ${JSON.stringify(d.name)} is also used by ${first.file}:${first.nameLine}; expected a name unique in the repository`,
        { file: d.file, line: d.nameLine, key: 'name' },
      );
    }
    seen.set(d.name, d);
  }
}

/** True for absolute patterns and patterns starting with `..`. */
export function isOutsidePattern(pattern: string): boolean {
  const p = pattern.replace(/\\/g, '/');
  return p.startsWith('/') || /^[A-Za-z]:/.test(p) || p === '..' || p.startsWith('../');
}

function normaliseGiven(given: string): string {
  const p = given.replace(/\\/g, '/');
  const normal = posix.normalize(p).replace(/^(\.\/)+/, '');
  if (p.startsWith('/') || /^[A-Za-z]:/.test(p) || normal === '..' || normal.startsWith('../')) {
    throw new InputError(DISCOVER_ERROR.outside, 'is outside the repository; expected a path relative to the repository root', { file: given });
  }
  return normal;
}
