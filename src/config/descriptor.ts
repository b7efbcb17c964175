/**
 * A model descriptor (`*.model.yml`): YAML to a validated {@link Descriptor} with data paths
 * resolved inside the repository, `fit` defaults applied and limits merged.
 */

import { NOT_A_FILE } from '../repo/repo-path.js';
import type { RepoReader } from '../repo/types.js';
import { resolveDataFile, resolveDataPaths } from './data-paths.js';
import { LIMIT_KEYS } from './generated/limit-keys.js';
import { mergeLimits } from './limits.js';
import { errorAt, SCHEMA_ERROR_CODE, schemaError, showValue } from './schema-errors.js';
import { validateDescriptorValue } from './schemas.js';
import { readLimits } from './settings-file.js';
import type {
  DataFormat,
  Descriptor,
  FoldOrder,
  LimitSpec,
  ParameterCount,
  RbfCenters,
  SettingsFile,
  TermSpec,
  Weighting,
  InputTransform,
  TargetTransformSpec,
  MultiRbfCenters,
  PredictionSource,
  PredictionsSpec,
} from './types.js';
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
  weighting: 'weight-and-sigma',
  spline: 'spline-settings',
  polynomial: 'polynomial-inputs',
  predictions: 'predictions-form',
  targetTransform: 'target-transform',
  limitTask: 'limit-task',
});

/**
 * Loads one descriptor, validates it, resolves data paths (relative to the descriptor's
 * folder, via repo.resolve: never outside the repository, links included), applies settings
 * fit defaults and merges limits defaults < settings < descriptor key by key.
 *
 * @param repo the repository
 * @param path repository-relative descriptor path
 * @param settings the loaded settings file (fit defaults and limits)
 * @throws InputError YAML errors, `schema`, `limit-order`, `rbf-centers`, `path-outside`, `file-missing`, and
 *   the errors of data parts (config/data-paths.ts: `data-glob-empty`, `data-glob`, `data-parts`)
 */
