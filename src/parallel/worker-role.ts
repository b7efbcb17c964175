/**
 * Which kind of fitgate worker thread this is. Every worker runs the same bundle file as the
 * command (dist/ is one file per entry), so the entry files ask {@link isFitgateWorker} and stand
 * aside, and each worker module starts its loop only for its own role.
 */
import { isMainThread, workerData } from 'node:worker_threads';

/** The `workerData` key that marks a fitgate worker. */
export const WORKER_FLAG = 'fitgateWorker';
/** The `workerData` key naming the worker's role; absent for a model worker. */
export const WORKER_ROLE = 'fitgateRole';

/** True in any worker thread fitgate started (model or helper). */
export function isFitgateWorker(): boolean {
  return !isMainThread && typeof workerData === 'object' && workerData !== null && (workerData as Record<string, unknown>)[WORKER_FLAG] === true;
}

/** The role of this fitgate worker (`model` when none is named), or null outside one. */
export function workerRole(): string | null {
  if (!isFitgateWorker()) return null;
  const role = (workerData as Record<string, unknown>)[WORKER_ROLE];
  return typeof role === 'string' ? role : 'model';
}
