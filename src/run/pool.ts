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
 * A worker holds up to {@link TASKS_IN_FLIGHT} tasks at a time and runs them one after another.
 * With `local`, this thread runs tasks too, from the other end of the order. With `onResult`, each
 * value is handed over as soon as it is final (a caller keeps a smaller copy instead of the whole).
 *
 * With a time limit, a task still running that long after its worker started it (a new worker
 * first loads its script, which does not count) has that worker ended (`Worker.terminate`, which
 * stops even a loop that never yields) and gets the result `onTimeLimit` makes for it; the tasks
 * that worker held but had not started go back to the others, and a new worker takes over.
 */
import { availableParallelism } from 'node:os';
import { isMainThread, parentPort, Worker } from 'node:worker_threads';
import { InputError, type ErrorLocation } from '../core/errors.js';

/** How to open a pool of worker threads ({@link openPool}). */
export interface PoolStart {
  /** Workers to start at once (at least 1; more with {@link ThreadPool.grow}). */
  jobs: number;
  /** File the workers run (absolute path or file URL); it must call {@link serveTasks}. */
  script: string | URL;
  /** Plain data every worker receives as `workerData`. Default none. */
  workerData?: unknown;
}

/** How to run one list of tasks on a pool ({@link ThreadPool.run}). */
export interface PoolRun<T, R> {
  /**
   * The order tasks are handed out in, as indices into the tasks (each once), e.g. largest
   * first; results still come back in task order. Default: task order.
   */
  order?: readonly number[];
  /**
   * Runs tasks on this thread too, beside the workers: this thread takes its tasks from the far
   * end of the order (the smallest, when the order is largest first) while the workers take theirs
   * from the front, one task at a time, yielding to the event loop between tasks so that the
   * workers' replies are taken in meanwhile. It starts at once, even while the workers still load
   * their script. A task here has no time limit from the pool (it keeps its own). Default none.
   */
  local?: (task: T) => Promise<R>;
  /**
   * Called with each task's value as soon as it is final (in the order they finish, on this
   * thread); the run keeps what it returns as the task's result. Default: the value itself.
   */
  onResult?: (value: R, index: number) => R;
}

/** How to run a pool once ({@link runPool}): the start and the run together. */
export interface PoolOptions<T = unknown, R = unknown> extends PoolStart, PoolRun<T, R> {}

/**
 * Tasks a worker holds at a time: the one it runs and three more, so that it does not wait for
 * this thread (busy with its own task, a model of a few milliseconds) to hand it more.
 */
export const TASKS_IN_FLIGHT = 4;

/** A per-task time limit of a run. */
export interface PoolTimeLimit<T, R> {
  /** Milliseconds a task may run on its worker, counted from when the worker starts it (> 0). */
  ms: number;
  /** The result of a task stopped at the limit (its worker is ended first; the tasks it held but had not started go to other workers). */
  onTimeLimit: (task: T, elapsedMs: number) => R;
}

