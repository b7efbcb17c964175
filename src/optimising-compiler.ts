/**
 * When V8's optimising compiler (TurboFan) runs. A fitgate run over a small model finishes in a
 * few hundred milliseconds, most of it start-up; from the first line TurboFan would spend its
 * background thread and several MiB on the YAML parser, the schema validators and loops that are
 * over before the optimised code arrives. So the entry points start with TurboFan off (V8 still
 * runs its interpreter and the Sparkplug baseline compiler) and turn it on as soon as the run
 * holds more than one model, data files over {@link SMALL_DATA_BYTES}, or more work than
 * {@link SMALL_WORK}. The numbers computed are the same either way: JavaScript arithmetic does not
 * depend on the tier that runs it.
 *
 * Measured on the development machine (2 cores, node 20; medians of 41-61 alternating runs),
 * with TurboFan turned on where the model's work is known (after the settings, descriptor and
 * data are read): a one-input model of 2,000 rows and 11 columns (7.8e5 multiply-adds) takes
 * 0.236 s and 62 MiB against 0.255 s and 55 MiB on baseline code; of 1,000 rows (3.9e5) 0.205 s
 * against 0.213 s; of 400 rows (1.6e5) the same either way, with 7 MiB more. A five-input model of
 * 1,000 rows and 21 columns takes 0.52 s without and 0.34 s with it. (Before the hot loops were
 * written so that V8 keeps their optimised code, the crossover lay near 2e6.)
 */
import v8 from 'node:v8';

/**
 * Estimated multiply-adds below which a run stays on baseline code: a few milliseconds of
 * optimised code, about 20 ms of baseline code (the crossover measured above lies between 1.6e5
 * and 3.9e5).
 */
export const SMALL_WORK = 3e5;

/**
 * Bytes of a model's training and hold-out files above which the optimising compiler is turned
 * on before they are read (parsing 256 KB of CSV is itself a hot loop worth optimising).
 */
export const SMALL_DATA_BYTES = 256 * 1024;

let deferred = false;

/** Sets a V8 flag; false when this V8 refuses it (nothing changes then). */
function setFlag(flag: string): boolean {
  try {
    v8.setFlagsFromString(flag);
    return true;
  } catch {
    return false;
  }
}

/**
 * True when the user chose how V8 compiles (a compiler flag in Node's arguments or NODE_OPTIONS):
 * fitgate then leaves the flags alone.
 */
export function compilerFlagsGiven(execArgv: readonly string[] = process.execArgv, nodeOptions: string | undefined = process.env.NODE_OPTIONS): boolean {
  const given = [...execArgv, ...(nodeOptions ?? '').split(/\s+/)];
  return given.some((arg) => /^--(no-)?(turbofan|opt|jitless|maglev|sparkplug|always-sparkplug)(=|$)/.test(arg.replace(/_/g, '-')));
}

/**
 * Turns TurboFan off until {@link allowOptimisingCompiler}; entry points call it first. Does
 * nothing when the user set a compiler flag ({@link compilerFlagsGiven}).
 */
export function deferOptimisingCompiler(): void {
  if (!deferred && !compilerFlagsGiven()) deferred = setFlag('--no-turbofan');
}

/** Turns TurboFan back on (idempotent; does nothing when it was never turned off). */
export function allowOptimisingCompiler(): void {
  if (deferred && setFlag('--turbofan')) deferred = false;
}

/** True while TurboFan is turned off by {@link deferOptimisingCompiler}. */
export function optimisingCompilerDeferred(): boolean {
  return deferred;
}

/** The shape of one model's work, known once its design is built. */
export interface WorkShape {
  /** Training rows. */
  rows: number;
  /** Design columns. */
  columns: number;
  /** Model inputs (columns of the data files the terms read). */
  inputs: number;
  /** Settings a degree or width sweep refits (0 for a ridge sweep, which reads no row). */
  refits: number;
}

/**
 * Multiply-adds of one model's row loops, roughly: the passes over the training rows (folding,
 * refinement, scoring: about 2.5 n p^2), each refit of the complexity sweep (the same again per
 * setting), and the swing scan (8 points in up to 4,000 gaps, plus the 1,000 x 1,000 neighbour
 * search when there are several inputs).
 */
export function estimateWork(shape: WorkShape): number {
  const { rows: n, columns: p, inputs: d, refits } = shape;
  const passes = 2.5 * n * p * p * (1 + refits);
  const gridPoints = 201 + 8 * Math.min(Math.max(n - 1, 0), 4000);
  const swing = d >= 2 ? 1e6 * d + (gridPoints + 24_000) * p : gridPoints * p;
  return passes + swing;
}
