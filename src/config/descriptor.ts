/**
 * A model descriptor (`*.model.yml`): YAML to a validated {@link Descriptor} with data paths
 * resolved inside the repository, `fit` defaults applied and limits merged.
 */

import { clip } from '../core/errors.js';
import { kindWords, NOT_A_FILE } from '../repo/repo-path.js';
import type { RepoReader } from '../repo/types.js';
import { mergeLimits } from './limits.js';
import { errorAt, schemaError, showValue } from './schema-errors.js';
import { validateDescriptorValue } from './schemas.js';
import { readLimits } from './settings-file.js';
import type { DataFormat, Descriptor, FoldOrder, LimitSpec, ParameterCount, RbfCenters, SettingsFile, TermSpec } from './types.js';
import { readYamlFile, type YamlDocument } from './yaml-source.js';

export { checkUniqueNames } from './discover.js';

/** Most centres one `rbf` term may have (also the schema's cap on `count`). */
export const MAX_RBF_CENTERS = 10_000;

/** Stable codes of the errors this module throws (besides YAML, schema and limit codes). */
export const DESCRIPTOR_ERROR = Object.freeze({
  dataMissing: 'file-missing',
  dataForm: 'data-form',
  notAFile: NOT_A_FILE,
  centers: 'rbf-centers',
});

/**
 * Loads one descriptor, validates it, resolves data paths (relative to the descriptor's
 * folder, via repo.resolve: never outside the repository, links included), applies settings
 * fit defaults and merges limits defaults < settings < descriptor key by key.
 *
 * @param repo the repository
 * @param path repository-relative descriptor path
 * @param settings the loaded settings file (fit defaults and limits)
 * @throws InputError YAML errors, `schema`, `limit-order`, `rbf-centers`, `path-outside`, `file-missing`
 */
export async function loadDescriptor(repo: RepoReader, path: string, settings: SettingsFile): Promise<Descriptor> {
  const doc = await readYamlFile(repo, path);
  const descriptor = descriptorFromDocument(doc, path, settings);
  for (const which of ['train', 'holdout'] as const) {
    const key = ['data', which];
    const at = doc.valuePositionOf(key);
    const where = { line: at?.line ?? descriptor.data.lines[which], column: at?.column ?? 1, key: `data.${which}` };
    const resolved = await repo.resolve(path, descriptor.data[which], where);
    const kind = await repo.entryKind(resolved);
    if (kind === 'missing') {
      throw errorAt(doc, path, DESCRIPTOR_ERROR.dataMissing, key, `${showValue(descriptor.data[which])} (${clip(resolved)}) is not a file in ${repo.label}; expected a CSV path relative to this descriptor's folder`);
    }
    if (kind !== 'file') {
      throw errorAt(doc, path, DESCRIPTOR_ERROR.notAFile, key, `${showValue(descriptor.data[which])} (${clip(resolved)}) ${kindWords(kind)}; expected a CSV file relative to this descriptor's folder`);
    }
    descriptor.data[which] = resolved;
  }
  return descriptor;
}

/**
 * Validates a parsed descriptor and builds the {@link Descriptor}; data paths are left as
 * written (see {@link loadDescriptor}, which resolves them).
 *
 * @param doc the parsed YAML
 * @param file repository-relative descriptor path
 * @param settings the loaded settings file
 */
export function descriptorFromDocument(doc: YamlDocument, file: string, settings: SettingsFile): Descriptor {
  const errors = validateDescriptorValue(doc.value);
  if (errors) throw schemaError(errors, doc, file);
  const raw = doc.value as RawDescriptor;
  const line = (path: (string | number)[]): number => doc.positionOf(path)?.line ?? 1;
  checkDataForm(doc, file, raw.data);

  const terms = raw.terms.map((term, index) => readTerm(doc, file, term, index, line(['terms', index])));
  const termsLine = line(['terms']);
  const fitLine = raw.fit ? line(['fit']) : termsLine;
  const limits = readLimits(doc, file, raw.limits, ['limits']);

  return {
    file,
    name: raw.name,
    task: raw.task ?? 'regression',
    data: {
      train: raw.data.train,
      holdout: raw.data.holdout ?? raw.data.train,
      target: raw.data.target,
      lines: {
        train: line(['data', 'train']),
        holdout: raw.data.holdout !== undefined ? line(['data', 'holdout']) : line(['data', 'split']),
        target: line(['data', 'target']),
      },
      // Present only when written, so descriptors of plain comma files stay as they were.
      ...(raw.data.separator !== undefined || raw.data.decimal !== undefined || raw.data.missing !== undefined
        ? { format: { separator: raw.data.separator ?? 'auto', decimal: raw.data.decimal ?? '.', missing: raw.data.missing ?? 'error' } }
        : {}),
      ...(raw.data.split ? { split: { ...raw.data.split, line: line(['data', 'split']) } } : {}),
    },
    terms,
    fit: {
      intercept: raw.fit?.intercept ?? true,
      ridge: raw.fit?.ridge ?? 0,
      folds: raw.fit?.folds ?? settings.fit.folds,
      foldOrder: raw.fit?.fold_order ?? settings.fit.foldOrder,
      seed: raw.fit?.seed ?? settings.fit.seed,
      parameterCount: raw.fit?.parameter_count ?? settings.fit.parameterCount,
      line: fitLine,
      ridgeLine: raw.fit?.ridge !== undefined ? line(['fit', 'ridge']) : fitLine,
    },
    coefficients: raw.coefficients ? [...raw.coefficients] : null,
    coefficientsLine: raw.coefficients ? line(['coefficients']) : null,
    limits: mergeLimits(settings, limits),
    nameLine: line(['name']),
    termsLine,
  };
}

