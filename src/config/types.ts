/**
 * The validated, normalised shapes of the two YAML files a user writes: the repository
 * settings (`fitgate.yml`) and a model descriptor (`*.model.yml`). Loaders in this folder
 * turn YAML text into these; nothing downstream sees raw YAML.
 */

/**
 * A limit as written in YAML: a number or `{ warn, fail }` in the check's own direction (above it
 * for a ceiling such as `gap_ratio`, below it for a floor such as `events_per_parameter`),
 * explicit bounds `{ warn_below, fail_below, warn_above, fail_above }` (any of them, for a floor,
 * a ceiling or both on any check), or `off`.
 */
export type LimitSpec =
  | number
  | { warn?: number; fail?: number }
  | { warn_below?: number; fail_below?: number; warn_above?: number; fail_above?: number }
  | 'off';

/** Which way a check's figure goes bad: `above` its limit (a ceiling) or `below` it (a floor). */
export type LimitDirection = 'above' | 'below';

/** Where a limit's value came from, lowest precedence first. */
export type LimitSource = 'default' | 'settings' | 'descriptor';

/**
 * A resolved limit. A check value strictly above `fail` or strictly below `failBelow` fails;
 * otherwise strictly above `warn` or strictly below `warnBelow` warns. `off` skips the check.
 * `line` is the descriptor line that set it (descriptor limits only).
 */
export interface Limit {
  /** Ceiling for a warning, or null. */
  warn: number | null;
  /** Ceiling for a failure, or null. */
  fail: number | null;
  /** Floor for a warning, or null. */
  warnBelow: number | null;
  /** Floor for a failure, or null. */
  failBelow: number | null;
  off: boolean;
  source: LimitSource;
  /** 1-based descriptor line of this limit's key when the descriptor sets it, else null. */
  line: number | null;
}

/** A position in a YAML file: 1-based line and column. */
export interface Position {
  line: number;
  column: number;
}

/** Centres of a Gaussian radial basis term, as written. */
export type RbfCenters =
  | { kind: 'list'; values: number[] }
  | { kind: 'count'; from: number; to: number; count: number }
  | { kind: 'step'; from: number; to: number; step: number }
  | { kind: 'at-samples' };

/**
 * A transform applied to a term's input before the term sees it: log(x) (x > 0), log(1 + x)
 * (x > -1), sqrt(x) (x >= 0), or (x - mean) / sd with the training mean and population standard
 * deviation. Absent: the input as it is.
 */
export type InputTransform = 'log' | 'log1p' | 'sqrt' | 'standardise';

/** `linear: [cols]`: the columns as they are. */
export interface LinearTermSpec {
  kind: 'linear';
  columns: string[];
  line: number;
}

/** `polynomial: { of, degree, shift?, scale? }`: z^1 .. z^degree, z = (x - shift) / scale. */
export interface PolynomialTermSpec {
  kind: 'polynomial';
  of: string;
  degree: number;
  /** Null: the training mean of `of`. */
  shift: number | null;
  /** Null: the training population standard deviation of `of`. */
  scale: number | null;
  /** Transform of the input(s) before the term (see {@link InputTransform}); absent: none. */
  transform?: InputTransform;
  line: number;
}

/** `rbf: { of, centers, width }`: exp(-(x - c)^2 / (2 width^2)) per centre c. */
export interface RbfTermSpec {
  kind: 'rbf';
  of: string;
  centers: RbfCenters;
  width: number;
  /** Transform of the input(s) before the term (see {@link InputTransform}); absent: none. */
  transform?: InputTransform;
  line: number;
}

/** `fourier: { of, period, harmonics }`: sin and cos of 2 pi j x / period, j = 1 .. harmonics. */
export interface FourierTermSpec {
  kind: 'fourier';
  of: string;
  period: number;
  harmonics: number;
  /** Transform of the input(s) before the term (see {@link InputTransform}); absent: none. */
  transform?: InputTransform;
  line: number;
}

/** Knots of a spline term, as written: interior knots, or a count placed at training quantiles. */
export type SplineKnots = { kind: 'list'; values: number[] } | { kind: 'count'; count: number };

/**
 * `spline: { of, knots, degree?, natural? }`: a B-spline basis of `degree` (default 3) on the
 * interior knots and the training range, or natural cubic splines (linear beyond the boundary knots).
 */
export interface SplineTermSpec {
  kind: 'spline';
  of: string;
  knots: SplineKnots;
  degree: number;
  natural: boolean;
  /** Transform of the input(s) before the term (see {@link InputTransform}); absent: none. */
  transform?: InputTransform;
  line: number;
}

/**
 * `polynomial: { of: [a, b, ...], degree, shift?, scale? }`: every monomial of total degree 1 .. degree
 * in z_i = (x_i - shift_i) / scale_i (kind `multi-polynomial` once read, so that single-input code
 * keeps its `of: string`).
 */
