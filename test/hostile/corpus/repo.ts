/**
 * A small valid repository that the hostile cases start from and break one thing at a time:
 * settings `fitgate.yml`, one descriptor `models/m.model.yml` (a straight line in `x`), and
 * training / hold-out CSV files of y = 2x + 1 plus a small fixed wobble. As written it passes
 * every default limit (2 parameters for 30 rows; hold-out rows lie between training rows).
 */
import type { FileSpec } from '../harness.js';

/** Settings: the descriptor glob only. */
export const SETTINGS = 'version: 1\nmodels:\n  - "models/*.model.yml"\n';

/** The descriptor, with `extra` lines appended (e.g. `limits:` or `fit:` blocks). */
export function descriptor(
  options: { name?: string; train?: string; holdout?: string; target?: string; terms?: string; extra?: string } = {},
): string {
  const terms = options.terms ?? '  - linear: [x]\n';
  return (
    `version: 1\nname: ${options.name ?? 'm'}\ndata:\n  train: ${options.train ?? '../data/train.csv'}\n  holdout: ${options.holdout ?? '../data/holdout.csv'}\n` +
    `  target: ${options.target ?? 'y'}\nterms:\n${terms}${options.extra ?? ''}`
  );
}

const wobble = (i: number): number => (((i * 7) % 5) - 2) * 0.1;

/** `n` rows of `x,y` with x = x0 + i * step and y = 2x + 1 + wobble, header `header`. */
export function rows(n: number, x0 = 0, step = 1, header = 'x,y', eol = '\n'): string {
  const out = [header];
  for (let i = 0; i < n; i++) {
    const x = x0 + i * step;
    out.push(`${x},${Math.round((2 * x + 1 + wobble(i)) * 1e6) / 1e6}`);
  }
  return `${out.join(eol)}${eol}`;
}

/** Training rows of the base repository. */
export const TRAIN = rows(30);
/** Hold-out rows of the base repository (between training rows). */
export const HOLDOUT = rows(10, 0.5, 3);

/** The base repository with some files replaced or added (`null` removes a file). */
export function repo(changes: Record<string, FileSpec | null> = {}): Record<string, FileSpec> {
  const files: Record<string, FileSpec> = {
    'fitgate.yml': SETTINGS,
    'models/m.model.yml': descriptor(),
    'data/train.csv': TRAIN,
    'data/holdout.csv': HOLDOUT,
  };
  for (const [name, spec] of Object.entries(changes)) {
    if (spec === null) delete files[name];
    else files[name] = spec;
  }
  return files;
}
