/**
 * The outcome of a model that could not be checked: verdict `error` with the file, line and code.
 */
import { clip, InputError } from '../core/errors.js';
import type { Descriptor } from '../config/types.js';
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

/** Error code of a model stopped at its time limit (`caps.max_model_seconds`). */
export const TIME_LIMIT = 'time-limit';

/**
 * The error of a model stopped at its time limit, at the descriptor's `terms` line.
 * @param descriptor the model
 * @param limitSeconds the limit (`caps.max_model_seconds`)
 * @param elapsedMs time spent when it was stopped
 * @param stage what was running (a stage of the run), or null when the model's thread was ended from outside
 * @param settingsFile path of the settings file, or null when there is none
 */
export function timeLimitError(
  descriptor: Descriptor,
  limitSeconds: number,
  elapsedMs: number,
  stage: string | null,
  settingsFile: string | null,
): InputError {
  const where = stage === null ? 'its worker thread was stopped' : `stopped in the ${stage}`;
  return new InputError(
    TIME_LIMIT,
    `did not finish within the time limit of ${limitSeconds} s per model (${where} after ${(elapsedMs / 1000).toFixed(1)} s); raise caps.max_model_seconds in ${settingsFile ?? 'the settings file (fitgate.yml)'} to allow more time, or make the model smaller (fewer rows, columns, folds or sweep settings)`,
    { file: descriptor.file, line: descriptor.termsLine },
  );
}
