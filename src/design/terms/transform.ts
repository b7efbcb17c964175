/**
 * `transform: log | log1p | sqrt | standardise` on a term's input(s): the term is built and
 * filled on t(x) instead of x, so that a dose-response on a log scale is
 * `polynomial: { of: dose, degree: 2, transform: log }` and every diagnostic (swing scans, charts)
 * still varies the real input x. t: log(x) (natural logarithm, x > 0), log1p(x) = log(1 + x)
 * (x > -1, accurate near 0), sqrt(x) (x >= 0), standardise: (x - mean) / sd with the training mean
 * and population standard deviation. Column names carry the transform: `z(log(dose))^2`.
 */
import type { InputTransform, TermSpec } from '../../config/types.js';
import type { ModelData } from '../../data/model-data.js';
import { placeOfLine } from '../../data/data-parts.js';
import { InputError } from '../../core/errors.js';
import { meanAndSd } from '../stats.js';
import type { Term, TrainingColumns } from './types.js';

/** Whether t is defined at v. */
export function inTransformDomain(transform: InputTransform, v: number): boolean {
  switch (transform) {
    case 'log':
      return v > 0;
    case 'log1p':
      return v > -1;
    case 'sqrt':
      return v >= 0;
    case 'standardise':
      return true;
  }
}

/** What each transform expects, for messages. */
const DOMAIN: Record<InputTransform, string> = {
  log: 'a value above 0',
  log1p: 'a value above -1',
  sqrt: 'a value of 0 or more',
  standardise: 'a number',
};

/**
 * InputError `transform-domain` naming the data file, line, column and value of the first row of
 * `data` whose input is outside the transform's domain; nothing when every value is inside.
 * @param spec the term (its `transform` and inputs)
 * @param inputs the term's input names
 * @param data rows with their input columns in `order`
 * @param order input names of `data.inputs`
 */
export function checkTransformDomain(
  spec: TermSpec,
  inputs: readonly string[],
  data: Pick<ModelData, 'inputs' | 'rows' | 'lines' | 'file'>,
  order: readonly string[],
): void {
  const transform = spec.kind === 'linear' || spec.kind === 'category' ? undefined : spec.transform;
  if (transform === undefined || transform === 'standardise') return;
  for (const name of inputs) {
    const col = data.inputs[order.indexOf(name)];
    const i = firstOutside(col, data.rows, transform);
    if (i < 0) continue;
    const place = placeOfLine(data, data.lines[i]);
    throw new InputError(
      'transform-domain',
      `column \`${name}\` is ${col[i]} on line ${place.line} of ${place.file}, outside the domain of \`transform: ${transform}\` of the ${spec.kind} term on line ${spec.line}; expected ${DOMAIN[transform]}`,
      { file: place.file, line: place.line, key: name },
    );
  }
}

/** Index of the first of n values outside the domain, or -1 (one loop; see DEVELOPERS.md, "Writing hot loops"). */
function firstOutside(x: Float64Array, n: number, transform: InputTransform): number {
  for (let i = 0; i < n; i++) if (!inTransformDomain(transform, x[i])) return i;
  return -1;
}

/** t(x) into out for i < m (one loop per transform). */
function applyInto(transform: InputTransform, x: Float64Array, m: number, shift: number, scale: number, out: Float64Array): void {
  if (transform === 'log') for (let i = 0; i < m; i++) out[i] = Math.log(x[i]);
  else if (transform === 'log1p') for (let i = 0; i < m; i++) out[i] = Math.log1p(x[i]);
  else if (transform === 'sqrt') for (let i = 0; i < m; i++) out[i] = Math.sqrt(x[i]);
  else for (let i = 0; i < m; i++) out[i] = (x[i] - shift) / scale;
}

/** The increasing maps of the transforms that have a fixed form, and their inverses (x = expm1(t) for log1p...). */
const FORWARD: Record<'log' | 'log1p' | 'sqrt', (v: number) => number> = { log: Math.log, log1p: Math.log1p, sqrt: Math.sqrt };
const INVERSE: Record<'log' | 'log1p' | 'sqrt', (v: number) => number> = {
  log: Math.exp,
  log1p: Math.expm1,
  sqrt: (v) => (v > 0 ? v * v : 0),
};

/** The input's name as the inner term sees it, e.g. `log(dose)`. */
function renamed(transform: InputTransform, name: string): string {
  return transform === 'standardise' ? `std(${name})` : `${transform}(${name})`;
}

/** The spec with its inputs renamed to their transformed names (and without `transform`). */
function innerSpec(spec: Exclude<TermSpec, { kind: 'linear' } | { kind: 'category' }>, transform: InputTransform): TermSpec {
  const { transform: _dropped, ...rest } = spec;
  if (rest.kind === 'multi-polynomial' || rest.kind === 'multi-rbf')
    return { ...rest, of: rest.of.map((n) => renamed(transform, n)) } as TermSpec;
  return { ...rest, of: renamed(transform, rest.of) } as TermSpec;
}

/**
 * Builds a term on transformed inputs: `build` makes the inner term from the renamed spec and the
 * transformed training columns; the returned term reads the real inputs and transforms each block.
 * @throws InputError `constant-input` for `standardise` of a constant column
 */
export function transformedTerm(
  spec: Exclude<TermSpec, { kind: 'linear' } | { kind: 'category' }>,
  training: TrainingColumns,
  file: string,
  inputs: readonly string[],
  build: (inner: TermSpec, columns: TrainingColumns) => Term,
): Term {
  const transform = spec.transform as InputTransform;
  const shift: number[] = [];
  const scale: number[] = [];
  const columns = new Map<string, Float64Array>();
  for (const name of inputs) {
    const x = training.get(name) as Float64Array;
    const { mean, sd } = meanAndSd(x);
    if (transform === 'standardise' && !(sd > 0)) {
      throw new InputError(
        'constant-input',
        `column \`${name}\` is constant in the training data, so \`transform: standardise\` would divide by 0; drop the transform or the term`,
        { file, line: spec.line, key: 'transform' },
      );
    }
    shift.push(mean);
    scale.push(sd);
    const out = new Float64Array(x.length);
    applyInto(transform, x, x.length, mean, sd, out);
    columns.set(renamed(transform, name), out);
  }
  const inner = build(innerSpec(spec, transform), columns);
  let scratch: Float64Array[] = [];
  return {
    spec,
    inputs,
    columnNames: inner.columnNames,
    fixed: { ...inner.fixed, ...(transform === 'standardise' ? { transform_shift: shift, transform_scale: scale } : {}) },
    ...(transform === 'standardise' ? {} : { inputScale: { name: transform, forward: FORWARD[transform], inverse: INVERSE[transform] } }),
    admits: (name, value) => !inputs.includes(name) || inTransformDomain(transform, value),
    fill(blockInputs, m, out, offset) {
      if (scratch.length !== blockInputs.length || scratch[0].length < m) scratch = blockInputs.map(() => new Float64Array(m));
      const views = blockInputs.map((x, k) => {
        applyInto(transform, x, m, shift[k], scale[k], scratch[k]);
        return scratch[k].subarray(0, m);
      });
      inner.fill(views, m, out, offset);
    },
  };
}