export async function loadDescriptor(repo: RepoReader, path: string, settings: SettingsFile): Promise<Descriptor> {
  const doc = await readYamlFile(repo, path);
  const descriptor = descriptorFromDocument(doc, path, settings);
  const written = (doc.value as RawDescriptor).data;
  const train = await resolveDataPaths(repo, doc, path, 'train', written.train);
  // With a split column the hold-out rows come from the training file(s).
  const holdout = written.holdout === undefined ? train : await resolveDataPaths(repo, doc, path, 'holdout', written.holdout);
  for (const [which, found] of [
    ['train', train],
    ['holdout', holdout],
  ] as const) {
    if ('single' in found) descriptor.data[which] = found.single;
    else {
      descriptor.data[which] = found.parts[0];
      descriptor.data[which === 'train' ? 'trainParts' : 'holdoutParts'] = found.parts;
    }
  }
  // Side files of a model trained elsewhere: the same rules as data files.
  for (const which of ['train', 'holdout'] as const) {
    const source = descriptor.predictions?.[which];
    if (source?.file) source.file = await resolveDataFile(repo, doc, path, ['predictions', which, 'file'], source.file);
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

  const predictions = readPredictions(doc, file, raw, line);
  const terms = (raw.terms ?? []).map((term, index) => readTerm(doc, file, term, index, line(['terms', index])));
  const termsLine = predictions !== null ? predictions.line : line(['terms']);
  const fitLine = raw.fit ? line(['fit']) : termsLine;
  const limits = readLimits(doc, file, raw.limits, ['limits']);
  checkLimitTasks(doc, file, raw);
  if (raw.fit?.refit === false && !raw.coefficients) {
    throw errorAt(
      doc,
      file,
      'score-only-coefficients',
      ['fit', 'refit'],
      '`refit: false` scores the shipped coefficients, and the descriptor ships none; expected `coefficients` (one per column, intercept first) or `refit: true`',
    );
  }

  return {
    file,
    name: raw.name,
    task: raw.task ?? 'regression',
    data: {
      // As written until loadDescriptor resolves them (a list's first item here).
      train: firstWritten(raw.data.train),
      holdout: firstWritten(raw.data.holdout ?? raw.data.train),
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
      positive: raw.data.positive ?? null,
      ...weightingOf(readWeighting(doc, file, raw, line)),
      ...readTargetTransform(doc, file, raw, line),
    },
    terms,
    fit: {
      intercept: raw.fit?.intercept ?? true,
      refit: raw.fit?.refit ?? true,
      ridge: raw.fit?.ridge ?? 0,
      folds: raw.fit?.folds ?? settings.fit.folds,
      foldOrder: raw.fit?.fold_order ?? settings.fit.foldOrder,
      seed: raw.fit?.seed ?? settings.fit.seed,
      parameterCount: raw.fit?.parameter_count ?? settings.fit.parameterCount,
      line: fitLine,
      ridgeLine: raw.fit?.ridge !== undefined ? line(['fit', 'ridge']) : fitLine,
      threshold: raw.fit?.threshold ?? 0.5,
      ...(raw.fit?.refit_compare !== undefined ? { refitCompare: raw.fit.refit_compare } : {}),
    },
    coefficients: raw.coefficients ? [...raw.coefficients] : null,
    coefficientsLine: raw.coefficients ? line(['coefficients']) : null,
    limits: mergeLimits(settings, limits),
    nameLine: line(['name']),
    termsLine,
    // Present only for models trained elsewhere, so descriptors of terms keep their shape.
    ...(predictions !== null
      ? { predictions, parameters: raw.parameters ?? null, parametersLine: raw.parameters !== undefined ? line(['parameters']) : null }
      : {}),
  };
}

/** A data path as written, or the first of a list. */
function firstWritten(written: string | string[]): string {
  return typeof written === 'string' ? written : written[0];
}

/**
 * A regression model's own limit for a check that applies to classifiers only (`separation`,
 * `events_per_parameter`, `calibration_slope`) is an error at its key: no check would read it,
 * and a limit that silently does nothing is worse than none. (A classifier lists the checks that
 * do not apply to it as skipped; the settings file's limits apply to every model and are not judged here.)
 * @throws InputError `limit-task`
 */
function checkLimitTasks(doc: YamlDocument, file: string, raw: RawDescriptor): void {
  const task = raw.task ?? 'regression';
  if (task !== 'regression') return;
  for (const key of Object.keys(raw.limits ?? {})) {
    const info = LIMIT_KEYS.find((k) => k.key === key);
    if (info === undefined || info.tasks.includes(task)) continue;
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.limitTask,
      ['limits', key],
      `\`${key}\` is the limit of a check of classifiers only, and this model is a regression model, so no check would read it; expected no \`${key}\` here (or \`task: classification\` for a classifier)`,
    );
  }
}

/**
 * `predictions` (a model trained elsewhere) with the rules the schema cannot say: exactly one of
 * `terms` and `predictions`; no `coefficients`, `data.weight`/`data.sigma` or `fit.refit` beside
 * `predictions`; `key` only with `file`; `parameters` only with `predictions`; `fit.refit_compare`
 * only with `fit.refit: false`.
 * @returns the spec, or null for a model of terms
 * @throws InputError `schema` (neither `terms` nor `predictions`), `predictions-form`
 */