function readTerm(doc: YamlDocument, file: string, term: RawTerm, index: number, line: number): TermSpec {
  if ('linear' in term) return { kind: 'linear', columns: [...term.linear], line };
  if ('polynomial' in term) {
    const p = term.polynomial;
    return { kind: 'polynomial', of: p.of, degree: p.degree, shift: p.shift ?? null, scale: p.scale ?? null, line };
  }
  const r = term.rbf;
  return { kind: 'rbf', of: r.of, centers: readCenters(doc, file, r.centers, ['terms', index, 'rbf', 'centers']), width: r.width, line };
}

function readCenters(doc: YamlDocument, file: string, centers: RawCenters, at: (string | number)[]): RbfCenters {
  if (centers === 'at-samples') return { kind: 'at-samples' };
  if (Array.isArray(centers)) return { kind: 'list', values: [...centers] };
  if (centers.to < centers.from) {
    throw errorAt(doc, file, DESCRIPTOR_ERROR.centers, [...at, 'to'], `\`to\` ${showValue(centers.to)} is below \`from\` ${showValue(centers.from)}; expected from <= to`);
  }
  if ('count' in centers) {
    if (centers.count > 1 && centers.to === centers.from) {
      throw errorAt(doc, file, DESCRIPTOR_ERROR.centers, [...at, 'count'], `${centers.count} centres from ${centers.from} to ${centers.to} would all coincide; expected from < to or count 1`);
    }
    return { kind: 'count', from: centers.from, to: centers.to, count: centers.count };
  }
  const n = Math.floor((centers.to - centers.from) / centers.step) + 1;
  if (!(n <= MAX_RBF_CENTERS)) {
    throw errorAt(doc, file, DESCRIPTOR_ERROR.centers, [...at, 'step'], `step ${showValue(centers.step)} gives ${Number.isFinite(n) ? n : 'too many'} centres from ${centers.from} to ${centers.to}; expected at most ${MAX_RBF_CENTERS}`);
  }
  return { kind: 'step', from: centers.from, to: centers.to, step: centers.step };
}

/** The descriptor as the schema lets it through. */
interface RawDescriptor {
  version: 1;
  name: string;
  task?: 'regression';
  data: {
    train: string;
    holdout?: string;
    target: string;
    separator?: DataFormat['separator'];
    decimal?: DataFormat['decimal'];
    missing?: DataFormat['missing'];
    split?: { column: string; train: string; holdout: string };
  };
  terms: RawTerm[];
  fit?: { intercept?: boolean; ridge?: number; folds?: number; fold_order?: FoldOrder; seed?: number; parameter_count?: ParameterCount };
  coefficients?: number[];
  limits?: Record<string, LimitSpec>;
}

type RawCenters = number[] | 'at-samples' | { from: number; to: number; count: number } | { from: number; to: number; step: number };

type RawTerm =
  | { linear: string[] }
  | { polynomial: { of: string; degree: number; shift?: number; scale?: number } }
  | { rbf: { of: string; centers: RawCenters; width: number } };

/**
 * The `data` rules the schema cannot say: exactly one of `holdout` and `split`; a split's two
 * labels differ; a decimal comma needs a separator other than the comma.
 * @throws InputError `data-form` naming the key
 */
function checkDataForm(doc: YamlDocument, file: string, data: RawDescriptor['data']): void {
  if (data.holdout === undefined && data.split === undefined) {
    throw errorAt(doc, file, DESCRIPTOR_ERROR.dataForm, ['data'], 'expected `data.holdout` (a hold-out CSV) or `data.split` (a split column in the training file); got neither', 'key');
  }
  if (data.holdout !== undefined && data.split !== undefined) {
    throw errorAt(doc, file, DESCRIPTOR_ERROR.dataForm, ['data', 'split'], 'expected either `data.holdout` or `data.split`, not both: with a split column the hold-out rows come from the training file', 'key');
  }
  if (data.split !== undefined && data.split.train === data.split.holdout) {
    throw errorAt(doc, file, DESCRIPTOR_ERROR.dataForm, ['data', 'split', 'holdout'], `expected a hold-out label different from the training label ${showValue(data.split.train)}`);
  }
  if (data.decimal === ',' && data.separator === ',') {
    throw errorAt(doc, file, DESCRIPTOR_ERROR.dataForm, ['data', 'decimal'], 'a decimal comma needs a separator other than the comma; expected `data.separator` to be ";" or "\\t" (or `auto`)');
  }
}
