/**
 * `linear: [cols]`: each listed column as it is, phi(x) = x.
 */
import type { LinearTermSpec } from '../../config/types.js';
import type { Term } from './types.js';

/** Builds the linear term: one design column per listed input column, copied unchanged. */
export function linearTerm(spec: LinearTermSpec): Term {
  return {
    spec,
    inputs: spec.columns,
    columnNames: spec.columns,
    fixed: {},
    fill(inputs, m, out, offset) {
      for (let j = 0; j < inputs.length; j++) {
        out.set(inputs[j].subarray(0, m), (offset + j) * m);
      }
    },
  };
}