function readPredictions(
  doc: YamlDocument,
  file: string,
  raw: RawDescriptor,
  line: (path: (string | number)[]) => number,
): PredictionsSpec | null {
  if (raw.fit?.refit_compare === true && raw.fit.refit !== false) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.predictions,
      ['fit', 'refit_compare'],
      '`refit_compare` reports a refit beside the shipped coefficients scored as shipped; expected `refit: false` with it (a model that is refitted already reports its shipped coefficients under `shipped`)',
    );
  }
  if (raw.fit?.refit_compare === true && raw.data.target_transform !== undefined) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.predictions,
      ['fit', 'refit_compare'],
      '`refit_compare` reports the refit on the target as written; expected no `refit_compare` beside `data.target_transform`',
    );
  }
  if (raw.fit?.refit === false && raw.task === 'classification') {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.predictions,
      ['fit', 'refit'],
      "`refit: false` scores a regression model's shipped coefficients as they are; a classifier is always refitted (its shipped `coefficients` are compared with the refit by `reproducibility`), so expected no `refit: false` on a classifier",
    );
  }
  if (raw.fit?.refit_compare === true && raw.task === 'classification') {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.predictions,
      ['fit', 'refit_compare'],
      '`refit_compare` reports the refit of a regression model scored as shipped; expected no `refit_compare` on a classifier',
    );
  }
  const p = raw.predictions;
  if (p === undefined) {
    if (raw.terms === undefined) {
      throw errorAt(
        doc,
        file,
        SCHEMA_ERROR_CODE,
        ['terms'],
        'missing key `terms`; required keys: version, name, data, terms (or `predictions` instead of `terms` for a model trained elsewhere)',
        'parent',
      );
    }
    if (raw.parameters !== undefined) {
      throw errorAt(
        doc,
        file,
        DESCRIPTOR_ERROR.predictions,
        ['parameters'],
        '`parameters` states the parameter count of a model trained elsewhere (`predictions`); a model of terms counts its design columns, so expected no `parameters` here',
        'key',
      );
    }
    return null;
  }
  const clash = (
    [
      [raw.terms !== undefined, ['terms'], '`terms`'],
      [raw.coefficients !== undefined, ['coefficients'], '`coefficients`'],
      [raw.fit?.refit !== undefined, ['fit', 'refit'], '`fit.refit`'],
      [raw.data.weight !== undefined, ['data', 'weight'], '`data.weight`'],
      [raw.data.sigma !== undefined, ['data', 'sigma'], '`data.sigma`'],
    ] as const
  ).find(([present]) => present);
  if (clash) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.predictions,
      [...clash[1]],
      `${clash[2]} does not go with \`predictions\` (a model trained elsewhere: fitgate scores its predictions and fits nothing); expected one of the two`,
      'key',
    );
  }
  const source = (which: 'train' | 'holdout'): PredictionSource => {
    const s = (p as NonNullable<RawDescriptor['predictions']>)[which];
    if (s.key !== undefined && s.file === undefined) {
      throw errorAt(
        doc,
        file,
        DESCRIPTOR_ERROR.predictions,
        ['predictions', which, 'key'],
        '`key` matches the rows of a side file with the data rows; expected `file` beside it (or no `key` for a column of the data file)',
        'key',
      );
    }
    return { column: s.column, file: s.file ?? null, key: s.key ?? null, line: line(['predictions', which]) };
  };
  return { train: source('train'), holdout: source('holdout'), inputs: [...(p.inputs ?? [])], line: line(['predictions']) };
}

/**
 * `data.weight` or `data.sigma` (the schema lets at most one through), or null.
 * @throws InputError `weight-and-sigma` for both, or for either on a classifier (its fit takes no row weights)
 */
function readWeighting(doc: YamlDocument, file: string, raw: RawDescriptor, line: (path: (string | number)[]) => number): Weighting | null {
  const data = raw.data;
  if (raw.task === 'classification') {
    const key = data.weight !== undefined ? 'weight' : data.sigma !== undefined ? 'sigma' : null;
    if (key !== null) {
      throw errorAt(
        doc,
        file,
        DESCRIPTOR_ERROR.weighting,
        ['data', key],
        `a classifier is fitted without row weights, so \`${key}\` would be ignored; expected \`data.${key}\` only with \`task: regression\``,
      );
    }
  }
  if (data.weight !== undefined && data.sigma !== undefined) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.weighting,
      ['data', 'sigma'],
      'both `weight` and `sigma` are given; expected one of them (sigma means weight 1 / sigma^2)',
    );
  }
  if (data.weight !== undefined) return { kind: 'weight', column: data.weight, line: line(['data', 'weight']) };
  if (data.sigma !== undefined) return { kind: 'sigma', column: data.sigma, line: line(['data', 'sigma']) };
  return null;
}

/**
 * `data.target_transform` with `data.limits_scale` as `{ targetTransform }`, or nothing (so
 * descriptors without one keep their shape).
 * @throws InputError `target-transform` for `limits_scale` without a transform, or a transform on a classifier
 */