export interface MultiPolynomialTermSpec {
  kind: 'multi-polynomial';
  of: string[];
  degree: number;
  /** Per input; null entries: the training mean. */
  shift: (number | null)[];
  /** Per input; null entries: the training population standard deviation. */
  scale: (number | null)[];
  /** Transform of the input(s) before the term (see {@link InputTransform}); absent: none. */
  transform?: InputTransform;
  line: number;
}

/** Centres of a radial term over several inputs, as written (in the inputs' own units). */
export type MultiRbfCenters =
  | { kind: 'rows'; rows: number[][] }
  | { kind: 'grid'; axes: { from: number; to: number; count: number }[] }
  | { kind: 'at-samples' };

/**
 * `rbf: { of: [a, b, ...], centers, width }`: isotropic Gaussians exp(-||z - z_c||^2 / (2 width^2))
 * on the standardised inputs z (kind `multi-rbf` once read).
 */
export interface MultiRbfTermSpec {
  kind: 'multi-rbf';
  of: string[];
  centers: MultiRbfCenters;
  width: number;
  /** Transform of the inputs before the term; absent: none. */
  transform?: InputTransform;
  line: number;
}

/**
 * `category: { of, reference?, unseen? }`: one indicator column per training level of a text column
 * but the reference level (default: the most frequent, ties by text order).
 */
export interface CategoryTermSpec {
  kind: 'category';
  of: string;
  /** The reference level; null: the most frequent training level (ties: first in text order). */
  reference: string | null;
  /** A hold-out level not seen in training: an error (default), or every indicator 0 (`zero`). */
  unseen: 'error' | 'zero';
  line: number;
}

/** One entry of a descriptor's `terms` list. */
export type TermSpec =
  | LinearTermSpec
  | PolynomialTermSpec
  | RbfTermSpec
  | FourierTermSpec
  | SplineTermSpec
  | MultiPolynomialTermSpec
  | MultiRbfTermSpec
  | CategoryTermSpec;

/** How cross-validation folds are assigned to rows. */
export type FoldOrder = 'shuffled' | 'blocks';

/** What the parameter ratio counts: design columns, or a ridge fit's effective degrees of freedom. */
export type ParameterCount = 'columns' | 'effective';

/** The descriptor's `fit` block with settings defaults applied. */
export interface FitSpec {
  /** Add a column of ones first. Default true. */
  intercept: boolean;
  /** Refit from the training rows (true; also when absent), or score the shipped coefficients only (false). */
  refit?: boolean;
  /** L2 penalty on every coefficient but the intercept. Default 0 (least squares). */
  ridge: number;
  /** k of k-fold cross-validation, 2 to 50 (the schemas' bound). Default 5. */
  folds: number;
  /** Fold assignment. Default `shuffled` (from `seed`). */
  foldOrder: FoldOrder;
  /** Seed of the fold shuffle. Default 1. */
  seed: number;
  /** What `parameter-ratio` counts. Default `columns`. */
  parameterCount: ParameterCount;
  /** Line of the `fit` key, or of `terms` when the descriptor has no `fit` block. */
  line: number;
  /** Line of `ridge` inside `fit` when given, else `line`. */
  ridgeLine: number;
  /** Classification: a row is predicted positive when its probability is at least this. Default 0.5 (absent: 0.5). */
  threshold?: number;
  /** With `refit: false`: also report the refit's figures beside the shipped model's (`fit.refit_compare`). Default false (absent: false). */
  refitCompare?: boolean;
}

/**
 * Where one file's predictions of a model trained elsewhere are (`predictions.train` or
 * `predictions.holdout`): a column of the data file (`file` null), or a column of a side file
 * whose rows go with the data rows in order (`key` null) or by a key column both files hold.
 */
export interface PredictionSource {
  /** Column holding the predictions. */
  column: string;
  /** Side file, repository-relative once loaded (checked to be inside the repository); null: the data file itself. */
  file: string | null;
  /** Row key column of both files; null: rows go in file order. */
  key: string | null;
  /** Line of `predictions.train` / `predictions.holdout`. */
  line: number;
}

/** `predictions`: a model trained elsewhere, gated from its predictions only. */
export interface PredictionsSpec {
  train: PredictionSource;
  holdout: PredictionSource;
  /** The model's input columns (for `leakage`); empty when not given. */
  inputs: string[];
  /** Line of `predictions`. */
  line: number;
}

/** What a model predicts: a number (`regression`, the default) or one of two classes (`classification`, binary). */
export type Task = 'regression' | 'classification';
/** `data.weight` or `data.sigma`: the column, which of the two, and the line of the key. */
export interface Weighting {
  kind: 'weight' | 'sigma';
  column: string;
  line: number;
}

/**
 * `data.target_transform` (with `data.limits_scale`): the model is fitted on t = g(y), g one of
 * log(y) (y > 0), log(1 + y) (y > -1) or sqrt(y) (y >= 0); figures are reported on both scales and
 * the limits judge the `limitsScale` one (default `original`: back-transformed predictions against y).
 */
