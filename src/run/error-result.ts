/**
 * The outcome of a model that could not be checked: verdict `error` with the file, line and code.
 */
import { clip, type InputError } from '../core/errors.js';
import type { ModelResult } from '../result/result.js';

/** Error code of a model that failed through a fault in fitgate rather than in its files. */
export const INTERNAL_ERROR = 'internal-error';

/**
 * The outcome of a model that could not be checked. The message starts with the key path
 * (`` `terms[0].polynomial.degree`: ``) when the error has one, as {@link InputError.describe}
 * does, since the result keeps only the file and line of the location.
 */
export function errorResult(name: string, descriptor: string, error: InputError): ModelResult {
  const key = error.location.key;
  return {
    name,
    descriptor,
    verdict: 'error',
    rows: { train: 0, holdout: 0 },
    parameters: 0,
    columns: [],
    metrics: null,
    coefficients: [],
    shipped: null,
    checks: [],
    error: {
      message: key !== undefined && key !== '' ? `\`${clip(key)}\`: ${error.message}` : error.message,
      file: error.location.file ?? null,
      line: error.location.line ?? null,
      ...(error.location.column !== undefined ? { column: error.location.column } : {}),
      code: error.code,
    },
  };
}
