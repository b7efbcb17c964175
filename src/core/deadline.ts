/**
 * The per-model time limit, checked cooperatively: a {@link Deadline} is started when a model
 * starts, and the long stages call {@link checkDeadline} between their steps (after each block of
 * rows in a pass, between the settings of a sweep, between decompositions, between checks). Past
 * the deadline the check throws {@link TimeLimitExceeded}, which the run turns into that model's
 * error; every other model goes on.
 *
 * The deadline travels with the model's asynchronous work through Node's AsyncLocalStorage, so
 * the numerical modules need no extra parameter and two models in flight at once (in tests, say)
 * never see each other's deadline. A step between two checks is not interrupted: the largest
 * such steps are one block of rows and one p x p decomposition (p <= 200), well under a second.
 * Models run on worker threads are also stopped from outside (see run/pool.ts).
 */
import { AsyncLocalStorage } from 'node:async_hooks';

/** A source of milliseconds that never goes backwards. Default `performance.now()`. */
export type Clock = () => number;

const monotonic: Clock = () => performance.now();

/** Thrown by {@link checkDeadline} once the model's time is up. Not an InputError: the run decides what it means. */
export class TimeLimitExceeded extends Error {
  /** The limit, in milliseconds. */
  readonly limitMs: number;
  /** Time spent when the check fired, in milliseconds. */
  readonly elapsedMs: number;
  /** The stage that checked (`fold pass`, `complexity sweep`, ...). */
  readonly stage: string;

  constructor(limitMs: number, elapsedMs: number, stage: string) {
    super(`the time limit of ${limitMs} ms was reached after ${Math.round(elapsedMs)} ms, in the ${stage}`);
    this.name = 'TimeLimitExceeded';
    this.limitMs = limitMs;
    this.elapsedMs = elapsedMs;
    this.stage = stage;
  }
}

/** A point in time after which one model's work stops. */
export class Deadline {
  /** The limit it was started with, in milliseconds. */
  readonly limitMs: number;
  readonly #start: number;
  readonly #now: Clock;

  /**
   * @param limitMs milliseconds from now (> 0; Infinity for none)
   * @param now the clock; default `performance.now()`
   */
  constructor(limitMs: number, now: Clock = monotonic) {
    this.limitMs = limitMs;
    this.#now = now;
    this.#start = now();
  }

  /** Milliseconds since the deadline was started. */
  elapsed(): number {
    return this.#now() - this.#start;
  }

  /** True once the limit has passed. */
  expired(): boolean {
    return this.elapsed() > this.limitMs;
  }

  /**
   * Throws {@link TimeLimitExceeded} when the limit has passed (again at every later call).
   * @param stage what is running, for the message
   */
  check(stage: string): void {
    const elapsed = this.elapsed();
    if (elapsed > this.limitMs) throw new TimeLimitExceeded(this.limitMs, elapsed, stage);
  }
}

const current = new AsyncLocalStorage<Deadline>();

/**
 * Runs `work` with `deadline` as the deadline that {@link checkDeadline} checks, in `work` and in
 * everything it starts (awaited promises included).
 * @returns what `work` returns
 */
export function withDeadline<T>(deadline: Deadline, work: () => T): T {
  return current.run(deadline, work);
}

/**
 * Throws {@link TimeLimitExceeded} when the work running has a deadline and it has passed; does
 * nothing outside {@link withDeadline}. Cheap (a clock read): call it between steps, not inside
 * a loop over rows.
 * @param stage what is running, for the message (`fold pass`, `swing scan`, ...)
 */
export function checkDeadline(stage: string): void {
  current.getStore()?.check(stage);
}