/** Worker threads that stay up between runs of tasks; see the module comment. */
export interface ThreadPool {
  /**
   * Runs every task on the workers (and on this thread with `options.local`); one run at a time.
   * @returns one result per task, in task order
   * @throws the first task error (InputErrors stay InputErrors), or an Error when a worker exits early
   */
  run<T, R>(tasks: readonly T[], options?: PoolRun<T, R>, limit?: PoolTimeLimit<T, R>): Promise<R[]>;
  /** Starts workers until there are `count` (never fewer than now). */
  grow(count: number): void;
  /** Workers running now. */
  readonly size: number;
  /** Ends every worker; calling it again does nothing. */
  close(): void;
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

/** One worker thread of a pool: the tasks of the current run it holds, and the first one's clock. */
interface PoolWorker {
  thread: Worker;
  held: number[];
  since: number;
  timer: NodeJS.Timeout | undefined;
}

/** The run a pool is doing: its queue, results and how it ends. */
interface ActiveRun {
  feed(w: PoolWorker): void;
  reply(w: PoolWorker, message: ReplyMessage<unknown>): void;
  fail(error: Error): void;
}

/**
 * Opens a pool and starts `start.jobs` workers at once (they load their script while this thread
 * goes on).
 * @param start number of workers, worker script and its data
 */
export function openPool(start: PoolStart): ThreadPool {
  const workers = new Set<PoolWorker>();
  let active: ActiveRun | null = null;
  // A worker that failed or exited while no run was on: the next run fails with it.
  let broken: Error | null = null;
  let closed = false;
  const fail = (error: Error): void => {
    if (active !== null) active.fail(error);
    else broken ??= error;
  };
  const spawn = (): void => {
    const w: PoolWorker = { thread: new Worker(start.script, { workerData: start.workerData }), held: [], since: 0, timer: undefined };
    workers.add(w);
    w.thread.on('message', (message: ReplyMessage<unknown>) => {
      if (workers.has(w) && active !== null) active.reply(w, message);
    });
    w.thread.on('error', (error) => {
      if (workers.has(w)) fail(error instanceof Error ? error : new Error(String(error)));
    });
    w.thread.on('exit', (code) => {
      clearTimeout(w.timer);
      if (workers.has(w) && !closed) fail(new Error(`a worker thread exited (code ${code}) before the pool finished its tasks`));
    });
    active?.feed(w);
  };
  const pool: ThreadPool = {
    get size() {
      return workers.size;
    },
    grow(count) {
      while (!closed && workers.size < Math.floor(count)) spawn();
    },
    close() {
      if (closed) return;
      closed = true;
      for (const w of workers) {
        clearTimeout(w.timer);
        void w.thread.terminate();
      }
      workers.clear();
    },
    run<T, R>(tasks: readonly T[], options: PoolRun<T, R> = {}, limit?: PoolTimeLimit<T, R>): Promise<R[]> {
      const results = new Array<R>(tasks.length);
      if (tasks.length === 0) return Promise.resolve(results);
      if (closed) return Promise.reject(new Error('runPool: the pool is closed'));
      if (active !== null) return Promise.reject(new Error('runPool: one run at a time'));
      if (broken !== null) return Promise.reject(broken);
      const given = options.order;
      if (
        given !== undefined &&
        (given.length !== tasks.length || new Set(given).size !== tasks.length || !given.every((i) => i >= 0 && i < tasks.length))
      )
        return Promise.reject(new RangeError('runPool: `order` must list every task index once'));
      const order = given ?? tasks.map((_, i) => i);
      const keep = options.onResult ?? ((value: R) => value);
      return new Promise<R[]>((resolve, reject) => {
        // Tasks not handed out: order[front..back); tasks taken back from an ended worker go first.
        let front = 0;
        let back = order.length;
        const returned: number[] = [];
        let done = 0;
        let settled = false;
        const left = (): boolean => returned.length > 0 || front < back;
        const takeFront = (): number => returned.shift() ?? (front < back ? order[front++] : -1);
        const takeBack = (): number => returned.shift() ?? (front < back ? order[--back] : -1);
        const end = (): void => {
          settled = true;
          active = null;
          for (const w of workers) {
            clearTimeout(w.timer);
            w.held.length = 0;
          }
        };
        const failWith = (error: Error): void => {
          if (settled) return;
          end();
          // The workers may still be running tasks of this run: they cannot serve another.
          pool.close();
          reject(error);
        };
        /** Records a task's value; true when the run is over (the last task, or a failure). */
        const finishTask = (index: number, value: R): boolean => {
          try {
            results[index] = keep(value, index);
          } catch (error) {
            failWith(error instanceof Error ? error : new Error(String(error)));
            return true;
          }
          done++;
          if (done < tasks.length) return false;
          end();
          resolve(results);
          return true;
        };
        const feed = (w: PoolWorker): void => {
          while (!settled && w.held.length < TASKS_IN_FLIGHT) {
            const index = takeFront();
            if (index < 0) return;
            w.held.push(index);
            const message: TaskMessage<T> = { index, task: tasks[index] };
            w.thread.postMessage(message);
          }
        };
        const expire = (w: PoolWorker): void => {
          if (settled || limit === undefined || w.held.length === 0 || !workers.has(w)) return;
          // Ended from outside: its exit and anything it still sends are ignored from here on.
          workers.delete(w);
          void w.thread.terminate();
          // The task over its limit, then the ones it held but had not started: those go first to the others.
          const index = w.held[0];
          for (let k = w.held.length - 1; k >= 1; k--) returned.unshift(w.held[k]);
          w.held.length = 0;
          if (!finishTask(index, limit.onTimeLimit(tasks[index], performance.now() - w.since)) && left()) spawn();
        };
        active = {
          feed,
          fail: failWith,
          reply(w, message) {
            const reply = message as ReplyMessage<R>;
            if (settled || reply.index !== w.held[0]) return;
            if ('started' in reply) {
              w.since = performance.now();
              // Unreferenced: a timer alone never keeps the process running (its worker does, while busy).
              if (limit !== undefined) w.timer = setTimeout(() => expire(w), limit.ms).unref();
              return;
            }
            clearTimeout(w.timer);
            w.held.shift();
            if (!reply.ok) return failWith(revive(reply.error));
            if (!finishTask(reply.index, reply.value)) feed(w);
          },
        };
        for (const w of workers) feed(w);
        const local = options.local;
        if (local !== undefined) {
          const lane = async (): Promise<void> => {
            // Each round finishes one task or stops, so this ends after at most tasks.length rounds.
            while (!settled) {
              // A turn of the event loop first: the workers' replies (and their next tasks) are taken in.
              await new Promise<void>((next) => setImmediate(next));
              if (settled) return;
              const index = takeBack();
              if (index < 0) return;
              const value = await local(tasks[index]);
              if (settled) return;
              finishTask(index, value);
            }
          };
          lane().catch((error: unknown) => failWith(error instanceof Error ? error : new Error(String(error))));
        } else if (workers.size === 0) failWith(new Error('runPool: no worker and no local lane'));
      });
    },
  };
  pool.grow(start.jobs);
  return pool;
}

/**
 * Runs every task on a pool of worker threads started for this run alone (and on this thread too
 * with `options.local`), then ends them.
 * @param tasks plain-data tasks, each handed to one worker (or run here)
 * @param options number of workers, worker script and its data, order, this thread's lane
 * @param limit a per-task time limit on the workers; default none
 * @returns one result per task, in task order
 * @throws the first task error (InputErrors stay InputErrors), or an Error when a worker exits early
 */
export async function runPool<T, R>(tasks: readonly T[], options: PoolOptions<T, R>, limit?: PoolTimeLimit<T, R>): Promise<R[]> {
  if (tasks.length === 0) return [];
  const pool = openPool({ ...options, jobs: Math.min(Math.max(1, Math.floor(options.jobs)), tasks.length) });
  try {
    return await pool.run(tasks, options, limit);
  } finally {
    pool.close();
  }
}

/**
 * The worker side: answers every task the pool sends with `handle(task)`. Call once, at the top
 * level of the worker script. Does nothing on the main thread.
 * @param handle does one task; its value (or error) goes back to the pool
 */
export function serveTasks<T, R>(handle: (task: T) => Promise<R> | R): void {
  if (isMainThread || parentPort === null) return;
  const port = parentPort;
  // Tasks run one after another in the order they came (the pool sends the next before this one ends).
  let queue: Promise<void> = Promise.resolve();
  port.on('message', (message: TaskMessage<T>) => {
    queue = queue.then(() => {
      // Posted as the task starts, so the pool's clock starts even if the task never yields.
      port.postMessage({ index: message.index, started: true } satisfies ReplyMessage<R>);
      return Promise.resolve()
        .then(() => handle(message.task))
        .then(
          (value) => port.postMessage({ index: message.index, ok: true, value } satisfies ReplyMessage<R>),
          (error: unknown) => port.postMessage({ index: message.index, ok: false, error: errorData(error) } satisfies ReplyMessage<R>),
        );
    });
  });
}