export interface TargetTransformSpec {
  kind: 'log' | 'log1p' | 'sqrt';
  /** The scale error limits apply to. Default `original`. */
  limitsScale: 'original' | 'transformed';
  /** Line of `data.target_transform`. */
  line: number;
}

/** How a descriptor's data files are written (the `data` keys `separator`, `decimal`, `missing`). */
export interface DataFormat {
  /** `auto` (default: detected from the header line), `,`, `;` or a tab. */
  separator: 'auto' | ',' | ';' | '\t';
  /** Decimal mark: `.` (default) or `,`. */
  decimal: '.' | ',';
  /** `error` (default) or `drop` (rows with a missing used cell are dropped and counted). */
  missing: 'error' | 'drop';
}

/** `data.split`: the split column and the labels of training and hold-out rows. */
export interface DataSplit {
  column: string;
  train: string;
  holdout: string;
  /** Line of `data.split` in the descriptor. */
  line: number;
}

/** A model descriptor after validation. */
export interface Descriptor {
  /** Descriptor path relative to the repository root, with `/` separators. */
  file: string;
  /** Unique model name. */
  name: string;
  task: Task;
  data: {
    /** Training CSV, repository-relative (already checked to be inside the repository). */
    train: string;
    /** Hold-out CSV, repository-relative. */
    holdout: string;
    /**
     * The training parts, when `data.train` is a list or a glob (config/data-paths.ts): resolved,
     * in code-point order, at least one; `train` is then the first. Absent for one file.
     */
    trainParts?: string[];
    /** The hold-out parts, as {@link Descriptor.data.trainParts} (with `data.split`: the training parts). */
    holdoutParts?: string[];
    /** Target column name. */
    target: string;
    /** Lines of `data.train`, `data.holdout`, `data.target`. */
    lines: { train: number; holdout: number; target: number };
    /** Classification: the positive label when the target holds text labels (`data.positive`); null when not given. */
    positive?: string | null;
    /**
     * Row weights, when given: `data.weight` (w as written, >= 0) or `data.sigma` (standard
     * uncertainties, w = 1 / sigma^2). Absent or null: every row weighs 1.
     */
    weighting?: Weighting | null;
    /**
     * How the files are written (`data.separator`, `data.decimal`, `data.missing`); defaults
     * `auto`, `.`, `error`. Optional so that descriptors built in code before it existed still type-check.
     */
    format?: DataFormat;
    /** `data.target_transform` and `data.limits_scale`; absent or null: the target as written. */
    targetTransform?: TargetTransformSpec | null;
    /** `data.split`: one file, rows divided by a label column (`holdout` then names the same file as `train`); null without. */
    split?: DataSplit | null;
  };
  terms: TermSpec[];
  fit: FitSpec;
  /** Shipped coefficients, intercept first, when the descriptor has them. */
  coefficients: number[] | null;
  /** Line of `coefficients`, or null. */
  coefficientsLine: number | null;
  /** Limits after merging defaults < settings < descriptor, by limit key. */
  limits: Record<string, Limit>;
  /** Line of `name`. */
  nameLine: number;
  /** Line of `terms`. */
  termsLine: number;
  /**
   * A model trained elsewhere (`predictions`): fitgate scores its predictions and does not refit
   * it; `terms` is then empty and `termsLine` the line of `predictions`. Absent or null: a model
   * of terms.
   */
  predictions?: PredictionsSpec | null;
  /** `parameters`: the stated parameter count of a model trained elsewhere; absent or null when not stated. */
  parameters?: number | null;
  /** Line of `parameters`, or null. */
  parametersLine?: number | null;
}

/** Resource caps that guard memory and time; settings can raise them. */
export interface ResourceCaps {
  /** Largest data file in bytes. Default 512 MiB. */
  maxFileBytes: number;
  /** Largest training rows x parameters. Default 2e8. */
  maxCells: number;
  /** Largest estimated work of one model, in operations (see run/cost.ts). Default 2e10. */
  maxOperations: number;
  /** Time limit of one model in seconds (wall clock, files to last check). Default 40. */
  maxModelSeconds: number;
}

/** The repository settings file after validation. */
export interface SettingsFile {
  /** Settings path relative to the repository root; null when there is no settings file. */
  file: string | null;
  /** Glob patterns of descriptors, relative to the repository root. */
  models: string[];
  /** Settings-level limits (not yet merged with defaults), by limit key, with their spec lines. */
  limits: Record<string, { spec: LimitSpec; line: number }>;
  /** Defaults for `fit` keys a descriptor leaves out. */
  fit: { folds: number; foldOrder: FoldOrder; seed: number; parameterCount: ParameterCount };
  caps: ResourceCaps;
  /**
   * Messages about how the settings file was found, for the run's notes (e.g. a `fitgate.yaml`
   * beside the `fitgate.yml` that fitgate reads). Default none.
   */
  notes?: string[];
}
