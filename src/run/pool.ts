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
 *
 * With a time limit, a task still running that long after its worker started it (a new worker
 * first loads its script, which does not count) has that worker ended (`Worker.terminate`, which
 * stops even a loop that never yields) and gets the result `onTimeLimit` makes for it; a new
 * worker takes over the tasks left.
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
  /**
   * The order tasks are handed out in, as indices into the tasks (each once), e.g. largest
   * first; results still come back in task order. Default: task order.
   */
  order?: readonly number[];
}

/** A per-task time limit of {@link runPool}. */
export interface PoolTimeLimit<T, R> {
  /** Milliseconds a task may run on its worker, counted from when the worker starts it (> 0). */
  ms: number;
  /** The result of a task stopped at the limit (its worker is ended first). */
  onTimeLimit: (task: T, elapsedMs: number) => R;
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

/** What a worker sends back for a task: that it started it, then its value or its error. */
type ReplyMessage<R> =
  | { index: number; started: true }
  | { index: number; ok: true; value: R }
  | { index: number; ok: false; error: ErrorData };

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
 * @param limit a per-task time limit; default none
 * @returns one result per task, in task order
 * @throws the first task error (InputErrors stay InputErrors), or an Error when a worker exits early
 */
export function runPool<T, R>(tasks: readonly T[], options: PoolOptions, limit?: PoolTimeLimit<T, R>): Promise<R[]> {
  const size = Math.min(Math.max(1, Math.floor(options.jobs)), tasks.length);
  const results = new Array<R>(tasks.length);
  if (tasks.length === 0) return Promise.resolve(results);
  const order = options.order;
  if (
    order !== undefined &&
    (order.length !== tasks.length || new Set(order).size !== tasks.length || !order.every((i) => i >= 0 && i < tasks.length))
  )
    return Promise.reject(new RangeError('runPool: `order` must list every task index once'));
  return new Promise<R[]>((resolve, reject) => {
    const workers = new Set<Worker>();
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
    const finishTask = (index: number, value: R): boolean => {
      results[index] = value;
      done++;
      if (done < tasks.length) return false;
      settled = true;
      stop();
      resolve(results);
      return true;
    };
    const start = (): void => {
      const worker = new Worker(options.script, { workerData: options.workerData });
      workers.add(worker);
      // The task this worker is on, when it was handed over, and its time-limit timer.
      let current = -1;
      let since = 0;
      let timer: NodeJS.Timeout | undefined;
      const feed = (): void => {
        if (next >= tasks.length) return;
        current = order === undefined ? next : order[next];
        next++;
        const message: TaskMessage<T> = { index: current, task: tasks[current] };
        worker.postMessage(message);
      };
      const expire = (): void => {
        if (settled || limit === undefined || current < 0) return;
        // Ended from outside: its exit and anything it still sends are ignored from here on.
        workers.delete(worker);
        void worker.terminate();
        const index = current;
        current = -1;
        if (!finishTask(index, limit.onTimeLimit(tasks[index], performance.now() - since)) && next < tasks.length) start();
      };
      worker.on('message', (reply: ReplyMessage<R>) => {
        if (settled || !workers.has(worker) || reply.index !== current) return;
        if ('started' in reply) {
          since = performance.now();
          // Unreferenced: a timer alone never keeps the process running (its worker does, while busy).
          if (limit !== undefined) timer = setTimeout(expire, limit.ms).unref();
          return;
        }
        clearTimeout(timer);
        current = -1;
        if (!reply.ok) return failWith(revive(reply.error));
        if (!finishTask(reply.index, reply.value)) feed();
      });
      worker.on('error', (error) => {
        if (workers.has(worker)) failWith(error instanceof Error ? error : new Error(String(error)));
      });
      worker.on('exit', (code) => {
        clearTimeout(timer);
        if (!settled && workers.has(worker))
          failWith(new Error(`a worker thread exited (code ${code}) before the pool finished its tasks`));
      });
      feed();
    };
    for (let w = 0; w < size; w++) start();
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
    // Posted before the task runs, so the pool's clock starts even if the task never yields.
    port.postMessage({ index: message.index, started: true } satisfies ReplyMessage<R>);
    Promise.resolve()
      .then(() => handle(message.task))
      .then(
        (value) => port.postMessage({ index: message.index, ok: true, value } satisfies ReplyMessage<R>),
        (error: unknown) => port.postMessage({ index: message.index, ok: false, error: errorData(error) } satisfies ReplyMessage<R>),
      );
  });
}
