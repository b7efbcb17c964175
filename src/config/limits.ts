/**
 * The limit keys a model can set, their defaults, and how the three layers of limits
 * (built-in defaults < settings file < descriptor) combine. Checks read their limit from
 * `Descriptor.limits[key]`; to add a check with a limit, add one entry to {@link LIMIT_KEYS}
 * (and the same key to `limits` in both JSON Schemas, which a test keeps in step).
 */

import type { Limit, LimitSource, LimitSpec, SettingsFile } from './types.js';

/** One known limit key: its YAML name, its built-in default, and one line for the README. */
export interface LimitKeyInfo {
  /** Key in the YAML `limits` map, e.g. `gap_ratio`. */
  key: string;
  /** Built-in default, used when neither settings nor descriptor set the key. */
  defaultSpec: LimitSpec;
  /** One sentence: what figure the limit applies to. */
  description: string;
}

/**
 * Every limit key known today, in the order the README lists them. Values above a number
 * fail; `{ warn, fail }` warns above `warn` and fails above `fail`; `off` skips the check.
 */
export const LIMIT_KEYS: ReadonlyArray<LimitKeyInfo> = Object.freeze([
  {
    key: 'gap_ratio',
    defaultSpec: 1.5,
    description: 'Hold-out RMSE divided by training RMSE.',
  },
  {
    key: 'params_per_sample',
    defaultSpec: 0.1,
    description: 'Fitted parameters divided by training rows (common practice: at least 10 rows per parameter).',
  },
  {
    key: 'coefficient',
    defaultSpec: 25,
    description: 'Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns.',
  },
  {
    key: 'cv_ratio',
    defaultSpec: 'off',
    description: 'Pooled k-fold cross-validation RMSE divided by training RMSE.',
  },
  {
    key: 'leakage',
    defaultSpec: 0,
    description: 'Hold-out rows that also appear in the training data (the default 0 fails when there is any).',
  },
  {
    key: 'swing',
    defaultSpec: { warn: 0.25, fail: 0.5 },
    description: 'How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths.',
  },
  {
    key: 'swing_beyond',
    defaultSpec: { warn: 1 },
    description: 'Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation).',
  },
  {
    key: 'condition',
    defaultSpec: { warn: 1e8 },
    description: '2-norm condition number of the column-scaled design matrix.',
  },
  {
    key: 'reproducibility',
    defaultSpec: 0.01,
    description: 'Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target.',
  },
  {
    key: 'complexity',
    defaultSpec: { warn: 1.5 },
    description: 'Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks.',
  },
  {
    key: 'base_change',
    defaultSpec: 'off',
    description: 'Relative change of the hold-out RMSE against the same model on the base branch.',
  },
] satisfies LimitKeyInfo[]);

/** The known limit keys, in table order. */
export function limitKeyNames(): string[] {
  return LIMIT_KEYS.map((k) => k.key);
}

/**
 * Normalises a limit as written to a {@link Limit}.
 *
 * @param spec a number (fail above it), `{ warn?, fail? }` (at least one) or `off`; numbers
 *   finite and >= 0, warn <= fail. The loaders check this with file positions first; here
 *   a bad spec is a programming error (TypeError / RangeError).
 * @param source which layer the spec came from
 * @param line descriptor line of the key (descriptor limits), else null
 */
export function toLimit(spec: LimitSpec, source: LimitSource, line: number | null): Limit {
  if (spec === 'off') return { warn: null, fail: null, off: true, source, line };
  if (typeof spec === 'number') {
    assertThreshold(spec);
    return { warn: null, fail: spec, off: false, source, line };
  }
  if (spec === null || typeof spec !== 'object') throw new TypeError(`limit spec must be a number, { warn, fail } or 'off', got ${String(spec)}`);
  const warn = spec.warn ?? null;
  const fail = spec.fail ?? null;
  if (warn === null && fail === null) throw new RangeError('limit spec { warn, fail } needs at least one of them');
  if (warn !== null) assertThreshold(warn);
  if (fail !== null) assertThreshold(fail);
  if (warn !== null && fail !== null && warn > fail) throw new RangeError(`limit warn ${warn} is above fail ${fail}`);
  return { warn, fail, off: false, source, line };
}

function assertThreshold(x: number): void {
  if (typeof x !== 'number' || !Number.isFinite(x) || x < 0) throw new RangeError(`limit threshold must be a finite number >= 0, got ${String(x)}`);
}

/**
 * Merges limits key by key: built-in default < settings file < descriptor. A layer that
 * sets a key replaces the whole limit of the layer below (no mixing of `warn` from one
 * layer with `fail` from another).
 *
 * @param settings the settings file (its `limits`)
 * @param descriptorLimits the descriptor's own limits with the line of each key
 * @returns one {@link Limit} per known key plus any further key a layer sets
 */
export function mergeLimits(
  settings: SettingsFile,
  descriptorLimits: Record<string, { spec: LimitSpec; line: number }>,
): Record<string, Limit> {
  const merged: Record<string, Limit> = {};
  for (const { key, defaultSpec } of LIMIT_KEYS) merged[key] = toLimit(defaultSpec, 'default', null);
  for (const [key, { spec }] of Object.entries(settings.limits)) merged[key] = toLimit(spec, 'settings', null);
  for (const [key, { spec, line }] of Object.entries(descriptorLimits)) merged[key] = toLimit(spec, 'descriptor', line);
  return merged;
}