function readTargetTransform(
  doc: YamlDocument,
  file: string,
  raw: RawDescriptor,
  line: (path: (string | number)[]) => number,
): { targetTransform?: TargetTransformSpec } {
  const { target_transform: kind, limits_scale: scale } = raw.data;
  if (kind === undefined) {
    if (scale === undefined) return {};
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.targetTransform,
      ['data', 'limits_scale'],
      '`limits_scale` chooses between the original and the transformed target, and `data.target_transform` is not given; expected `target_transform: log | log1p | sqrt` or no `limits_scale`',
    );
  }
  if (raw.task === 'classification') {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.targetTransform,
      ['data', 'target_transform'],
      "a classifier's target is two classes, which no transform applies to; expected `target_transform` only with `task: regression`",
    );
  }
  return { targetTransform: { kind, limitsScale: scale ?? 'original', line: line(['data', 'target_transform']) } };
}

/** `{ weighting }` when there is one, else nothing (so unweighted descriptors keep their shape). */
function weightingOf(weighting: Weighting | null): { weighting?: Weighting } {
  return weighting === null ? {} : { weighting };
}

function readTerm(doc: YamlDocument, file: string, term: RawTerm, index: number, line: number): TermSpec {
  if ('linear' in term) return { kind: 'linear', columns: [...term.linear], line };
  if ('polynomial' in term) {
    const p = term.polynomial;
    if (Array.isArray(p.of))
      return withTransform(
        readMultiPolynomial(doc, file, p as RawPolynomial & { of: string[] }, ['terms', index, 'polynomial'], line),
        p.transform,
      );
    for (const key of ['shift', 'scale'] as const) {
      if (Array.isArray(p[key]))
        throw errorAt(
          doc,
          file,
          DESCRIPTOR_ERROR.polynomial,
          ['terms', index, 'polynomial', key],
          `\`${key}\` is a list but \`of\` names one column; expected one number`,
        );
    }
    return withTransform(
      {
        kind: 'polynomial',
        of: p.of,
        degree: p.degree,
        shift: (p.shift as number | undefined) ?? null,
        scale: (p.scale as number | undefined) ?? null,
        line,
      },
      p.transform,
    );
  }
  if ('fourier' in term) {
    const f = term.fourier;
    return withTransform({ kind: 'fourier', of: f.of, period: f.period, harmonics: f.harmonics, line }, f.transform);
  }
  if ('category' in term) {
    const c = term.category;
    return {
      kind: 'category',
      of: c.of,
      reference: c.reference === undefined ? null : String(c.reference),
      unseen: c.unseen ?? 'error',
      line,
    };
  }
  if ('spline' in term) return withTransform(readSpline(doc, file, term.spline, ['terms', index, 'spline'], line), term.spline.transform);
  const r = term.rbf;
  if (Array.isArray(r.of))
    return withTransform(readMultiRbf(doc, file, r as RawRbf & { of: string[] }, ['terms', index, 'rbf'], line), r.transform);
  if (Array.isArray(r.centers) && r.centers.some((c) => typeof c !== 'number')) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.centers,
      ['terms', index, 'rbf', 'centers'],
      '`of` names one column, so the centres are numbers (a list), `{ from, to, count }`, `{ from, to, step }` or `at-samples`; rows and grids are for several inputs',
    );
  }
  return withTransform(
    {
      kind: 'rbf',
      of: r.of,
      centers: readCenters(doc, file, r.centers as RawCenters, ['terms', index, 'rbf', 'centers']),
      width: r.width,
      line,
    },
    r.transform,
  );
}

/** The spec with its `transform` when one is written (absent otherwise, so specs without one keep their shape). */
function withTransform(spec: TermSpec, transform: InputTransform | undefined): TermSpec {
  return transform === undefined ? spec : ({ ...spec, transform } as TermSpec);
}

