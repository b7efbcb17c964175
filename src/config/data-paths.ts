/**
 * `data.train` and `data.holdout` as written to the data files they name: one CSV path (as
 * always), a list of parts, or a glob relative to the descriptor's folder.
 *
 * - A string that names a file (after resolving it against the descriptor's folder) is that one
 *   file. Otherwise a string holding `*`, `?`, `[` or `{` is a glob, matched with the repository's
 *   own matcher and walk (repo/glob-pattern.ts, repo/tree-walk.ts: `*` within one path segment,
 *   `**` across segments, no leading dots, links to folders never entered). A glob must match at
 *   least one file; a `..` segment or an absolute pattern is refused at its line, as for the
 *   `models` patterns of the settings file, and so is a glob under a descriptor folder whose
 *   name holds a glob character (write a list there).
 * - A list holds paths or globs, one per item; the parts are the union of what they name.
 * - Every part is resolved and checked like a single data file: inside the repository (links
 *   included: a link leading outside is refused at the item's line), a regular file; naming the
 *   same file twice is an error.
 * - The parts are read in code-point order of their repository-relative paths
 *   ({@link compareCodePoints}), whatever order the list or the walk gives; at most
 *   {@link MAX_DATA_PARTS} parts.
 */

import { clip, InputError, quoteValue } from '../core/errors.js';
import { patternProblem } from '../repo/glob-pattern.js';
import { kindWords, NOT_A_FILE } from '../repo/repo-path.js';
import type { RepoReader } from '../repo/types.js';
import { errorAt, showValue } from './schema-errors.js';
import type { Descriptor } from './types.js';
import type { YamlDocument } from './yaml-source.js';

/** Most parts one of `data.train` / `data.holdout` may name (a documented constant of our choosing: each part is opened and checked in turn). */
export const MAX_DATA_PARTS = 1000;

/** Stable codes of the errors this module throws (besides the repository's `path-outside`). */
export const DATA_PATH_ERROR = Object.freeze({
  missing: 'file-missing',
  notAFile: NOT_A_FILE,
  globEmpty: 'data-glob-empty',
  globOutside: 'path-outside',
  globRefused: 'data-glob',
  tooManyParts: 'data-parts',
  repeated: 'data-parts',
});

