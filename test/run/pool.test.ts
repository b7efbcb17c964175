import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { pathToFileURL } from 'node:url';
import path from 'node:path';
import { transpileSources } from './transpile.js';

type Task = { n: number; delayMs?: number; fail?: 'input' | 'error'; spin?: boolean };
type Reply = { n: number; square: number; thread: number };
type RunOptions = { order?: number[]; local?: (task: Task) => Promise<Reply>; onResult?: (value: Reply, index: number) => Reply };
type Limit = { ms: number; onTimeLimit: (task: Task, elapsedMs: number) => Reply };
type ThreadPool = {
  run: (tasks: Task[], options?: RunOptions, limit?: Limit) => Promise<Reply[]>;
  grow: (n: number) => void;
  size: number;
  close: () => void;
};
type PoolModule = {
  runPool: (
    tasks: Task[],
    options: { jobs: number; script: string | URL; workerData?: unknown } & RunOptions,
    limit?: Limit,
  ) => Promise<Reply[]>;
  openPool: (start: { jobs: number; script: string | URL; workerData?: unknown }) => ThreadPool;
  defaultJobs: () => number;
};
type ErrorsModule = { InputError: new (...args: never[]) => Error & { code: string; location: Record<string, unknown> } };

const script = new URL('./fixtures/task-worker.mjs', import.meta.url);
let lib: { dir: string; remove: () => void };
let pool: PoolModule;
let errors: ErrorsModule;
let workerData: { lib: string };

beforeAll(async () => {
  lib = transpileSources();
  pool = (await import(pathToFileURL(path.join(lib.dir, 'run', 'pool.js')).href)) as PoolModule;
  errors = (await import(pathToFileURL(path.join(lib.dir, 'core', 'errors.js')).href)) as ErrorsModule;
  workerData = { lib: pathToFileURL(lib.dir).href };
});
afterAll(() => lib?.remove());