function readMultiRbf(doc: YamlDocument, file: string, r: RawRbf & { of: string[] }, at: (string | number)[], line: number): TermSpec {
  const k = r.of.length;
  const c = r.centers;
  const spec = (centers: MultiRbfCenters): TermSpec => ({ kind: 'multi-rbf', of: [...r.of], centers, width: r.width, line });
  if (c === 'at-samples') return spec({ kind: 'at-samples' });
  if (Array.isArray(c) && c.every((row) => Array.isArray(row))) {
    const rows = c as number[][];
    rows.forEach((row, i) => {
      if (row.length !== k)
        throw errorAt(
          doc,
          file,
          DESCRIPTOR_ERROR.centers,
          [...at, 'centers', i],
          `centre ${i + 1} has ${row.length} values for ${k} inputs; expected one per input of \`of\`, in the same order`,
        );
    });
    return spec({ kind: 'rows', rows: rows.map((row) => [...row]) });
  }
  if (Array.isArray(c) && c.every((axis) => typeof axis === 'object' && axis !== null && !Array.isArray(axis))) {
    const axes = c as { from: number; to: number; count: number }[];
    if (axes.length !== k)
      throw errorAt(
        doc,
        file,
        DESCRIPTOR_ERROR.centers,
        [...at, 'centers'],
        `the grid has ${axes.length} axes for ${k} inputs; expected one { from, to, count } per input of \`of\``,
      );
    const total = axes.reduce((p, a) => p * a.count, 1);
    if (total > MAX_RBF_CENTERS)
      throw errorAt(
        doc,
        file,
        DESCRIPTOR_ERROR.centers,
        [...at, 'centers'],
        `the grid has ${total} centres; expected at most ${MAX_RBF_CENTERS}`,
      );
    axes.forEach((a, i) => {
      if (a.to < a.from)
        throw errorAt(
          doc,
          file,
          DESCRIPTOR_ERROR.centers,
          [...at, 'centers', i, 'to'],
          `\`to\` ${showValue(a.to)} is below \`from\` ${showValue(a.from)}; expected from <= to`,
        );
    });
    return spec({ kind: 'grid', axes: axes.map((a) => ({ from: a.from, to: a.to, count: a.count })) });
  }
  throw errorAt(
    doc,
    file,
    DESCRIPTOR_ERROR.centers,
    [...at, 'centers'],
    `\`of\` names ${k} columns, so the centres are a list of rows (one value per input), a grid (one { from, to, count } per input) or \`at-samples\``,
  );
}

function readMultiPolynomial(
  doc: YamlDocument,
  file: string,
  p: RawPolynomial & { of: string[] },
  at: (string | number)[],
  line: number,
): TermSpec {
  const perInput = (key: 'shift' | 'scale'): (number | null)[] => {
    const v = p[key];
    if (v === undefined) return p.of.map(() => null);
    if (!Array.isArray(v)) return p.of.map(() => v);
    if (v.length !== p.of.length) {
      throw errorAt(
        doc,
        file,
        DESCRIPTOR_ERROR.polynomial,
        [...at, key],
        `\`${key}\` has ${v.length} values for ${p.of.length} inputs; expected one per input of \`of\`, in the same order`,
      );
    }
    return [...v];
  };
  return { kind: 'multi-polynomial', of: [...p.of], degree: p.degree, shift: perInput('shift'), scale: perInput('scale'), line };
}

function readSpline(doc: YamlDocument, file: string, spline: RawSpline, at: (string | number)[], line: number): TermSpec {
  const degree = spline.degree ?? 3;
  const natural = spline.natural ?? false;
  if (natural && degree !== 3) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.spline,
      [...at, 'degree'],
      `natural splines are cubic; expected degree 3 (or no degree) with \`natural: true\`, got ${showValue(degree)}`,
    );
  }
  if (Array.isArray(spline.knots)) {
    const values = [...spline.knots];
    for (let k = 1; k < values.length; k++) {
      if (!(values[k] > values[k - 1])) {
        throw errorAt(
          doc,
          file,
          DESCRIPTOR_ERROR.spline,
          [...at, 'knots', k],
          `knot ${showValue(values[k])} does not follow ${showValue(values[k - 1])}; expected strictly increasing knots`,
        );
      }
    }
    return { kind: 'spline', of: spline.of, knots: { kind: 'list', values }, degree, natural, line };
  }
  return { kind: 'spline', of: spline.of, knots: { kind: 'count', count: spline.knots.count }, degree, natural, line };
}

