/**
 * Which descriptors a run checks: the paths given on the command line, or the settings
 * file's glob patterns; and the rule that model names are unique.
 */

import { posix } from 'node:path';
import { InputError, clip, quoteValue, type ErrorLocation } from '../core/errors.js';
import { kindWords, NOT_A_FILE } from '../repo/repo-path.js';
import type { RepoReader } from '../repo/types.js';
import { modelPatternLine } from './settings-file.js';
import type { Descriptor, SettingsFile } from './types.js';

/** Stable codes of the errors this module throws. */
export const DISCOVER_ERROR = Object.freeze({
  missing: 'file-missing',
  notAFile: NOT_A_FILE,
  outside: 'path-outside',
  globOutside: 'glob-outside',
  globEmpty: 'glob-empty',
  duplicateName: 'duplicate-name',
});

/** The descriptors of a run and what a user should know about how they were found. */
export interface Discovery {
  /** Repository-relative descriptor paths (`/` separators), sorted, de-duplicated. */
  paths: string[];
  /**
   * Notes for the run: `*.model.yaml` files beside the `*.model.yml` names a pattern asks for
   * (fitgate reads only the name asked for), and symbolic links a pattern would have searched
   * below (never followed as folders).
   */
  notes: string[];
}

/** Most file names one note lists. */
const NAMES_LISTED = 5;

/**
 * Descriptor paths for a run: the given paths (each must exist, be a regular file and be inside
 * the repository) or the settings' globs (a glob that matches nothing, or that leaves the
 * repository, is an InputError naming the settings line). A path a glob matches that is not a
 * regular file stays in the list: loading it gives that model's error.
 *
 * @param repo the repository
 * @param settings the loaded settings file
 * @param explicit repository-relative descriptor paths from the command line (empty: use the globs)
 * @returns the paths, sorted and de-duplicated, and notes for the run
 * @throws InputError `path-outside`, `file-missing`, `not-a-file`, `glob-outside`, `glob-empty`,
 *   `glob-too-complex`, `glob-too-large`
 */
export async function discoverDescriptors(repo: RepoReader, settings: SettingsFile, explicit: string[]): Promise<Discovery> {
  const found = new Set<string>();
  const notes: string[] = [];
  if (explicit.length > 0) {
    for (const given of explicit) {
      const path = normaliseGiven(given);
      const kind = await repo.entryKind(path);
      if (kind === 'missing') {
        throw new InputError(
          DISCOVER_ERROR.missing,
          `descriptor not found in ${repo.label}; expected a repository-relative path to a *.model.yml file`,
          { file: given },
        );
      }
      if (kind !== 'file')
        throw new InputError(DISCOVER_ERROR.notAFile, `the descriptor ${kindWords(kind)}; expected a regular *.model.yml file`, {
          file: given,
        });
      found.add(path);
    }
    return { paths: [...found].sort(), notes };
  }
  for (const [index, pattern] of settings.models.entries()) {
    const where = { file: settings.file ?? undefined, line: modelPatternLine(settings, index) ?? undefined, key: `models[${index}]` };
    const shown = quoteValue(pattern);
    const { matches, twins, links } = await globWithTwin(repo, pattern, where);
    const unread =
      twins.length > 0
        ? `${listNames(twins)} ${twins.length === 1 ? 'is' : 'are'} not read: the pattern asks for .yml, and fitgate reads only the names a pattern matches (rename ${twins.length === 1 ? 'it' : 'them'} to .yml, or change the pattern)`
        : '';
    const unsearched =
      links.length > 0
        ? `${listNames(links)} ${links.length === 1 ? 'is a symbolic link' : 'are symbolic links'} that the pattern would search below; links are never followed as folders (name the real folder in the pattern)`
        : '';
    if (matches.length === 0) {
      const source = settings.file === null ? ' (the default, as there is no settings file)' : '';
      const why = [unread, unsearched]
        .filter((t) => t !== '')
        .map((t) => `; ${t}`)
        .join('');
      throw new InputError(
        DISCOVER_ERROR.globEmpty,
        `pattern ${shown}${source} matches no file in ${repo.label}; expected at least one model descriptor${why}`,
        where,
      );
    }
    if (unread !== '') notes.push(`pattern ${shown}: ${unread}.`);
    if (unsearched !== '') notes.push(`pattern ${shown}: ${unsearched}.`);
    for (const match of matches) found.add(match);
  }
  return { paths: [...found].sort(), notes };
}

/**
 * Globs one pattern and, when it ends with `.yml`, its `.yaml` twin in the same walk: matches of
 * the pattern, twin files that the pattern does not match, and links the pattern would search
 * below. A refused pattern becomes an InputError at the settings line.
 */
async function globWithTwin(
  repo: RepoReader,
  pattern: string,
  where: ErrorLocation,
): Promise<{ matches: string[]; twins: string[]; links: string[] }> {
  const twin = pattern.endsWith('.yml') ? `${pattern.slice(0, -4)}.yaml` : null;
  try {
    if (twin !== null) {
      try {
        const both = await repo.glob([pattern, twin]);
        // Every match of a pattern ending with the literal `.yml` ends with it, and every match of the twin with `.yaml`.
        return {
          matches: both.paths.filter((p) => p.endsWith('.yml')),
          twins: both.paths.filter((p) => p.endsWith('.yaml')),
          links: both.notEntered,
        };
      } catch (error) {
        if (!(error instanceof InputError)) throw error;
        // The twin alone is over a cap: fall through to the pattern alone, whose error (if any) is the one to show.
      }
    }
    const alone = await repo.glob([pattern]);
    return { matches: alone.paths, twins: [], links: alone.notEntered };
  } catch (error) {
    if (!(error instanceof InputError) || error.location.file !== undefined) throw error;
    throw new InputError(error.code === DISCOVER_ERROR.outside ? DISCOVER_ERROR.globOutside : error.code, error.message, where);
  }
}

/** Up to {@link NAMES_LISTED} names, each cut to 80 characters, then how many more. */
function listNames(names: string[]): string {
  const shown = names.slice(0, NAMES_LISTED).map((n) => clip(n));
  return names.length > NAMES_LISTED ? `${shown.join(', ')} and ${names.length - NAMES_LISTED} more` : shown.join(', ');
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
        `model name ${quoteValue(d.name)} is also used by ${clip(first.file)}:${first.nameLine}; expected a name unique in the repository`,
        { file: d.file, line: d.nameLine, key: 'name' },
      );
    }
    seen.set(d.name, d);
  }
}

function normaliseGiven(given: string): string {
  const p = given.replace(/\\/g, '/');
  const normal = posix.normalize(p).replace(/^(\.\/)+/, '');
  if (p.startsWith('/') || /^[A-Za-z]:/.test(p) || normal === '..' || normal.startsWith('../')) {
    throw new InputError(DISCOVER_ERROR.outside, 'is outside the repository; expected a path relative to the repository root', {
      file: given,
    });
  }
  return normal;
}
