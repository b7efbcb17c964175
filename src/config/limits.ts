/**
 * Limits: the known keys (generated from the check registry), the limit forms, and how the three
 * layers (built-in defaults < settings file < descriptor) combine. Checks read their limit from
 * `Descriptor.limits[key]`.
 *
 * Forms (docs/configuration.md, "Limits"):
 * - a number: fail beyond it in the check's direction (above a ceiling, below a floor);
 * - `{ warn, fail }`: warn and fail beyond them in the check's direction (at least one);
 * - `{ warn_below, fail_below, warn_above, fail_above }`: explicit bounds (at least one), for a
 *   floor, a ceiling or both on any check;
 * - `off`: skip the check.
 */
import { LIMIT_KEYS, type LimitKeyInfo } from './generated/limit-keys.js';
import type { Limit, LimitDirection, LimitSource, LimitSpec, SettingsFile } from './types.js';

export { LIMIT_KEYS, type LimitKeyInfo } from './generated/limit-keys.js';

/** The known limit keys, in registry order. */
export function limitKeyNames(): string[] {
  return LIMIT_KEYS.map((k) => k.key);
}

/** The known key's entry, or undefined. */
export function limitKeyInfo(key: string): LimitKeyInfo | undefined {
  return LIMIT_KEYS.find((k) => k.key === key);
}

/** The direction of a key's check (`above` for a key no check knows). */
export function limitDirection(key: string): LimitDirection {
  return limitKeyInfo(key)?.direction ?? 'above';
}

/** The bounds of an explicit spec, or null for the other forms. */
function explicitBounds(
  spec: LimitSpec,
): { warnBelow: number | null; failBelow: number | null; warnAbove: number | null; failAbove: number | null } | null {
  if (typeof spec !== 'object' || spec === null) return null;
  if (!('warn_below' in spec || 'fail_below' in spec || 'warn_above' in spec || 'fail_above' in spec)) return null;
  const s = spec as { warn_below?: number; fail_below?: number; warn_above?: number; fail_above?: number };
  return {
    warnBelow: s.warn_below ?? null,
    failBelow: s.fail_below ?? null,
    warnAbove: s.warn_above ?? null,
    failAbove: s.fail_above ?? null,
  };
}

/**
 * Why a spec's bounds are out of order, or null when they are in order: a ceiling's warn at most
 * its fail, a floor's warn at least its fail, every floor below every ceiling.
 * @returns the offending pair as `[key, message]`
 */
export function limitOrderProblem(spec: LimitSpec, direction: LimitDirection): [string, string] | null {
  if (spec === 'off' || typeof spec === 'number') return null;
  const b = explicitBounds(spec);
  const plain = spec as { warn?: number; fail?: number };
  const warnBelow = b ? b.warnBelow : direction === 'below' ? (plain.warn ?? null) : null;
  const failBelow = b ? b.failBelow : direction === 'below' ? (plain.fail ?? null) : null;
  const warnAbove = b ? b.warnAbove : direction === 'above' ? (plain.warn ?? null) : null;
  const failAbove = b ? b.failAbove : direction === 'above' ? (plain.fail ?? null) : null;
  const [wa, fa, wb, fb] = b ? ['warn_above', 'fail_above', 'warn_below', 'fail_below'] : ['warn', 'fail', 'warn', 'fail'];
  if (warnAbove !== null && failAbove !== null && warnAbove > failAbove)
    return [wa, `${wa} ${warnAbove} is above ${fa} ${failAbove}; expected ${wa} <= ${fa} (a ceiling warns before it fails)`];
  if (warnBelow !== null && failBelow !== null && warnBelow < failBelow)
    return [wb, `${wb} ${warnBelow} is below ${fb} ${failBelow}; expected ${wb} >= ${fb} (a floor warns before it fails)`];
  const floor = Math.max(warnBelow ?? -Infinity, failBelow ?? -Infinity);
  const ceiling = Math.min(warnAbove ?? Infinity, failAbove ?? Infinity);
  // Only explicit bounds hold both a floor and a ceiling: name the floor's own key (the one written).
  if (floor > ceiling)
    return [
      warnBelow === floor ? 'warn_below' : 'fail_below',
      `the floor ${floor} is above the ceiling ${ceiling}; every value would be out of bounds`,
    ];
  return null;
}

/**
 * Normalises a limit as written to a {@link Limit}.
 *
 * @param spec one of the forms above; numbers finite (the loaders check the forms and the order
 *   with file positions first; here a bad spec is a programming error: TypeError / RangeError)
 * @param direction the check's direction, for a number and `{ warn, fail }`
 * @param source which layer the spec came from
 * @param line descriptor line of the key (descriptor limits only), else null
 */
export function toLimit(spec: LimitSpec, direction: LimitDirection, source: LimitSource, line: number | null): Limit {
  const none = { warn: null, fail: null, warnBelow: null, failBelow: null };
  if (spec === 'off') return { ...none, off: true, source, line };
  if (typeof spec === 'number') {
    assertThreshold(spec);
    return direction === 'above'
      ? { ...none, fail: spec, off: false, source, line }
      : { ...none, failBelow: spec, off: false, source, line };
  }
  if (spec === null || typeof spec !== 'object')
    throw new TypeError(`limit spec must be a number, an object of bounds or 'off', got ${String(spec)}`);
  const problem = limitOrderProblem(spec, direction);
  if (problem !== null) throw new RangeError(problem[1]);
  const b = explicitBounds(spec);
  let limit: Limit;
  if (b !== null) {
    limit = { warn: b.warnAbove, fail: b.failAbove, warnBelow: b.warnBelow, failBelow: b.failBelow, off: false, source, line };
  } else {
    const { warn = null, fail = null } = spec as { warn?: number; fail?: number };
    limit =
      direction === 'above'
        ? { ...none, warn, fail, off: false, source, line }
        : { ...none, warnBelow: warn, failBelow: fail, off: false, source, line };
  }
  const bounds = [limit.warn, limit.fail, limit.warnBelow, limit.failBelow].filter((x): x is number => x !== null);
  if (bounds.length === 0) throw new RangeError('a limit needs at least one bound');
  for (const x of bounds) assertThreshold(x);
  return limit;
}

function assertThreshold(x: number): void {
  if (typeof x !== 'number' || !Number.isFinite(x)) throw new RangeError(`limit threshold must be a finite number, got ${String(x)}`);
}

/** The default < settings layers of each settings file, made once per run (every descriptor starts from them). */
const RUN_LIMITS = new WeakMap<SettingsFile, Readonly<Record<string, Limit>>>();

/** Built-in defaults < settings file, key by key; each Limit frozen, as every descriptor of the run shares it. */
function runLimits(settings: SettingsFile): Readonly<Record<string, Limit>> {
  let limits = RUN_LIMITS.get(settings);
  if (limits === undefined) {
    const merged: Record<string, Limit> = {};
    for (const { key, defaultSpec, direction } of LIMIT_KEYS) merged[key] = Object.freeze(toLimit(defaultSpec, direction, 'default', null));
    for (const [key, { spec }] of Object.entries(settings.limits))
      merged[key] = Object.freeze(toLimit(spec, limitDirection(key), 'settings', null));
    limits = Object.freeze(merged);
    RUN_LIMITS.set(settings, limits);
  }
  return limits;
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
  const merged: Record<string, Limit> = { ...runLimits(settings) };
  for (const [key, { spec, line }] of Object.entries(descriptorLimits))
    merged[key] = toLimit(spec, limitDirection(key), 'descriptor', line);
  return merged;
}