describe('runPool', () => {
  it('returns no results for no tasks without starting workers', async () => {
    await expect(pool.runPool([], { jobs: 4, script, workerData })).resolves.toEqual([]);
  });

  it('returns results in task order when later tasks finish first', async () => {
    // Early tasks are slow, late ones fast: finishing order differs from task order.
    const tasks: Task[] = Array.from({ length: 12 }, (_, i) => ({ n: i, delayMs: i < 3 ? 60 - 20 * i : 0 }));
    const results = await pool.runPool(tasks, { jobs: 3, script, workerData });
    expect(
      results.map((r) => r.n),
      'result order = task order',
    ).toEqual(tasks.map((t) => t.n));
    expect(results.map((r) => r.square)).toEqual(tasks.map((t) => t.n * t.n));
    const threads = new Set(results.map((r) => r.thread));
    expect(threads.size, `threads used: ${[...threads].join(', ')}`).toBeGreaterThan(1);
    expect(threads.size).toBeLessThanOrEqual(3);
  });

  it('starts no more workers than tasks or jobs', async () => {
    const results = await pool.runPool([{ n: 1 }, { n: 2 }], { jobs: 8, script, workerData });
    expect(new Set(results.map((r) => r.thread)).size).toBeLessThanOrEqual(2);
    const serial = await pool.runPool(
      Array.from({ length: 5 }, (_, n) => ({ n })),
      { jobs: 1, script, workerData },
    );
    expect(new Set(serial.map((r) => r.thread)).size, 'jobs 1 uses one worker').toBe(1);
  });

  it('hands an InputError back as an InputError with code and location', async () => {
    const run = pool.runPool([{ n: 1 }, { n: 7, fail: 'input' }, { n: 3 }], { jobs: 2, script, workerData });
    const error = await run.catch((e: unknown) => e);
    expect(error).toBeInstanceOf(errors.InputError);
    const e = error as Error & { code: string; location: Record<string, unknown> };
    expect(e.code).toBe('test-code');
    expect(e.message).toBe('bad task 7');
    expect(e.location).toEqual({ file: 'task.csv', line: 7, key: 'n' });
  });

  it('hands other errors back with name and message', async () => {
    const error = (await pool.runPool([{ n: 4, fail: 'error' }], { jobs: 2, script, workerData }).catch((e: unknown) => e)) as Error;
    expect(error).toBeInstanceOf(Error);
    expect(error).not.toBeInstanceOf(errors.InputError);
    expect(error.name).toBe('TypeError');
    expect(error.message).toBe('broken task 4');
  });

  it('rejects when a worker script cannot start', async () => {
    const missing = new URL('../parallel/fixtures/no-such-worker.mjs', import.meta.url);
    await expect(pool.runPool([{ n: 1 }], { jobs: 1, script: missing, workerData })).rejects.toThrow();
  });

  it('ends a worker stuck past the time limit: that task gets its time-limit result, the others finish on a new worker', async () => {
    const tasks: Task[] = [{ n: 1 }, { n: 2, spin: true }, { n: 3 }, { n: 4, spin: true }, { n: 5 }, { n: 6 }];
    const stopped: { n: number; elapsedMs: number }[] = [];
    const started = performance.now();
    const results = await pool.runPool(
      tasks,
      { jobs: 2, script, workerData },
      {
        ms: 300,
        onTimeLimit: (task, elapsedMs) => {
          stopped.push({ n: task.n, elapsedMs });
          return { n: task.n, square: -1, thread: -1 };
        },
      },
    );
    expect(results.map((r) => [r.n, r.square])).toEqual([
      [1, 1],
      [2, -1],
      [3, 9],
      [4, -1],
      [5, 25],
      [6, 36],
    ]);
    expect(stopped.map((s) => s.n).sort()).toEqual([2, 4]);
    for (const s of stopped) expect(s.elapsedMs).toBeGreaterThanOrEqual(299);
    // Two stuck tasks on two workers: about two limits, not an endless wait.
    expect(performance.now() - started).toBeLessThan(15_000);
  });

  it('keeps a task that answers within the time limit', async () => {
    const results = await pool.runPool(
      [{ n: 7, delayMs: 20 }],
      { jobs: 1, script, workerData },
      { ms: 10_000, onTimeLimit: () => ({ n: -1, square: -1, thread: -1 }) },
    );
    expect(results.map((r) => r.square)).toEqual([49]);
  });

  it('sizes the default to the cores', () => {
    expect(pool.defaultJobs()).toBeGreaterThanOrEqual(1);
  });

  it('hands tasks out in the given order and still returns them in task order', async () => {
    // One worker takes tasks strictly one after another: the first error is that of the first task handed out.
    const tasks: Task[] = [{ n: 0, fail: 'error' }, { n: 1 }, { n: 2, fail: 'input' }];
    await expect(pool.runPool(tasks, { jobs: 1, script, workerData })).rejects.toThrow('broken task 0');
    await expect(pool.runPool(tasks, { jobs: 1, script, workerData, order: [2, 0, 1] })).rejects.toThrow('bad task 2');
    const ok: Task[] = Array.from({ length: 6 }, (_, i) => ({ n: i }));
    const results = await pool.runPool(ok, { jobs: 2, script, workerData, order: [5, 4, 3, 2, 1, 0] });
    expect(results.map((r) => r.square)).toEqual([0, 1, 4, 9, 16, 25]);
  });

  it('refuses an order that does not list every task once', async () => {
    const tasks: Task[] = [{ n: 0 }, { n: 1 }];
    for (const order of [[0], [0, 0], [0, 2], [1, -1]])
      await expect(pool.runPool(tasks, { jobs: 1, script, workerData, order }), JSON.stringify(order)).rejects.toThrow(RangeError);
  });

  it('runs tasks on this thread too (from the far end of the order) and hands each value over as it comes', async () => {
    const tasks: Task[] = Array.from({ length: 100 }, (_, n) => ({ n, delayMs: 10 }));
    const seen: number[] = [];
    const results = await pool.runPool(tasks, {
      jobs: 1,
      script,
      workerData,
      // This thread's lane: thread 0, and a value the handover can tell apart.
      local: async (task) => {
        await new Promise((resolve) => setTimeout(resolve, 10));
        return { n: task.n, square: task.n * task.n, thread: 0 };
      },
      onResult: (value, index) => {
        seen.push(index);
        return { ...value, square: -value.square };
      },
    });
    expect(
      results.map((r) => r.n),
      'results in task order',
    ).toEqual(tasks.map((t) => t.n));
    expect(
      results.map((r) => r.square),
      'what onResult returned is kept',
    ).toEqual(tasks.map((t) => -t.n * t.n));
    expect(
      [...seen].sort((a, b) => a - b),
      'onResult once per task',
    ).toEqual(tasks.map((_, i) => i));
    const here = results.filter((r) => r.thread === 0).map((r) => r.n);
    const there = results.filter((r) => r.thread !== 0).map((r) => r.n);
    expect(here.length, 'this thread took some tasks').toBeGreaterThan(0);
    expect(there.length, 'the worker took some tasks').toBeGreaterThan(0);
    // The worker takes from the front, this thread from the back: every task here comes after every task there.
    expect(Math.min(...here)).toBeGreaterThan(Math.max(...there));
  });

  it('keeps its workers between runs, grows on demand and refuses runs once closed', async () => {
    const threads = pool.openPool({ jobs: 1, script, workerData });
    try {
      const first = await threads.run(Array.from({ length: 4 }, (_, n) => ({ n })));
      const second = await threads.run(Array.from({ length: 4 }, (_, n) => ({ n: n + 10 })));
      expect(second.map((r) => r.square)).toEqual([100, 121, 144, 169]);
      expect(new Set([...first, ...second].map((r) => r.thread)).size, 'the same worker served both runs').toBe(1);
      threads.grow(3);
      expect(threads.size).toBe(3);
      threads.grow(2);
      expect(threads.size, 'grow never shrinks').toBe(3);
      const third = await threads.run(Array.from({ length: 30 }, (_, n) => ({ n, delayMs: 10 })));
      expect(new Set(third.map((r) => r.thread)).size, 'the grown pool spreads a run').toBeGreaterThan(1);
    } finally {
      threads.close();
    }
    await expect(threads.run([{ n: 1 }])).rejects.toThrow('closed');
    expect(threads.size).toBe(0);
  });
});