function readCenters(doc: YamlDocument, file: string, centers: RawCenters, at: (string | number)[]): RbfCenters {
  if (centers === 'at-samples') return { kind: 'at-samples' };
  if (Array.isArray(centers)) return { kind: 'list', values: [...centers] };
  if (centers.to < centers.from) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.centers,
      [...at, 'to'],
      `\`to\` ${showValue(centers.to)} is below \`from\` ${showValue(centers.from)}; expected from <= to`,
    );
  }
  if ('count' in centers) {
    if (centers.count > 1 && centers.to === centers.from) {
      throw errorAt(
        doc,
        file,
        DESCRIPTOR_ERROR.centers,
        [...at, 'count'],
        `${centers.count} centres from ${centers.from} to ${centers.to} would all coincide; expected from < to or count 1`,
      );
    }
    return { kind: 'count', from: centers.from, to: centers.to, count: centers.count };
  }
  const n = Math.floor((centers.to - centers.from) / centers.step) + 1;
  if (!(n <= MAX_RBF_CENTERS)) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.centers,
      [...at, 'step'],
      `step ${showValue(centers.step)} gives ${Number.isFinite(n) ? n : 'too many'} centres from ${centers.from} to ${centers.to}; expected at most ${MAX_RBF_CENTERS}`,
    );
  }
  return { kind: 'step', from: centers.from, to: centers.to, step: centers.step };
}

/** The descriptor as the schema lets it through. */
interface RawDescriptor {
  version: 1;
  name: string;
  task?: 'regression' | 'classification';
  data: {
    train: string | string[];
    holdout?: string | string[];
    target: string;
    positive?: string;
    weight?: string;
    sigma?: string;
    target_transform?: TargetTransformSpec['kind'];
    limits_scale?: TargetTransformSpec['limitsScale'];
    separator?: DataFormat['separator'];
    decimal?: DataFormat['decimal'];
    missing?: DataFormat['missing'];
    split?: { column: string; train: string; holdout: string };
  };
  terms?: RawTerm[];
  predictions?: {
    train: RawPredictionSource;
    holdout: RawPredictionSource;
    inputs?: string[];
  };
  parameters?: number;
  fit?: {
    intercept?: boolean;
    refit?: boolean;
    ridge?: number;
    folds?: number;
    fold_order?: FoldOrder;
    seed?: number;
    parameter_count?: ParameterCount;
    threshold?: number;
    refit_compare?: boolean;
  };
  coefficients?: number[];
  limits?: Record<string, LimitSpec>;
}

type RawPredictionSource = { column: string; file?: string; key?: string };

type RawCenters = number[] | 'at-samples' | { from: number; to: number; count: number } | { from: number; to: number; step: number };

type RawTerm =
  | { linear: string[] }
  | { polynomial: RawPolynomial }
  | { rbf: RawRbf }
  | { fourier: { of: string; period: number; harmonics: number; transform?: InputTransform } }
  | { spline: RawSpline }
  | { category: { of: string; reference?: string | number; unseen?: 'error' | 'zero' } };

type RawRbf = {
  of: string | string[];
  centers: RawCenters | number[][] | { from: number; to: number; count: number }[];
  width: number;
  transform?: InputTransform;
};

type RawPolynomial = {
  of: string | string[];
  degree: number;
  shift?: number | number[];
  scale?: number | number[];
  transform?: InputTransform;
};

type RawSpline = { of: string; knots: number[] | { count: number }; degree?: number; natural?: boolean; transform?: InputTransform };

/**
 * The `data` rules the schema cannot say: exactly one of `holdout` and `split`; a split's two
 * labels differ; a decimal comma needs a separator other than the comma.
 * @throws InputError `data-form` naming the key
 */
function checkDataForm(doc: YamlDocument, file: string, data: RawDescriptor['data']): void {
  if (data.holdout === undefined && data.split === undefined) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.dataForm,
      ['data'],
      'expected `data.holdout` (a hold-out CSV) or `data.split` (a split column in the training file); got neither',
      'key',
    );
  }
  if (data.holdout !== undefined && data.split !== undefined) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.dataForm,
      ['data', 'split'],
      'expected either `data.holdout` or `data.split`, not both: with a split column the hold-out rows come from the training file',
      'key',
    );
  }
  if (data.split !== undefined && data.split.train === data.split.holdout) {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.dataForm,
      ['data', 'split', 'holdout'],
      `expected a hold-out label different from the training label ${showValue(data.split.train)}`,
    );
  }
  if (data.decimal === ',' && data.separator === ',') {
    throw errorAt(
      doc,
      file,
      DESCRIPTOR_ERROR.dataForm,
      ['data', 'decimal'],
      'a decimal comma needs a separator other than the comma; expected `data.separator` to be ";" or "\\t" (or `auto`)',
    );
  }
}
