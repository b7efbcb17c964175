/**
 * Whether this thread is one of fitgate's worker threads. Every worker runs the same bundle as the
 * command (the bundle of an entry is its worker script too), so the entry files ask
 * {@link isFitgateWorker} and stand aside, and the worker module starts its loop instead.
 */
import { isMainThread, workerData } from 'node:worker_threads';

/** The `workerData` key that marks a fitgate worker. */
export const WORKER_FLAG = 'fitgateWorker';

/** True in any worker thread fitgate started. */
export function isFitgateWorker(): boolean {
  return (
    !isMainThread && typeof workerData === 'object' && workerData !== null && (workerData as Record<string, unknown>)[WORKER_FLAG] === true
  );
}
