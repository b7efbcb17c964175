/**
 * Sharding: a deterministic share of the models for one job of a matrix.
 *
 * The rule: sort the repository-relative descriptor paths by UTF-16 code units (the order of
 * JavaScript's default string comparison, independent of locale), then deal them out round-robin:
 * the path at 0-based position i of the sorted list belongs to shard (i mod N) + 1. Every model
 * is in exactly one shard, shard sizes differ by at most one, and every job of the matrix
 * computes the same split from the same checkout without talking to the others.
 */
import { InputError, quoteValue } from '../core/errors.js';

/** Shard K of N (1-based K, 1 <= K <= N). */
export interface Shard {
  /** This job's shard, 1-based. */
  index: number;
  /** Number of shards. */
  count: number;
}

/** Error codes of {@link parseShard}. */
export const SHARD_ERROR = Object.freeze({ syntax: 'shard-syntax', range: 'shard-range' });

/** Largest number of shards accepted (a matrix of jobs is far smaller). */
export const MAX_SHARDS = 10_000;

/**
 * Reads `K/N` as written on the command line or in the action input.
 * @param text e.g. `2/4`; white space around the numbers is allowed
 * @param key where the text came from, for the error (e.g. `--shard`)
 * @throws InputError `shard-syntax` when the text is not two positive integers `K/N`,
 *   `shard-range` when K > N or N is over {@link MAX_SHARDS}
 */
export function parseShard(text: string, key = '--shard'): Shard {
  const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  if (!match) {
    throw new InputError(SHARD_ERROR.syntax, `expected K/N with whole numbers 1 <= K <= N (e.g. 2/4), got ${quoteValue(text)}`, { key });
  }
  const index = Number(match[1]);
  const count = Number(match[2]);
  if (index < 1 || count < 1 || index > count || count > MAX_SHARDS) {
    throw new InputError(
      SHARD_ERROR.range,
      `expected 1 <= K <= N <= ${MAX_SHARDS} in K/N, got ${quoteValue(text)} (K = ${index}, N = ${count})`,
      { key },
    );
  }
  return { index, count };
}

/** Compares strings by UTF-16 code units (locale-independent). */
function byCodeUnits(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * The paths of one shard: round-robin over the sorted, de-duplicated paths (see the module note).
 * @param paths repository-relative descriptor paths, any order
 * @param shard which share to take; null = all paths (sorted)
 * @returns this shard's paths, sorted
 */
export function selectShard(paths: readonly string[], shard: Shard | null): string[] {
  const sorted = [...new Set(paths)].sort(byCodeUnits);
  if (shard === null) return sorted;
  return sorted.filter((_, i) => i % shard.count === shard.index - 1);
}

/** `K/N` text of a shard (for notes and reports). */
export function formatShard(shard: Shard): string {
  return `${shard.index}/${shard.count}`;
}