/** Characters that make a data path a glob (when it does not name a file as written). */
const GLOB_CHARACTERS = /[*?[{]/;

/**
 * Compares two strings by Unicode code point (not by UTF-16 code unit, as `<` does: the two
 * differ for characters beyond U+FFFF). The reading order of data parts.
 *
 * @returns negative, 0 or positive as `a` sorts before, with or after `b`
 */
export function compareCodePoints(a: string, b: string): number {
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const x = a.codePointAt(i) as number;
    const y = b.codePointAt(j) as number;
    if (x !== y) return x - y;
    i += x > 0xffff ? 2 : 1;
    j += y > 0xffff ? 2 : 1;
  }
  return a.length - i - (b.length - j);
}

/**
 * The data files one of `data.train` / `data.holdout` names.
 *
 * @param repo the repository
 * @param doc the descriptor's parsed YAML (for the lines of the key and of list items)
 * @param descriptorPath repository-relative descriptor path
 * @param which `train` or `holdout` (the key read; with `data.split` the caller reads `train` once)
 * @param written the value as written: a path, a glob, or a list of them
 * @returns `single`: the one resolved path (a string that names a file); `parts`: the resolved
 *   parts in code-point order (a list or a glob, even when it names one file)
 * @throws InputError `file-missing`, `not-a-file`, `path-outside`, `data-glob-empty`,
 *   `data-glob`, `data-parts`, `glob-too-complex`, `glob-too-large`, each at the line of the key or item
 */
export async function resolveDataPaths(
  repo: RepoReader,
  doc: YamlDocument,
  descriptorPath: string,
  which: 'train' | 'holdout',
  written: string | readonly string[],
): Promise<{ single: string } | { parts: string[] }> {
  const folder = descriptorPath.includes('/') ? descriptorPath.slice(0, descriptorPath.lastIndexOf('/')) : '';
  if (typeof written === 'string') {
    const key = ['data', which];
    if (!GLOB_CHARACTERS.test(written)) return { single: await resolveDataFile(repo, doc, descriptorPath, key, written) };
    const direct = await namesFile(repo, doc, descriptorPath, key, written);
    if (direct !== null) return { single: direct };
    return { parts: finish(doc, descriptorPath, key, await globParts(repo, doc, descriptorPath, folder, key, written), null) };
  }
  const found: string[] = [];
  const itemOf: number[] = [];
  for (const [index, item] of written.entries()) {
    const key = ['data', which, index];
    const direct = GLOB_CHARACTERS.test(item) ? await namesFile(repo, doc, descriptorPath, key, item) : null;
    const paths =
      direct !== null
        ? [direct]
        : GLOB_CHARACTERS.test(item)
          ? await globParts(repo, doc, descriptorPath, folder, key, item)
          : [await resolveDataFile(repo, doc, descriptorPath, key, item)];
    for (const path of paths) {
      found.push(path);
      itemOf.push(index);
      if (found.length > MAX_DATA_PARTS) {
        throw errorAt(
          doc,
          descriptorPath,
          DATA_PATH_ERROR.tooManyParts,
          key,
          `\`data.${which}\` names more than ${MAX_DATA_PARTS} parts; expected at most ${MAX_DATA_PARTS} (join small parts into larger files)`,
        );
      }
    }
  }
  return { parts: finish(doc, descriptorPath, ['data', which], found, itemOf) };
}

/** Sorts the parts by code point; refuses a file named twice (at the later item) and too many parts. */
function finish(doc: YamlDocument, file: string, key: (string | number)[], paths: string[], itemOf: number[] | null): string[] {
  if (paths.length > MAX_DATA_PARTS) {
    throw errorAt(
      doc,
      file,
      DATA_PATH_ERROR.tooManyParts,
      key,
      `the glob matches ${paths.length} files; expected at most ${MAX_DATA_PARTS} parts (join small parts into larger files)`,
    );
  }
  const firstAt = new Map<string, number>();
  for (const [k, path] of paths.entries()) {
    const seen = firstAt.get(path);
    if (seen !== undefined) {
      const at = itemOf === null ? key : [...key, itemOf[k]];
      throw errorAt(
        doc,
        file,
        DATA_PATH_ERROR.repeated,
        at,
        `${quoteValue(path)} is named again (already by item ${(itemOf?.[seen] ?? 0) + 1}); expected each part once, or its rows would count twice`,
      );
    }
    firstAt.set(path, k);
  }
  return [...paths].sort(compareCodePoints);
}

/**
 * One data (or predictions side) file as written: resolved inside the repository (relative to the
 * descriptor's folder) and checked to be a regular file.
 * @throws InputError `path-outside`, `data-missing`, `not-a-file` at the key's value
 */
export async function resolveDataFile(
  repo: RepoReader,
  doc: YamlDocument,
  file: string,
  key: (string | number)[],
  written: string,
): Promise<string> {
  const at = doc.valuePositionOf(key);
  const where = { line: at?.line ?? 1, column: at?.column ?? 1, key: keyText(key) };
  const resolved = await repo.resolve(file, written, where);
  const kind = await repo.entryKind(resolved);
  if (kind === 'missing') {
    throw errorAt(
      doc,
      file,
      DATA_PATH_ERROR.missing,
      key,
      `${showValue(written)} (${clip(resolved)}) is not a file in ${repo.label}; expected a CSV path relative to this descriptor's folder`,
    );
  }
  if (kind !== 'file') {
    throw errorAt(
      doc,
      file,
      DATA_PATH_ERROR.notAFile,
      key,
      `${showValue(written)} (${clip(resolved)}) ${kindWords(kind)}; expected a CSV file relative to this descriptor's folder`,
    );
  }
  return resolved;
}

/** The resolved path when `written` (holding glob characters) names a regular file as it stands, else null. */
async function namesFile(
  repo: RepoReader,
  doc: YamlDocument,
  file: string,
  key: (string | number)[],
  written: string,
): Promise<string | null> {
  // Resolved as a path first (`../data/odd[1].csv` is that file when it names one); a path that leaves the repository names none.
  const at = doc.valuePositionOf(key);
  let resolved: string;
  try {
    resolved = await repo.resolve(file, written, { line: at?.line ?? 1, column: at?.column ?? 1, key: keyText(key) });
  } catch (error) {
    if (error instanceof InputError) return null;
    throw error;
  }
  return (await repo.entryKind(resolved)) === 'file' ? resolved : null;
}

/** The files a glob relative to the descriptor's folder matches, each checked as {@link oneFile} does. */
async function globParts(
  repo: RepoReader,
  doc: YamlDocument,
  file: string,
  folder: string,
  key: (string | number)[],
  pattern: string,
): Promise<string[]> {
  const problem = patternProblem(pattern);
  if (problem !== null) {
    throw errorAt(
      doc,
      file,
      problem.kind === 'outside' ? DATA_PATH_ERROR.globOutside : 'glob-too-complex',
      key,
      `${problem.message.replace('relative to the repository root', "relative to this descriptor's folder")}`,
    );
  }
  if (GLOB_CHARACTERS.test(folder) || folder.includes('}') || folder.includes(']')) {
    throw errorAt(
      doc,
      file,
      DATA_PATH_ERROR.globRefused,
      key,
      `the descriptor's folder ${quoteValue(folder)} holds a glob character, so a glob below it cannot be matched as written; expected a list of the part files`,
    );
  }
  const full = folder === '' ? pattern.replace(/\\/g, '/') : `${folder}/${pattern.replace(/\\/g, '/')}`;
  let found: { paths: string[]; notEntered: string[] };
  try {
    found = await repo.glob([full]);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    throw errorAt(doc, file, error.code, key, `glob ${quoteValue(pattern)}: ${error.message}`);
  }
  if (found.paths.length === 0) {
    const links =
      found.notEntered.length > 0
        ? `; ${found.notEntered
            .slice(0, 3)
            .map((l) => clip(l))
            .join(', ')} ${found.notEntered.length === 1 ? 'is a symbolic link' : 'are symbolic links'} to a folder, never followed`
        : '';
    throw errorAt(
      doc,
      file,
      DATA_PATH_ERROR.globEmpty,
      key,
      `glob ${quoteValue(pattern)} matches no file in ${repo.label} (relative to this descriptor's folder); expected at least one data file${links}`,
    );
  }
  if (found.paths.length > MAX_DATA_PARTS) {
    throw errorAt(
      doc,
      file,
      DATA_PATH_ERROR.tooManyParts,
      key,
      `glob ${quoteValue(pattern)} matches ${found.paths.length} files; expected at most ${MAX_DATA_PARTS} parts (join small parts into larger files)`,
    );
  }
  const out: string[] = [];
  for (const match of found.paths) {
    // Relative to the descriptor's folder again, so that it is resolved (links included) as any data path.
    const relative = folder === '' ? match : match.slice(folder.length + 1);
    out.push(await resolveDataFile(repo, doc, file, key, relative));
  }
  return out;
}

function keyText(key: (string | number)[]): string {
  return key.map((k, i) => (typeof k === 'number' ? `[${k}]` : i === 0 ? k : `.${k}`)).join('');
}

/**
 * The files one side of a loaded descriptor reads: its parts, or its one file.
 *
 * @param data the loaded descriptor's `data`
 * @param which `train` or `holdout`
 */
export function dataFiles(data: Descriptor['data'], which: 'train' | 'holdout'): string[] {
  const parts = which === 'train' ? data.trainParts : data.holdoutParts;
  return parts !== undefined ? [...parts] : [data[which]];
}

/**
 * The report's `data` field of a model: both sides' files, present only when either side is read
 * from parts (an empty object otherwise, so that reports of one file per side keep their shape).
 */
export function dataFilesField(data: Descriptor['data']): { data?: { train: string[]; holdout: string[] } } {
  if (data.trainParts === undefined && data.holdoutParts === undefined) return {};
  return { data: { train: dataFiles(data, 'train'), holdout: dataFiles(data, 'holdout') } };
}
