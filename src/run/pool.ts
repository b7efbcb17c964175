/**
 * A small pool of worker threads: runs a list of tasks on up to `jobs` workers and returns the
 * results in the order of the tasks, whatever order they finish in. Tasks and results cross the
 * thread boundary as plain data (structured clone), so they must be plain objects, arrays,
 * strings, numbers, booleans, null and typed arrays.
 *
 * The worker side calls {@link serveTasks} with the function that does one task. An
 * {@link InputError} thrown there comes back as an InputError (code, message, location); any
 * other error comes back as an Error with the worker's message and stack. The first error
 * stops the pool (the other workers are terminated) and rejects the run.
 */
import { availableParallelism } from 'node:os';
import { isMainThread, parentPort, Worker } from 'node:worker_threads';
import { InputError, type ErrorLocation } from '../core/errors.js';

/** How to run a pool. */
export interface PoolOptions {
  /** Largest number of workers; the pool starts min(jobs, tasks) of them. At least 1. */
  jobs: number;
  /** File the workers run (absolute path or file URL); it must call {@link serveTasks}. */
  script: string | URL;
  /** Plain data every worker receives as `workerData`. Default none. */
  workerData?: unknown;
}

/** A task sent to a worker. */
interface TaskMessage<T> {
  index: number;
  task: T;
}

/** An error as it crosses the thread boundary. */
interface ErrorData {
  name: string;
  message: string;
  stack?: string;
  code?: string;
  location?: ErrorLocation;
}

/** What a worker sends back for a task. */
type ReplyMessage<R> = { index: number; ok: true; value: R } | { index: number; ok: false; error: ErrorData };

/** The number of workers to use by default: the cores Node may use (os.availableParallelism()). */
export function defaultJobs(): number {
  return Math.max(1, availableParallelism());
}

/** Turns a thrown value into plain data for the other thread. */
function errorData(error: unknown): ErrorData {
  if (error instanceof InputError) {
    return { name: 'InputError', message: error.message, stack: error.stack, code: error.code, location: { ...error.location } };
  }
  if (error instanceof Error) return { name: error.name, message: error.message, stack: error.stack };
  return { name: 'Error', message: String(error) };
}

/** Turns plain error data back into an InputError or an Error. */
function revive(data: ErrorData): Error {
  if (data.name === 'InputError' && data.code !== undefined) return new InputError(data.code, data.message, data.location ?? {});
  const error = new Error(data.message);
  error.name = data.name;
  if (data.stack !== undefined) error.stack = data.stack;
  return error;
}

/**
 * Runs every task on a pool of worker threads.
 * @param tasks plain-data tasks, each handed to one worker
 * @param options number of workers, worker script and its data
 * @returns one result per task, in task order
 * @throws the first task error (InputErrors stay InputErrors), or an Error when a worker exits early
 */
export function runPool<T, R>(tasks: readonly T[], options: PoolOptions): Promise<R[]> {
  const size = Math.min(Math.max(1, Math.floor(options.jobs)), tasks.length);
  const results = new Array<R>(tasks.length);
  if (tasks.length === 0) return Promise.resolve(results);
  return new Promise<R[]>((resolve, reject) => {
    const workers: Worker[] = [];
    let next = 0;
    let done = 0;
    let settled = false;
    const stop = (): void => {
      for (const w of workers) void w.terminate();
    };
    const failWith = (error: Error): void => {
      if (settled) return;
      settled = true;
      stop();
      reject(error);
    };
    const feed = (worker: Worker): void => {
      if (next >= tasks.length) return;
      const message: TaskMessage<T> = { index: next, task: tasks[next] };
      next++;
      worker.postMessage(message);
    };
    for (let w = 0; w < size; w++) {
      const worker = new Worker(options.script, { workerData: options.workerData });
      workers.push(worker);
      worker.on('message', (reply: ReplyMessage<R>) => {
        if (settled) return;
        if (!reply.ok) return failWith(revive(reply.error));
        results[reply.index] = reply.value;
        done++;
        if (done === tasks.length) {
          settled = true;
          stop();
          resolve(results);
          return;
        }
        feed(worker);
      });
      worker.on('error', (error) => failWith(error instanceof Error ? error : new Error(String(error))));
      worker.on('exit', (code) => {
        if (!settled) failWith(new Error(`a worker thread exited (code ${code}) before the pool finished its tasks`));
      });
      feed(worker);
    }
  });
}

/**
 * The worker side: answers every task the pool sends with `handle(task)`. Call once, at the top
 * level of the worker script. Does nothing on the main thread.
 * @param handle does one task; its value (or error) goes back to the pool
 */
export function serveTasks<T, R>(handle: (task: T) => Promise<R> | R): void {
  if (isMainThread || parentPort === null) return;
  const port = parentPort;
  port.on('message', (message: TaskMessage<T>) => {
    Promise.resolve()
      .then(() => handle(message.task))
      .then(
        (value) => port.postMessage({ index: message.index, ok: true, value } satisfies ReplyMessage<R>),
        (error: unknown) => port.postMessage({ index: message.index, ok: false, error: errorData(error) } satisfies ReplyMessage<R>),
      );
  });
}
